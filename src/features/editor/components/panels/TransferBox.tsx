import type { ReactNode } from "react";
import { LargeTex } from "@/features/editor/components/LargeTex";
import { transferText } from "@/features/editor/lib/resultText";

interface Props {
  /** The region's accessible name; its text form is named "<name> as text". */
  name: string;
  heading: ReactNode;
  transfer: { numerator: string; denominator: string; latex: string };
  /** What the typeset formula is called when it is too large to typeset at once. */
  what: string;
}

/** One closed-loop transfer function in a box: a heading line, T(s) typeset, and its text form to copy. */
export function TransferBox({ name, heading, transfer, what }: Props) {
  return (
    <section aria-label={name} className="rounded border border-rule bg-paper px-3 py-2">
      <p className="text-xs text-ink-soft">{heading}</p>
      <div className="overflow-x-auto py-1">
        <LargeTex display latex={`T(s) = ${transfer.latex}`} what={what} plain={<span className="text-xs text-ink-soft">A large result: its text is below.</span>} />
      </div>
      <output aria-label={`${name} as text`} className="block font-mono text-xs break-all text-ink-soft">
        {transferText(transfer)}
      </output>
    </section>
  );
}
