import type { ImplementationView as View, ImplementRequest } from "@shared/implement/view";
import { digits17, METHOD_NAMES } from "@shared/implement/differenceEquation";
import { Button } from "@/components/Button";
import { Tex } from "@/features/editor/components/Tex";
import { DiscreteBode } from "@/features/editor/components/analysis/DiscreteBode";
import { ImplementationControls } from "@/features/editor/components/analysis/ImplementationControls";
import { StateSpaceMatrices } from "@/features/editor/components/analysis/StateSpaceMatrices";
import { copyText } from "@/features/editor/lib/copyText";
import { formatNumber } from "@/features/editor/lib/analysisFormat";

interface Props {
  view: View | null;
  request: ImplementRequest;
  /** The analysed pair, "r → y". */
  pair: string;
  onRequest: (change: Partial<ImplementRequest>) => void;
}

type Done = Extract<View, { ok: true }>;
type Discrete = Extract<Done["discrete"], { ok: true }>;

const Refusal = ({ message }: { message: string }) => (
  <p role="alert" className="rounded border border-fault bg-fault-tint px-3 py-2 text-sm">{message}</p>
);

/** One code listing with its copy button. */
function Listing({ label, text, what }: { label: string; text: string; what: string }) {
  return (
    <section aria-label={label} className="flex flex-col gap-1">
      <div className="flex items-center justify-between gap-2">
        <h4 className="text-xs font-semibold text-ink-soft">{label}</h4>
        <Button size="sm" onClick={() => void copyText(text, what)}>Copy {what}</Button>
      </div>
      <pre className="overflow-x-auto rounded border border-rule bg-paper px-3 py-2 font-mono text-xs">{text}</pre>
    </section>
  );
}

/** b and a to 17 significant digits, the digits that read back the same double. */
function Coefficients({ d }: { d: Discrete }) {
  const { b, a } = d.equation;
  return (
    <table aria-label="Coefficients of H(z⁻¹)" className="border-collapse text-xs">
      <thead>
        <tr className="border-b border-rule text-left">
          <th scope="col" className="py-1 pr-3 font-medium">power of z⁻¹</th>
          <th scope="col" className="py-1 pr-3 font-medium">numerator b</th>
          <th scope="col" className="py-1 font-medium">denominator a</th>
        </tr>
      </thead>
      <tbody>
        {b.map((x, i) => (
          <tr key={i} className="border-b border-rule last:border-b-0">
            <th scope="row" className="py-0.5 pr-3 text-left font-mono font-normal">{i}</th>
            <td className="py-0.5 pr-3 font-mono" aria-label={`b${i}`}>{digits17(x)}</td>
            <td className="py-0.5 font-mono" aria-label={`a${i}`}>{digits17(a[i])}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

function DiscreteSection({ d, done }: { d: Discrete; done: Done }) {
  const how = `${METHOD_NAMES[d.method]}${d.prewarp !== null ? ` at ω = ${formatNumber(d.prewarp)} rad/s` : ""}, Ts = ${formatNumber(d.ts, 6)} s`;
  return (
    <section aria-label="Discrete equivalent" className="flex flex-col gap-3">
      <h3 className="text-sm font-semibold">Discrete equivalent: {how}</h3>
      <div className="overflow-x-auto py-1 text-base">
        <Tex latex={d.equation.latex} display />
      </div>
      <Coefficients d={d} />
      <Listing label="Difference equation" text={d.equation.text} what="difference equation" />
      <Listing label="C code" text={d.equation.code} what="C code" />
      <DiscreteBode response={d.response} bandwidth={done.advice.bandwidth} />
    </section>
  );
}

/**
 * The Implementation tab: a block's transfer or the analysed pair's closed loop as a discrete controller at Ts
 * (H(z⁻¹), coefficients, difference equation and C code, Bode overlay up to Nyquist, the Ts advice) and as a
 * state-space realisation with its downloads. Computed in the editor's worker while the tab is open.
 */
export function ImplementationView({ view, request, pair, onRequest }: Props) {
  const prewarpInUse = view?.ok && view.discrete.ok ? view.discrete.prewarp : null;
  return (
    <div className="flex flex-col gap-4">
      <ImplementationControls request={request} candidates={view?.candidates ?? []} pair={pair} prewarpInUse={prewarpInUse} onRequest={onRequest} />
      {!view && <p className="text-sm text-ink-soft">Working out the implementation…</p>}
      {view && !view.ok && <Refusal message={view.message} />}
      {view?.ok && (
        <>
          <p className="text-sm">
            {view.subject.what}: <Tex latex={`G(s) = ${view.continuous.latex}`} />
          </p>
          {view.advice.warning ? (
            <p role="alert" className="rounded border-l-4 border-trace bg-trace-tint px-3 py-2 text-sm">{view.advice.warning}</p>
          ) : (
            view.advice.ratio !== null && (
              <p className="text-xs text-ink-soft">
                2π/Ts is {formatNumber(view.advice.ratio, 3)} times the closed-loop bandwidth {formatNumber(view.advice.bandwidth ?? NaN)} rad/s of {view.advice.loop} (common practice: 10–30 times).
              </p>
            )
          )}
          {view.discrete.ok ? <DiscreteSection d={view.discrete} done={view} /> : <Refusal message={view.discrete.message} />}
          {view.stateSpace.ok ? <StateSpaceMatrices ss={view.stateSpace} id={view.subject.id} /> : <Refusal message={view.stateSpace.message} />}
        </>
      )}
    </div>
  );
}
