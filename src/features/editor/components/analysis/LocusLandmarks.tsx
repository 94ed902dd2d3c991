import type { LocusGeometry, LocusNumber } from "@shared/analysis/locusGeometry";
import { formatComplex, formatQuantity, withMinus } from "@/features/editor/lib/analysisFormat";

/** An exact value as printed, with its decimal beside it when the two differ; a float to 4 digits. */
const shown = (x: LocusNumber) => formatQuantity({ value: x.value, exact: x.exact ? x.text : null });

const degrees = (angles: number[]) => angles.map((a) => `${withMinus(String(Math.round(a * 100) / 100))}°`).join(", ");

/**
 * The landmarks of the locus as a table, the plot's text alternative for them: centroid, asymptote angles,
 * breakaway points and imaginary-axis crossings, each with its gain. Negative gains only when they are drawn.
 */
export function LocusLandmarks({ geometry, parameter, negative }: { geometry: LocusGeometry; parameter: string; negative: boolean }) {
  const k = parameter;
  const wanted = (gain: LocusNumber) => gain.value > 0 || negative;
  const rows: [string, string, string][] = [];
  if (geometry.centroid) rows.push(["Centroid of the asymptotes", `s = ${shown(geometry.centroid)}`, "—"]);
  if (geometry.asymptotes.positive.length) rows.push(["Asymptote angles", degrees(geometry.asymptotes.positive), `${k} > 0`]);
  if (negative && geometry.asymptotes.negative.length) rows.push(["Asymptote angles", degrees(geometry.asymptotes.negative), `${k} < 0`]);
  for (const b of geometry.breakaways.filter((x) => wanted(x.gain))) {
    const where = b.s[1] === 0 ? shown({ value: b.s[0], text: b.text, exact: b.exact }) : formatComplex(b.s);
    rows.push([b.s[1] === 0 ? "Breakaway point" : "Breakaway point (complex)", `s = ${where}`, `${k} = ${shown(b.gain)}`]);
  }
  for (const c of geometry.crossings.filter((x) => wanted(x.gain))) rows.push(["Imaginary-axis crossing", `ω = ±${shown(c.omega)}`, `${k} = ${shown(c.gain)}`]);
  if (!rows.length) return null;
  return (
    <div className="overflow-x-auto">
      <table className="border-collapse text-sm">
        <caption className="pb-1 text-left font-semibold">Locus landmarks</caption>
        <thead>
          <tr>
            {["Landmark", "Where", "Gain"].map((h) => (
              <th key={h} scope="col" className="border-b border-rule-strong px-2 py-1 text-left font-medium text-ink-soft">{h}</th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map(([name, where, gain], i) => (
            <tr key={i}>
              <th scope="row" className="border-b border-rule px-2 py-1 text-left font-normal">{name}</th>
              <td className="border-b border-rule px-2 py-1 font-mono">{where}</td>
              <td className="border-b border-rule px-2 py-1 font-mono">{gain}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
