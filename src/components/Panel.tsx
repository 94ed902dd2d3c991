import { useId, type ReactNode } from "react";

/** A titled section card; its heading names the region for screen-reader navigation. */
export function Panel({ title, children }: { title: string; children: ReactNode }) {
  const id = useId();
  return (
    <section aria-labelledby={id} className="rounded-md border border-rule bg-paper-raised p-5 shadow-xs">
      <h2 id={id} className="mb-4 text-base font-semibold">
        {title}
      </h2>
      {children}
    </section>
  );
}
