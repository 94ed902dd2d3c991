import { useId, type ReactNode } from "react";

/** A titled section card; its heading names the region for screen-reader navigation. `dense`: less padding, for columns. */
export function Panel({ title, dense = false, children }: { title: string; dense?: boolean; children: ReactNode }) {
  const id = useId();
  return (
    <section aria-labelledby={id} className={`rounded-md border border-rule bg-paper-raised shadow-xs ${dense ? "p-4" : "p-5"}`}>
      <h2 id={id} className={`text-base font-semibold ${dense ? "mb-2" : "mb-4"}`}>
        {title}
      </h2>
      {children}
    </section>
  );
}
