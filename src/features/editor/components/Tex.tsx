import { memo } from "react";
import katex from "katex";
import "katex/dist/katex.min.css";
import { boundedMemo } from "@shared/expr/boundedMemo";

/** Longer formulas (whole closed-loop results) rarely repeat: not worth keeping. */
const KEPT_LENGTH = 2000;

const render = (latex: string, display: boolean) =>
  katex.renderToString(latex, { throwOnError: false, displayMode: display, output: "htmlAndMathml" });
const inlineHtml = boundedMemo(400, (latex) => render(latex, false));
const displayHtml = boundedMemo(100, (latex) => render(latex, true));

function typesetHtml(latex: string, display: boolean): string {
  if (latex.length > KEPT_LENGTH) return render(latex, display);
  return display ? displayHtml(latex) : inlineHtml(latex);
}

/** KaTeX rendering of trusted LaTeX built by the reducer or the editor; MathML rides along for screen readers. */
export const Tex = memo(function Tex({ latex, display = false, className }: { latex: string; display?: boolean; className?: string }) {
  return <span className={className} dangerouslySetInnerHTML={{ __html: typesetHtml(latex, display) }} />;
});
