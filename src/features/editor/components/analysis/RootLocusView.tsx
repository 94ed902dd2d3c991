import { useId } from "react";
import type { Analysis } from "@shared/analysis/analyze";
import type { SweepData } from "@shared/analysis/answer";
import type { RootLocus } from "@shared/analysis/sweep";
import { counted } from "@shared/text/words";
import { LocusLandmarks } from "@/features/editor/components/analysis/LocusLandmarks";
import { SPlanePlot, type SPlaneGuide, type SPlaneMarker } from "@/features/editor/components/analysis/SPlanePlot";
import { formatComplex, formatNumber, rootRows } from "@/features/editor/lib/analysisFormat";

type Point = [number, number];

/** Each branch with the points outside the slider range blanked: the part drawn as the highlight. */
const inRange = (locus: RootLocus, [lo, hi]: [number, number]) =>
  locus.branches.map((b) => b.map((r, i) => (locus.values[i] >= lo && locus.values[i] <= hi ? r : null)));

/** Branch b's pole at gain k, found in whichever side of the locus holds k; null where k is not sampled. */
function at(sweep: SweepData, b: number, k: number): Point | null {
  const side = k >= 0 ? sweep.locus : sweep.negativeLocus;
  const i = side ? side.values.indexOf(k) : -1;
  return i < 0 ? null : (side!.branches[b]?.[i] ?? null);
}

/** Dashed lines from the centroid out along each asymptote, long enough to leave any frame the locus fits. */
function asymptotes(sweep: SweepData, negative: boolean): SPlaneGuide[] {
  const g = sweep.geometry;
  if (!g?.centroid) return [];
  const c = g.centroid.value;
  const far = 10 * Math.max(1, ...[sweep.locus, sweep.negativeLocus].flatMap((l) => l?.branches.flat() ?? []).map((r) => (r ? Math.hypot(r[0] - c, r[1]) : 0)));
  const angles = [...g.asymptotes.positive, ...(negative ? g.asymptotes.negative : [])];
  return angles.map((deg) => ({ kind: "asymptote", path: [[c, 0], [c + far * Math.cos((deg * Math.PI) / 180), far * Math.sin((deg * Math.PI) / 180)]] }));
}

