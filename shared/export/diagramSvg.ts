import type { DiagramDocument, Block } from "@shared/diagram/schema";
import { hasExpression } from "@shared/diagram/blockKinds";
import type { CheckedResult } from "@shared/api/versions";
import { delayLatex, expressionLatex } from "@shared/expr/exprLatex";
import { boundsOf, captionBox, estimatedSize, fallbackPosition, inPoint } from "@shared/geometry/blockBox";
import { BLOCK_SHAPES } from "@shared/geometry/blockShape";
import { indexBoxes } from "@shared/geometry/boxIndex";
import { routeOfWire } from "@shared/geometry/wirePath";
import { arrowHead, roundedPath, type Point } from "@shared/geometry/wireRoute";
import { counted } from "@shared/text/words";

export interface Typeset { svg: string; width: number; height: number }
export type Typesetter = (tex: string) => Typeset;
/** A review comment's marker: `number` is drawn in it (the thread's number in the comments panel), `label` listed under the figure. */
export interface ExportPin { id: string; target: { blockId: string } | { wireId: string }; number: number; label: string }
export interface DiagramSvgInput {
  document: DiagramDocument;
  result: CheckedResult | null;
  meta: { title: string; version: number; savedAt: string };
  pins?: ExportPin[];
  typeset: Typesetter;
}

const INK = "#1f2630", SOFT = "#4d5663", PAPER = "#fcfbf8", SIGNAL = "#1d5c63", FAULT = "#b3261e";
const FONT = "'IBM Plex Sans', 'Helvetica Neue', Arial, sans-serif";

