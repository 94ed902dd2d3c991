import { memo, useMemo } from "react";
import katex from "katex";
import "katex/dist/katex.min.css";

/** KaTeX rendering of trusted LaTeX built by the engine or the editor; MathML rides along for screen readers. */
export const Tex = memo(function Tex({ latex, display = false, className }: { latex: string; display?: boolean; className?: string }) {
  const html = useMemo(() => katex.renderToString(latex, { throwOnError: false, displayMode: display, output: "htmlAndMathml" }), [latex, display]);
  return <span className={className} dangerouslySetInnerHTML={{ __html: html }} />;
});
