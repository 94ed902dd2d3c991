import type { ReactNode } from "react";
import { useDocumentTitle } from "@/lib/useDocumentTitle";

/** A single centred card for the account pages (sign-in, sign-up, invitation). */
export function NarrowPage({ title, intro, children }: { title: string; intro?: ReactNode; children: ReactNode }) {
  useDocumentTitle(title);
  return (
    <div className="mx-auto max-w-md rounded-md border border-rule bg-paper-raised p-6 shadow-sm sm:p-8">
      <h1 className="text-xl font-semibold tracking-tight">{title}</h1>
      {intro && <div className="mt-2 text-sm text-ink-soft">{intro}</div>}
      <div className="mt-6">{children}</div>
    </div>
  );
}
