import { useMemo } from "react";
import { Tex } from "@/features/editor/components/Tex";
import { useFarView } from "@/features/editor/components/nodes/farView";
import { expressionFraction, expressionLatex } from "@shared/expr/exprLatex";

/** A plain-text fraction (or single line): three elements where typesetting takes dozens. */
export function PlainFraction({ num, den }: { num: string; den: string | null }) {
  if (den === null) return <span className="font-serif text-[17px] whitespace-nowrap italic">{num}</span>;
  return (
    <span className="inline-flex flex-col items-center font-serif text-[13px] leading-tight whitespace-nowrap italic">
      <span>{num}</span>
      <span className="border-t border-current px-0.5">{den}</span>
    </span>
  );
}

const Unparsed = ({ expr }: { expr: string }) => <span className="block max-w-40 truncate font-mono text-xs text-fault">{expr || "∅"}</span>;

function TypesetFormula({ expr }: { expr: string }) {
  const latex = useMemo(() => expressionLatex(expr), [expr]);
  return latex === null ? <Unparsed expr={expr} /> : <Tex latex={latex} className="text-[15px]" />;
}

function PlainFormula({ expr }: { expr: string }) {
  const parts = useMemo(() => expressionFraction(expr), [expr]);
  return parts === null ? <Unparsed expr={expr} /> : <PlainFraction num={parts.num} den={parts.den} />;
}

/** The expression as a typeset formula (plain text when zoomed far out), or the raw text in mono when it does not parse yet. */
export function Formula({ expr }: { expr: string }) {
  return useFarView() ? <PlainFormula expr={expr} /> : <TypesetFormula expr={expr} />;
}
