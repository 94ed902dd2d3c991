// Plain SVG, not recharts: an s-plane needs one scale for both axes (angles and damping lines read true)
// and × / ○ markers, both awkward to force through a chart library's independent axes.
import { useId } from "react";
import { niceStep } from "@shared/analysis/axisSteps";
import { formatComplex, formatNumber } from "@/features/editor/lib/analysisFormat";

export type MarkerKind = "pole" | "zero" | "start" | "end" | "breakaway" | "crossing";

export interface SPlaneMarker {
  re: number;
  im: number;
  kind: MarkerKind;
  /** Shown beside the marker, e.g. the multiplicity "2". */
  label?: string;
  /** Drawn heavier with a ring (dominant poles, current closed-loop poles). */
  emphasis?: boolean;
  /** What the marker's tooltip says, when the kind and position are not enough (e.g. the gain there). */
  title?: string;
}

/** A curve through the plane; null entries break it (e.g. where a locus branch does not exist). */
export type SPlanePath = ([number, number] | null)[];

/** Lines drawn over the paths: asymptotes (dashed, not fitted into the frame), a highlighted part, negative-gain branches. */
export type GuideKind = "asymptote" | "highlight" | "negative";
export interface SPlaneGuide {
  path: SPlanePath;
  kind: GuideKind;
}

type LegendKind = MarkerKind | GuideKind | "ring" | "line";

const GUIDE_STYLE: Record<GuideKind, { className: string; width: number; dash?: string }> = {
  asymptote: { className: "stroke-ink-faint", width: 1.2, dash: "6 4" },
  highlight: { className: "stroke-trace", width: 5 },
  negative: { className: "stroke-ink-soft", width: 1.4, dash: "2 3" },
};

interface Props {
  /** Accessible name of the chart. */
  label: string;
  /** One sentence describing what the chart shows; the detailed text alternative is a table next to it. */
  description: string;
  markers: SPlaneMarker[];
  paths?: SPlanePath[];
  guides?: SPlaneGuide[];
  /** Legend entries for what the markers mean; the caller knows which kinds it drew. */
  legend?: { symbol: LegendKind; text: string }[];
}

const W = 520;
const H = 340;
const PAD = { left: 48, right: 16, top: 14, bottom: 32 };
const PATH_COLOURS = ["stroke-signal", "stroke-trace", "stroke-steady", "stroke-ink-soft", "stroke-fault"];

/** One scale for both axes, fitted to every point and the origin, with a margin. */
function frame(points: [number, number][]) {
  const xs = [0, ...points.map((p) => p[0])];
  const ys = [0, ...points.map((p) => p[1])];
  const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const span = Math.max(x1 - x0, y1 - y0, 1e-9);
  const margin = span > 1e-9 ? 0.12 * span : 1;
  const [iw, ih] = [W - PAD.left - PAD.right, H - PAD.top - PAD.bottom];
  const unit = Math.max((x1 - x0 + 2 * margin) / iw, (y1 - y0 + 2 * margin) / ih); // s-units per pixel
  const [cx, cy] = [(x0 + x1) / 2, (y0 + y1) / 2];
  const left = cx - (iw * unit) / 2;
  const top = cy + (ih * unit) / 2;
  return {
    x: (re: number) => PAD.left + (re - left) / unit,
    y: (im: number) => PAD.top + (top - im) / unit,
    xRange: [left, left + iw * unit] as const,
    yRange: [top - ih * unit, top] as const,
    step: niceStep(Math.max(iw, ih) * unit, 6),
  };
}

const ticks = ([lo, hi]: readonly [number, number], step: number) =>
  Array.from({ length: Math.floor(hi / step) - Math.ceil(lo / step) + 1 }, (_, i) => (Math.ceil(lo / step) + i) * step);

function Marker({ m, x, y, decorative = false }: { m: SPlaneMarker; x: number; y: number; decorative?: boolean }) {
  const r = m.emphasis ? 6 : 5;
  const title = m.title ?? `${m.kind} at ${formatComplex([m.re, m.im])}${m.label ? ` (multiplicity ${m.label})` : ""}`;
  return (
    <g>
      {!decorative && <title>{title}</title>}
      {m.emphasis && <circle cx={x} cy={y} r={r + 4.5} className="fill-trace-tint stroke-trace" strokeWidth={1.5} />}
      {m.kind === "pole" && (
        <path d={`M${x - r} ${y - r}L${x + r} ${y + r}M${x - r} ${y + r}L${x + r} ${y - r}`} className="stroke-ink" strokeWidth={m.emphasis ? 2.5 : 2} />
      )}
      {m.kind === "zero" && <circle cx={x} cy={y} r={r} className="fill-paper-raised stroke-signal" strokeWidth={2} />}
      {m.kind === "start" && <circle cx={x} cy={y} r={3} className="fill-ink-soft" />}
      {m.kind === "end" && <rect x={x - 3.5} y={y - 3.5} width={7} height={7} className="fill-paper-raised stroke-ink-soft" strokeWidth={1.5} />}
      {m.kind === "breakaway" && <path d={`M${x} ${y - 5}L${x + 5} ${y}L${x} ${y + 5}L${x - 5} ${y}Z`} className="fill-steady stroke-ink" strokeWidth={1} />}
      {m.kind === "crossing" && <path d={`M${x} ${y - 5.5}L${x + 5} ${y + 4}L${x - 5} ${y + 4}Z`} className="fill-fault stroke-ink" strokeWidth={1} />}
      {m.label && (
        <text x={x + r + 3} y={y - r - 1} className="fill-ink text-[11px] font-semibold">
          {m.label}
        </text>
      )}
    </g>
  );
}

