import type { ReactNode } from "react";
import { useDocumentTitle } from "@/lib/useDocumentTitle";

/**
 * The page's one h1, also written to the document title so tabs and history read well. `compact` (the editor, which
 * fits its window) spends less height on it.
 */
export function PageTitle({ title, kicker, compact = false, children }: { title: string; kicker?: ReactNode; compact?: boolean; children?: ReactNode }) {
  useDocumentTitle(title);
  return (
    <div className={`flex flex-wrap items-end justify-between gap-4 border-b border-rule ${compact ? "mb-3 pb-2" : "mb-6 pb-4"}`}>
      <div>
        {kicker && <p className={`text-xs font-medium tracking-wide text-ink-faint uppercase ${compact ? "" : "mb-1"}`}>{kicker}</p>}
        <h1 className={`font-semibold tracking-tight ${compact ? "text-xl" : "text-2xl"}`}>{title}</h1>
      </div>
      {children && <div className="flex flex-wrap items-center gap-2">{children}</div>}
    </div>
  );
}
