import type { ReactNode } from "react";

/** A titled section card; the heading names the section for screen-reader navigation. */
export function Panel({ title, children, level = 2 }: { title: string; children: ReactNode; level?: 2 | 3 }) {
  const Heading = level === 2 ? "h2" : "h3";
  return (
    <section aria-label={title} className="rounded-md border border-rule bg-paper-raised p-5 shadow-[0_1px_0_var(--color-rule)]">
      <Heading className="mb-4 text-base font-semibold">{title}</Heading>
      {children}
    </section>
  );
}