/** The root locus over all gains: open-loop poles and zeros, asymptotes, landmarks, the slider range highlighted. */
export function RootLocusView({ sweep, analysis, negative, onNegative }: { sweep: SweepData; analysis: Analysis; negative: boolean; onNegative: (on: boolean) => void }) {
  const headingId = useId();
  const p = sweep.parameter;
  const [lo, hi] = sweep.range;
  const g = sweep.geometry;
  const showNegative = sweep.negativeLocus !== null;
  const gainShown = (k: number) => k > 0 || showNegative;
  const markers: SPlaneMarker[] = [
    ...(g?.poles ?? []).map(([re, im]): SPlaneMarker => ({ re, im, kind: "pole", title: `open-loop pole at ${formatComplex([re, im])}` })),
    ...(g?.zeros ?? []).map(([re, im]): SPlaneMarker => ({ re, im, kind: "zero", title: `open-loop zero at ${formatComplex([re, im])}` })),
    ...(g?.breakaways ?? []).filter((b) => gainShown(b.gain.value)).map((b): SPlaneMarker => ({
      re: b.s[0], im: b.s[1], kind: "breakaway", title: `breakaway point at ${formatComplex(b.s)}, ${p} = ${formatNumber(b.gain.value)}`,
    })),
    ...(g?.crossings ?? []).filter((c) => gainShown(c.gain.value)).flatMap((c): SPlaneMarker[] => [1, -1].map((sign) => ({
      re: 0, im: sign * c.omega.value, kind: "crossing", label: `${p} = ${formatNumber(c.gain.value, 3)}`, title: `imaginary-axis crossing at ±${formatNumber(c.omega.value)}j, ${p} = ${formatNumber(c.gain.value)}`,
    }))),
    ...analysis.poles.map((r): SPlaneMarker => ({ re: r.re, im: r.im, kind: "pole", emphasis: true, title: `closed-loop pole now at ${formatComplex([r.re, r.im])}` })),
  ];
  const guides: SPlaneGuide[] = [
    ...asymptotes(sweep, showNegative),
    ...(sweep.negativeLocus?.branches ?? []).map((path): SPlaneGuide => ({ kind: "negative", path })),
    ...[sweep.locus, sweep.negativeLocus].flatMap((l) => (l ? inRange(l, sweep.range) : [])).map((path): SPlaneGuide => ({ kind: "highlight", path })),
  ];
  const now = `${p} = ${formatNumber(sweep.current)}`;
  const start = sweep.locus.values[0];
  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-2">
      <h4 id={headingId} className="text-sm font-semibold">Root locus of the closed-loop poles</h4>
      <label className="inline-flex items-center gap-2 text-sm">
        <input type="checkbox" checked={negative} onChange={(e) => onNegative(e.target.checked)} />
        Include negative gains
      </label>
      <SPlanePlot
        label={`Root locus: closed-loop poles as ${p} runs from ${formatNumber(start)} to ${showNegative ? "±" : ""}∞; the slider range ${formatNumber(lo)} to ${formatNumber(hi)} is highlighted`}
        description={`${counted(sweep.locus.branches.length, "branch", "branches")}, one line each; the tables below give the landmarks and where each branch is at the ends of the slider range.`}
        markers={markers}
        paths={sweep.locus.branches}
        guides={guides}
        legend={[
          { symbol: "line", text: `Branch, ${p} ≥ 0` },
          ...(showNegative ? [{ symbol: "negative" as const, text: `Branch, ${p} < 0` }] : []),
          { symbol: "highlight", text: `Slider range ${formatNumber(lo)} … ${formatNumber(hi)}` },
          ...(g ? [{ symbol: "pole" as const, text: "Open-loop pole" }, { symbol: "zero" as const, text: "Open-loop zero" }] : []),
          ...(g?.centroid ? [{ symbol: "asymptote" as const, text: "Asymptote" }] : []),
          ...(g?.breakaways.length ? [{ symbol: "breakaway" as const, text: "Breakaway point" }] : []),
          ...(g?.crossings.length ? [{ symbol: "crossing" as const, text: "Imaginary-axis crossing" }] : []),
          { symbol: "ring", text: `Closed-loop poles now (${now})` },
        ]}
      />
      {sweep.locusNote && <p className="text-sm text-ink-soft">{sweep.locusNote}</p>}
      <p className="text-sm">
        Closed-loop poles at {now}:{" "}
        <span className="font-mono">{rootRows(analysis.poles).map((r) => r.value).join(", ") || "none"}</span>
      </p>
      {g && <LocusLandmarks geometry={g} parameter={p} negative={showNegative} />}
      <div className="overflow-x-auto">
        <table className="border-collapse text-sm">
          <caption className="pb-1 text-left font-semibold">Locus branches</caption>
          <thead>
            <tr>
              {["Branch", `At ${p} = ${formatNumber(start)}`, `At ${p} = ${formatNumber(lo)}`, `At ${p} = ${formatNumber(hi)}`].map((h) => (
                <th key={h} scope="col" className="border-b border-rule-strong px-2 py-1 text-left font-medium text-ink-soft">{h}</th>
              ))}
            </tr>
          </thead>
          <tbody>
            {sweep.locus.branches.map((_, b) => (
              <tr key={b}>
                <th scope="row" className="border-b border-rule px-2 py-1 text-left font-normal">{b + 1}</th>
                {[start, lo, hi].map((k, j) => {
                  const r = at(sweep, b, k);
                  return <td key={j} className="border-b border-rule px-2 py-1 font-mono">{r ? formatComplex(r) : "—"}</td>;
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
