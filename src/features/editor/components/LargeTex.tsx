import { useState, type ReactNode } from "react";
import { Button } from "@/components/Button";
import { Tex } from "@/features/editor/components/Tex";

/** Beyond this many LaTeX characters typesetting takes thousands of elements and freezes the page for a while. */
export const TYPESET_LIMIT = 2000;

export const isLarge = (latex: string) => latex.length > TYPESET_LIMIT;

interface Props {
  latex: string;
  display?: boolean;
  /** Shown instead of the formula while it is large and not typeset (the same result as plain text). */
  plain: ReactNode;
  /** Names the formula on the button: "Typeset <what>". */
  what: string;
}

/** A formula typeset as usual, or when large its plain text and a button that typesets it on request. */
export function LargeTex({ latex, display, plain, what }: Props) {
  const [typesetFor, setTypesetFor] = useState<string | null>(null);
  if (!isLarge(latex) || typesetFor === latex) return <Tex latex={latex} display={display} />;
  return (
    <span className="flex flex-col items-start gap-1">
      {plain}
      <Button size="sm" onClick={() => setTypesetFor(latex)}>
        Typeset {what}
      </Button>
    </span>
  );
}