function LegendSymbol({ symbol }: { symbol: LegendKind }) {
  const guide = symbol in GUIDE_STYLE ? GUIDE_STYLE[symbol as GuideKind] : null;
  const m = { re: 0, im: 0, kind: symbol === "ring" ? "pole" : symbol, emphasis: symbol === "ring" } as SPlaneMarker;
  return (
    <svg width={24} height={24} viewBox="-12 -12 24 24" aria-hidden="true">
      {symbol === "line" && <path d="M-10 0H10" className="stroke-signal" strokeWidth={2} />}
      {guide && <path d="M-10 0H10" className={guide.className} strokeWidth={Math.min(guide.width, 4)} strokeDasharray={guide.dash} />}
      {symbol !== "line" && !guide && <Marker m={m} x={0} y={0} decorative />}
    </svg>
  );
}

/** The complex s-plane with equal axis scales, axes through the origin and the right half-plane shaded. */
export function SPlanePlot({ label, description, markers, paths = [], guides = [], legend = [] }: Props) {
  const descId = useId();
  const clipId = `splane-clip${descId.replace(/\W/g, "")}`;
  // Asymptotes run off to infinity: they are clipped to the frame, never fitted into it.
  const framed = [...paths, ...guides.filter((g) => g.kind !== "asymptote").map((g) => g.path)];
  const points: [number, number][] = [...markers.map((m): [number, number] => [m.re, m.im]), ...framed.flatMap((p) => p.filter((q) => q !== null))];
  const f = frame(points);
  const [ox, oy] = [f.x(0), f.y(0)];
  const segments = (p: SPlanePath) => p.map((q, i) => (q ? `${i === 0 || !p[i - 1] ? "M" : "L"}${f.x(q[0]).toFixed(1)} ${f.y(q[1]).toFixed(1)}` : "")).join("");
  return (
    <figure className="flex flex-col gap-1">
      <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-label={label} aria-describedby={descId} className="w-full max-w-[560px] rounded border border-rule bg-paper-raised">
        <defs>
          <clipPath id={clipId}>
            <rect x={PAD.left} y={PAD.top} width={W - PAD.left - PAD.right} height={H - PAD.top - PAD.bottom} />
          </clipPath>
        </defs>
        <rect x={ox} y={PAD.top} width={Math.max(0, W - PAD.right - ox)} height={H - PAD.top - PAD.bottom} className="fill-fault-tint" opacity={0.45} />
        {ticks(f.xRange, f.step).map((t) => (
          <g key={`x${t}`}>
            <line x1={f.x(t)} x2={f.x(t)} y1={PAD.top} y2={H - PAD.bottom} className="stroke-rule" strokeWidth={0.6} />
            <text x={f.x(t)} y={H - PAD.bottom + 14} textAnchor="middle" className="fill-ink-faint text-[10px]">{formatNumber(t, 3)}</text>
          </g>
        ))}
        {ticks(f.yRange, f.step).map((t) => (
          <g key={`y${t}`}>
            <line x1={PAD.left} x2={W - PAD.right} y1={f.y(t)} y2={f.y(t)} className="stroke-rule" strokeWidth={0.6} />
            <text x={PAD.left - 5} y={f.y(t) + 3} textAnchor="end" className="fill-ink-faint text-[10px]">{formatNumber(t, 3)}</text>
          </g>
        ))}
        <line x1={PAD.left} x2={W - PAD.right} y1={oy} y2={oy} className="stroke-ink-soft" strokeWidth={1.2} />
        <line x1={ox} x2={ox} y1={PAD.top} y2={H - PAD.bottom} className="stroke-ink-soft" strokeWidth={1.2} />
        <text x={W - PAD.right - 2} y={oy - 5} textAnchor="end" className="fill-ink-soft text-[11px] italic">Re(s)</text>
        <text x={ox + 5} y={PAD.top + 11} className="fill-ink-soft text-[11px] italic">Im(s)</text>
        <g clipPath={`url(#${clipId})`}>
          {guides.filter((g) => g.kind === "highlight").map((g, i) => (
            <path key={`h${i}`} fill="none" d={segments(g.path)} className={GUIDE_STYLE.highlight.className} opacity={0.35} strokeWidth={GUIDE_STYLE.highlight.width} strokeLinecap="round" />
          ))}
          {guides.filter((g) => g.kind !== "highlight").map((g, i) => (
            <path key={`g${i}`} fill="none" d={segments(g.path)} className={GUIDE_STYLE[g.kind].className} strokeWidth={GUIDE_STYLE[g.kind].width} strokeDasharray={GUIDE_STYLE[g.kind].dash} />
          ))}
          {paths.map((p, i) => (
            <path key={i} d={segments(p)} fill="none" className={PATH_COLOURS[i % PATH_COLOURS.length]} strokeWidth={1.8} strokeLinejoin="round" />
          ))}
          {markers.map((m, i) => (
            <Marker key={i} m={m} x={f.x(m.re)} y={f.y(m.im)} />
          ))}
        </g>
      </svg>
      <figcaption className="flex flex-wrap items-center gap-x-4 gap-y-1 text-xs text-ink-soft">
        <span id={descId}>{description}</span>
        {legend.map((l) => (
          <span key={l.text} className="inline-flex items-center gap-1">
            <LegendSymbol symbol={l.symbol} />
            {l.text}
          </span>
        ))}
        <span className="inline-flex items-center gap-1">
          <span aria-hidden="true" className="inline-block h-3 w-4 rounded-sm bg-fault-tint" />
          Right half-plane
        </span>
      </figcaption>
    </figure>
  );
}
