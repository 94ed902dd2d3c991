import type { ReactNode } from "react";
import { useDocumentTitle } from "@/lib/useDocumentTitle";

/** The page's one h1, also written to the document title so tabs and history read well. */
export function PageTitle({ title, kicker, children }: { title: string; kicker?: ReactNode; children?: ReactNode }) {
  useDocumentTitle(title);
  return (
    <div className="mb-6 flex flex-wrap items-end justify-between gap-4 border-b border-rule pb-4">
      <div>
        {kicker && <p className="mb-1 text-xs font-medium tracking-wide text-ink-faint uppercase">{kicker}</p>}
        <h1 className="text-2xl font-semibold tracking-tight">{title}</h1>
      </div>
      {children && <div className="flex flex-wrap items-center gap-2">{children}</div>}
    </div>
  );
}
