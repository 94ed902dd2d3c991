import { mathjax } from "mathjax-full/js/mathjax.js";
import { TeX } from "mathjax-full/js/input/tex.js";
import { SVG } from "mathjax-full/js/output/svg.js";
import { liteAdaptor } from "mathjax-full/js/adaptors/liteAdaptor.js";
import { RegisterHTMLHandler } from "mathjax-full/js/handlers/html.js";
import { AllPackages } from "mathjax-full/js/input/tex/AllPackages.js";
import type { Typeset } from "@shared/export/diagramSvg";

const adaptor = liteAdaptor();
RegisterHTMLHandler(adaptor);
// One document per process: the first formula pays MathJax's set-up, later ones reuse it.
const page = mathjax.document("", { InputJax: new TeX({ packages: AllPackages }), OutputJax: new SVG({ fontCache: "none" }) });
/** Pixels per ex at the 15 px formula size of the canvas. */
const EX = 7.5;
const INK = "#1f2630";

/** TeX → an <svg> of glyph paths (no text, no foreignObject), sized in px. Example: typeset("\\frac{1}{s}").width ≈ 12. */
export function typeset(tex: string): Typeset {
  const node = page.convert(tex, { display: false });
  const svg = adaptor.firstChild(node) as Parameters<typeof adaptor.outerHTML>[0];
  const ex = (name: string) => parseFloat(String(adaptor.getAttribute(svg, name)).replace("ex", "")) * EX;
  const [width, height] = [ex("width"), ex("height")];
  adaptor.setAttribute(svg, "width", `${width}`);
  adaptor.setAttribute(svg, "height", `${height}`);
  adaptor.removeAttribute(svg, "style");
  return { svg: adaptor.outerHTML(svg).replaceAll("currentColor", INK), width, height };
}
