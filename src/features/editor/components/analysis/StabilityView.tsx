import { useId } from "react";
import type { Analysis, HiddenMode } from "@shared/analysis/analyze";
import type { RootInfo } from "@shared/analysis/poles";
import type { Verdict } from "@shared/analysis/stability";
import { SPlanePlot, type SPlaneMarker } from "@/features/editor/components/analysis/SPlanePlot";
import { formatComplex, formatNumber, formatQuantity, rootRows, verdictWord } from "@/features/editor/lib/analysisFormat";
import { counted, plural } from "@shared/text/words";

const TONE: Record<Verdict, { box: string; heading: string; mark: string }> = {
  stable: { box: "border-steady bg-steady-tint", heading: "text-steady", mark: "✓" },
  marginal: { box: "border-trace bg-trace-tint", heading: "text-ink", mark: "~" },
  unstable: { box: "border-fault bg-fault-tint", heading: "text-fault", mark: "!" },
};

const TH = "border-b border-rule-strong px-2 py-1 text-left font-medium text-ink-soft";
const TD = "border-b border-rule px-2 py-1 font-mono";


const sameRoot = (a: RootInfo, b: RootInfo) => a.re === b.re && Math.abs(a.im) === Math.abs(b.im);

/** Stability verdict, hidden modes, pole-zero map, pole and zero tables and the DC gain of the chosen pair. */
export function StabilityView({ analysis }: { analysis: Analysis }) {
  const { stability, poles, zeros, dominantPoles } = analysis;
  const mapId = useId();
  const isDominant = (r: RootInfo) => dominantPoles.some((d) => sameRoot(d, r));
  const markers: SPlaneMarker[] = [
    ...poles.map((p): SPlaneMarker => ({ re: p.re, im: p.im, kind: "pole", label: p.multiplicity > 1 ? String(p.multiplicity) : undefined, emphasis: isDominant(p) })),
    ...zeros.map((z): SPlaneMarker => ({ re: z.re, im: z.im, kind: "zero", label: z.multiplicity > 1 ? String(z.multiplicity) : undefined })),
  ];
  const count = (rs: RootInfo[]) => rs.reduce((n, r) => n + r.multiplicity, 0);
  return (
    <div className="flex flex-col gap-4">
      <VerdictBox verdict={stability.verdict} reason={stability.reason} label="Stability verdict" />
      <CharacteristicNote analysis={analysis} />
      <HiddenModes modes={analysis.hiddenModes} />
      <section aria-labelledby={mapId} className="flex flex-col gap-2">
        <h4 id={mapId} className="text-sm font-semibold">Pole-zero map</h4>
        <SPlanePlot
          label="Pole-zero map of T(s) in the s-plane"
          description={`${counted(count(poles), "pole")} (×) and ${counted(count(zeros), "finite zero")} (○); the numbers beside a marker are multiplicities. The tables below list the same values.`}
          markers={markers}
          legend={[
            { symbol: "pole", text: "Pole" },
            { symbol: "zero", text: "Zero" },
            { symbol: "ring", text: "Dominant pole" },
          ]}
        />
      </section>
      <RootTable caption="Poles of T(s)" roots={poles} isDominant={isDominant} empty="T(s) has no poles." />
      <RootTable caption="Zeros of T(s)" roots={zeros} empty="T(s) has no finite zeros." />
      <DcGain analysis={analysis} />
    </div>
  );
}

/** The verdict as a word in a heading (colour and mark repeat it, never replace it) and the reason. */
function VerdictBox({ verdict, reason, label }: { verdict: Verdict; reason: string; label: string }) {
  const tone = TONE[verdict];
  return (
    <section aria-label={label} className={`rounded border-l-4 px-3 py-2 ${tone.box}`}>
      <div className="flex items-center gap-2">
        <span aria-hidden="true" className={`font-mono text-base font-bold ${tone.heading}`}>{tone.mark}</span>
        <h3 className={`text-base font-semibold ${tone.heading}`}>{verdictWord(verdict)}</h3>
      </div>
      <p className="text-sm text-ink">{reason}</p>
    </section>
  );
}