/** Escapes a user string for XML text and attributes. Example: xmlEscape("<&>") === "&lt;&amp;&gt;". */
export const xmlEscape = (s: string) => s.replace(/[<>&"']/g, (c) => ({ "<": "&lt;", ">": "&gt;", "&": "&amp;", '"': "&quot;", "'": "&apos;" })[c]!);

interface Placed { block: Block; x: number; y: number; w: number; h: number; tex: Typeset | null }

const r1 = (v: number) => Math.round(v * 10) / 10;
/** How far a dead time's parallelogram leans, in px. */
const SLANT = 10;

function sizeOf(block: Block, tex: Typeset | null): { w: number; h: number } {
  const est = estimatedSize(block);
  // A typeset formula may run wider than the editor's estimate: the box grows to hold it.
  const pad = block.type === "gain" ? 40 : 24;
  return { w: Math.max(est.width, tex ? tex.width + pad : 0), h: Math.max(est.height, tex ? tex.height + 16 : 0) };
}

function shapeOf(p: Placed): string {
  const { x, y, w, h } = p;
  const paint = `fill="${PAPER}" stroke="${INK}" stroke-width="2"`;
  switch (BLOCK_SHAPES[p.block.type]) {
    case "circle": return `<circle cx="${r1(x + w / 2)}" cy="${r1(y + h / 2)}" r="${r1(w / 2)}" ${paint}/>`;
    case "dot": return `<circle class="pickoff" cx="${r1(x + w / 2)}" cy="${r1(y + h / 2)}" r="6" fill="${INK}"/>`;
    case "triangle": return `<polygon points="${r1(x)},${r1(y)} ${r1(x + w)},${r1(y + h / 2)} ${r1(x)},${r1(y + h)}" ${paint}/>`;
    case "pill": return `<rect x="${r1(x)}" y="${r1(y)}" width="${r1(w)}" height="${h}" rx="${h / 2}" ${paint}/>`;
    case "slant": return `<polygon points="${r1(x + SLANT)},${r1(y)} ${r1(x + w)},${r1(y)} ${r1(x + w - SLANT)},${r1(y + h)} ${r1(x)},${r1(y + h)}" ${paint}/>`;
    default: return `<rect x="${r1(x)}" y="${r1(y)}" width="${r1(w)}" height="${r1(h)}" rx="2" ${paint}/>`;
  }
}

const boxOfPlaced = (p: Placed) => ({ x: p.x, y: p.y, width: p.w, height: p.h });
const inPort = (p: Placed, port: number | undefined): Point => inPoint(p.block, boxOfPlaced(p), port).at;

function blockSvg(p: Placed): string {
  const b = p.block;
  const name = b.label ? `${b.id}: ${b.label}` : b.id;
  const parts = [shapeOf(p)];
  if (p.tex) parts.push(`<g transform="translate(${r1(p.x + (b.type === "gain" ? 8 : (p.w - p.tex.width) / 2))} ${r1(p.y + (p.h - p.tex.height) / 2)})">${p.tex.svg}</g>`);
  if (b.type === "input" || b.type === "output") parts.push(`<text x="${r1(p.x + p.w / 2)}" y="${r1(p.y + p.h / 2 + 5)}" text-anchor="middle" font-size="14" font-family="${FONT}" fill="${INK}">${xmlEscape(b.label ?? b.id)}</text>`);
  if (b.type === "sum") {
    b.signs.forEach((sign, port) => {
      const at = inPort(p, port);
      const dx = port === 0 || port > 2 ? 10 : 10, dy = port === 1 ? -8 : port === 2 ? 16 : -4;
      parts.push(`<text class="sign" x="${r1(at.x + dx)}" y="${r1(at.y + dy)}" font-size="14" font-weight="600" font-family="${FONT}" fill="${INK}">${sign === "+" ? "+" : "−"}</text>`);
    });
  }
  if (b.type !== "input" && b.type !== "output") parts.push(`<text x="${r1(p.x + p.w / 2)}" y="${r1(p.y - 6)}" text-anchor="middle" font-size="11" font-family="${FONT}" fill="${SOFT}">${xmlEscape(name)}</text>`);
  return `<g id="block-${xmlEscape(b.id)}" data-block-id="${xmlEscape(b.id)}"><title>${xmlEscape(name)}</title>${parts.join("")}</g>`;
}

/** The diagram of a saved version as a self-contained SVG: blocks, wires with arrowheads, signs, formulas, title, version, date and result. */
export function diagramSvg({ document: doc, result, meta, pins = [], typeset }: DiagramSvgInput): string {
  const layout = doc.layout ?? {};
  const placed = new Map<string, Placed>();
  doc.blocks.forEach((block, i) => {
    const latex = block.type === "integrator" ? "\\frac{1}{s}" : block.type === "delay" ? delayLatex(block.expr) : hasExpression(block) ? expressionLatex(block.expr) : null;
    const tex = latex ? typeset(latex) : null;
    const at = layout[block.id] ?? fallbackPosition(i);
    placed.set(block.id, { block, x: at.x, y: at.y, ...sizeOf(block, tex), tex });
  });
  const all = [...placed.values()];
  // The captions above blocks count too, or a long one on the outermost block is cut off at the figure's edge.
  const drawn = boundsOf(all.flatMap((p) => [boxOfPlaced(p), captionBox(p.block, boxOfPlaced(p)) ?? boxOfPlaced(p)])) ?? { x: 0, y: 0, width: 0, height: 0 };
  const x0 = Math.min(0, drawn.x) - 40, y0 = Math.min(0, drawn.y) - 40;
  const x1 = Math.max(200, drawn.x + drawn.width) + 40, y1 = Math.max(100, drawn.y + drawn.height) + 60;
  const index = indexBoxes(all.map((p) => [p.block.id, boxOfPlaced(p)] as const));
  const wires = doc.wires.flatMap((w, i) => {
    const s = placed.get(w.from), t = placed.get(w.to);
    if (!s || !t) return [];
    const pts = routeOfWire(w, t.block, boxOfPlaced(s), boxOfPlaced(t), index);
    const id = w.id ?? `wire-${i}`;
    return [{ id, pts, d: roundedPath(pts), head: arrowHead(pts) }];
  });
  const head = 90 - y0;
  const width = x1 - x0;
  const resultTex = result && result.ok ? result.result.transfers.slice(0, 3).map((t) => typeset(`T_{${t.input}\\to ${t.output}}(s) = ${t.latex}`)) : [];
  const resultHeight = resultTex.reduce((sum, t) => sum + t.height + 12, 0) + 40;
  const pinRows = pins.length * 18;
  const height = y1 - y0 + 90 + resultHeight + pinRows;
  const out: string[] = [];
  out.push(`<svg xmlns="http://www.w3.org/2000/svg" width="${r1(width)}" height="${r1(height)}" viewBox="0 0 ${r1(width)} ${r1(height)}" font-family="${FONT}">`);
  out.push(`<title>${xmlEscape(meta.title)} — version ${meta.version}</title>`);
  out.push(`<rect width="100%" height="100%" fill="#ffffff"/>`);
  out.push(`<text x="24" y="36" font-size="20" font-weight="600" fill="${INK}">${xmlEscape(meta.title)}</text>`);
  out.push(`<text x="24" y="58" font-size="12" fill="${SOFT}">Version ${meta.version} · saved ${xmlEscape(meta.savedAt.slice(0, 10))} · Loopwright</text>`);
  out.push(`<g transform="translate(${r1(-x0)} ${r1(head)})">`);
  for (const w of wires) out.push(`<path class="wire" data-wire-id="${xmlEscape(w.id)}" d="${w.d}" fill="none" stroke="${SIGNAL}" stroke-width="1.6"/><path class="arrowhead" d="${w.head}" fill="${SIGNAL}"/>`);
  for (const p of all) out.push(blockSvg(p));
  pins.forEach((pin) => {
    const at = "blockId" in pin.target ? placed.get(pin.target.blockId) : undefined;
    const wire = "wireId" in pin.target ? wires.find((w) => w.id === (pin.target as { wireId: string }).wireId) : undefined;
    const c = at ? { x: at.x + at.w, y: at.y } : wire ? wire.pts[Math.floor(wire.pts.length / 2)] : null;
    if (!c) return;
    out.push(`<g class="pin" data-pin-id="${xmlEscape(pin.id)}"><title>${xmlEscape(pin.label)}</title><circle cx="${r1(c.x)}" cy="${r1(c.y)}" r="9" fill="#d4891c"/><text x="${r1(c.x)}" y="${r1(c.y + 4)}" text-anchor="middle" font-size="11" font-weight="600" fill="#ffffff">${pin.number}</text></g>`);
  });
  out.push(`</g>`);
  let y = y1 - y0 + 90;
  out.push(`<text x="24" y="${r1(y)}" font-size="13" font-weight="600" fill="${INK}">Closed-loop result</text>`);
  y += 12;
  if (result && !result.ok) out.push(`<text x="24" y="${r1(y + 12)}" font-size="12" fill="${FAULT}">Saved with ${counted(result.problems.length, "problem")}</text>`);
  if (!result) out.push(`<text x="24" y="${r1(y + 12)}" font-size="12" fill="${SOFT}">Not checked</text>`);
  for (const t of resultTex) {
    out.push(`<g class="result" transform="translate(24 ${r1(y)})">${t.svg}</g>`);
    y += t.height + 12;
  }
  y = y1 - y0 + 90 + resultHeight;
  pins.forEach((pin, i) => out.push(`<text x="24" y="${r1(y + i * 18)}" font-size="12" fill="${INK}">${pin.number}. ${xmlEscape(pin.label)}</text>`));
  out.push(`</svg>`);
  return out.join("\n");
}