function CharacteristicNote({ analysis }: { analysis: Analysis }) {
  const { characteristic: chi, stability } = analysis;
  if (chi.stability === null) {
    return <p className="text-xs text-ink-soft">The diagram&apos;s characteristic polynomial is above degree 100: its own verdict was not worked out.</p>;
  }
  if (chi.sameVerdict !== false) return null;
  return (
    <section aria-label="Characteristic polynomial verdict" className="rounded border border-fault/60 bg-paper-raised px-3 py-2 text-sm">
      <p className="font-semibold">
        The diagram is {verdictWord(chi.stability.verdict).toLowerCase()}, although T(s) is {verdictWord(stability.verdict).toLowerCase()}.
      </p>
      <p className="text-ink-soft">
        Its characteristic polynomial, hidden modes included, is <span className="font-mono text-ink">{chi.polynomial}</span>: {chi.stability.reason} Some of
        its roots cancel out of T(s), so the transfer function alone does not show them, but the signals inside the loop still carry them.
      </p>
    </section>
  );
}

const uniqueRoots = (roots: [number, number][]) => [...new Set(roots.map((r) => formatComplex(r)))].join(", ");

function HiddenModes({ modes }: { modes: HiddenMode[] }) {
  const headingId = useId();
  if (!modes.length) return null;
  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-1">
      <h4 id={headingId} className="text-sm font-semibold">Hidden modes</h4>
      <ul className="flex flex-col gap-1 text-sm">
        {modes.map((m) => (
          <li
            key={`${m.source}:${m.factor}`}
            role={m.unstable ? "alert" : undefined}
            className={`rounded border px-3 py-1.5 ${m.unstable ? "border-fault/60 bg-fault-tint text-fault" : "border-rule bg-paper-raised"}`}
          >
            <span className="font-semibold">{m.unstable ? "Unstable hidden mode" : "Stable hidden mode"}</span>{" "}
            <span className="font-mono">{m.factor}</span> ({plural(m.roots.length, "root")} {uniqueRoots(m.roots)}):{" "}
            {m.source === "reduction" ? "cancelled from T(s) for every parameter value." : "cancels from T(s) only at these parameter values."}
            {m.unstable && " It does not appear in T(s), but it still grows inside the loop."}
          </li>
        ))}
      </ul>
    </section>
  );
}

function RootTable({ caption, roots, isDominant, empty }: { caption: string; roots: RootInfo[]; isDominant?: (r: RootInfo) => boolean; empty: string }) {
  const rows = rootRows(roots);
  if (!rows.length) return <p className="text-sm text-ink-soft">{empty}</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm">
        <caption className="pb-1 text-left text-sm font-semibold">{caption}</caption>
        <thead>
          <tr>
            <th scope="col" className={TH}>Value</th>
            <th scope="col" className={TH}>Exact</th>
            <th scope="col" className={TH}>Multiplicity</th>
            <th scope="col" className={TH}>Damping ratio ζ</th>
            <th scope="col" className={TH}>Natural frequency ωn</th>
            {isDominant && <th scope="col" className={TH}>Dominant</th>}
          </tr>
        </thead>
        <tbody>
          {rows.map(({ value, exact, root }) => (
            <tr key={`${root.factor}:${root.re}:${root.im}`}>
              <th scope="row" className={`${TD} text-left font-normal whitespace-nowrap`}>{value}</th>
              <td className={`${TD} whitespace-nowrap`}>{exact ?? <span className="font-sans text-ink-faint">numeric only</span>}</td>
              <td className={TD}>{root.multiplicity}</td>
              <td className={TD}>{root.damping === null ? <span className="font-sans text-ink-faint">real</span> : formatNumber(root.damping)}</td>
              <td className={TD}>{root.naturalFrequency === null ? <span className="font-sans text-ink-faint">real</span> : formatNumber(root.naturalFrequency)}</td>
              {isDominant && <td className={`${TD} font-sans`}>{isDominant(root) ? "Dominant" : ""}</td>}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function DcGain({ analysis }: { analysis: Analysis }) {
  const { dcGain, stability } = analysis;
  return (
    <section aria-label="DC gain" className="text-sm">
      <h4 className="font-semibold">DC gain</h4>
      {dcGain ? (
        <p>
          T(0) = <span className="font-mono">{formatQuantity(dcGain)}</span>
          {stability.verdict !== "stable" && <span className="text-ink-soft"> — the output does not settle (T(s) is not stable), so no steady output follows this gain.</span>}
        </p>
      ) : (
        <p className="text-ink-soft">No DC gain: s = 0 is a pole of T(s), so T(0) is not finite.</p>
      )}
    </section>
  );
}
