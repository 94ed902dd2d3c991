import type { Analysis } from "@shared/analysis/analyze";
import type { InputRole } from "@shared/analysis/inputRole";
import { ERROR_CONSTANTS, type Quantity } from "@shared/analysis/steadyState";
import { capital } from "@shared/text/words";
import { Tex } from "@/features/editor/components/Tex";
import { formatQuantity } from "@/features/editor/lib/analysisFormat";

const TH = "border-b border-rule-strong px-2 py-1 text-left font-medium text-ink-soft";
const TD = "border-b border-rule px-2 py-1 align-top";

const INPUTS = [
  { key: "step", name: "Unit step", signal: "r(t) = 1" },
  { key: "ramp", name: "Unit ramp", signal: "r(t) = t" },
  { key: "parabola", name: "Unit parabola", signal: "r(t) = t²/2" },
] as const;

/** The value in monospace (∞ and "—" included, never blank) with the note that says where it came from. */
function Value({ q }: { q: Quantity }) {
  const missing = q.value === null;
  return (
    <>
      <span className={`font-mono ${missing ? "text-ink-faint" : ""}`}>{formatQuantity(q)}</span>
      {q.note && <span className="block text-xs text-ink-soft">{q.note}</span>}
    </>
  );
}

/** Final and initial values, steady-state errors, system type and error constants of the chosen pair. */
export function SteadyStateView({ analysis }: { analysis: Analysis }) {
  const ss = analysis.steadyState;
  return (
    <div className="flex flex-col gap-4 text-sm">
      <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-2">
        <dt className="font-semibold">Final value of the step response</dt>
        <dd>
          <Value q={ss.finalValue} />
        </dd>
        <dt className="font-semibold">Initial value of the step response</dt>
        <dd>
          <Value q={ss.initialValue} />
        </dd>
      </dl>
      {ss.inputRole.kind === "disturbance" ? (
        <DisturbanceRejection analysis={analysis} role={ss.inputRole} />
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full border-collapse">
            <caption className="pb-1 text-left font-semibold">
              Steady-state error e = r − y (input {analysis.input}, output {analysis.output})
            </caption>
            <thead>
              <tr>
                <th scope="col" className={TH}>Input</th>
                <th scope="col" className={TH}>Steady-state error</th>
              </tr>
            </thead>
            <tbody>
              {INPUTS.map((i) => (
                <tr key={i.key}>
                  <th scope="row" className={`${TD} text-left font-normal`}>
                    {i.name} <span className="font-mono text-xs text-ink-soft">{i.signal}</span>
                  </th>
                  <td className={TD}>
                    <Value q={ss.errors[i.key]} />
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      <LoopConstants analysis={analysis} />
    </div>
  );
}

/**
 * For an input that is not the reference: what a unit step there leaves at the output once settled (the final value)
 * and whether the loop rejects it fully, instead of an error e = r − y that would mean nothing.
 */
function DisturbanceRejection({ analysis, role }: { analysis: Analysis; role: InputRole & { kind: "disturbance" } }) {
  const final = analysis.steadyState.finalValue;
  const rejected = final.value === 0;
  return (
    <section aria-label="Disturbance rejection" className="flex flex-col gap-1">
      <h3 className="font-semibold">
        Disturbance rejection ({analysis.input} → {analysis.output})
      </h3>
      <p>
        {analysis.input} enters the loop at {role.entersAt.join(", ")}, not at its comparison junction {role.junction}: it is a disturbance,
        so e = r − y does not apply.
      </p>
      <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1">
        <dt className="font-medium">Output after a unit step at {analysis.input}, settled</dt>
        <dd>
          <Value q={final} />
        </dd>
        <dt className="font-medium">Rejection</dt>
        <dd>{final.value === null ? "—" : rejected ? "Full: the step leaves no lasting effect on the output." : "Partial: the step leaves a lasting offset of the value above."}</dd>
      </dl>
    </section>
  );
}

function LoopConstants({ analysis }: { analysis: Analysis }) {
  const { steadyState: ss, loop } = analysis;
  if (ss.constants === null || ss.systemType === null) {
    return (
      <section aria-label="System type and error constants">
        <h4 className="font-semibold">System type and error constants</h4>
        <p className="text-ink-soft">
          There is no loop gain for this pair (no feedback loop was broken), so the system type and the position, velocity and acceleration error constants do not apply.
        </p>
      </section>
    );
  }
  const fromConstants = ss.errorsFromConstants;
  const [pos, vel, acc] = ERROR_CONSTANTS;
  const rows = [
    { constant: pos, k: ss.constants.Kp, error: fromConstants?.step, formula: `\\frac{1}{1 + ${pos.latex}}` },
    { constant: vel, k: ss.constants.Kv, error: fromConstants?.ramp, formula: `\\frac{1}{${vel.latex}}` },
    { constant: acc, k: ss.constants.Ka, error: fromConstants?.parabola, formula: `\\frac{1}{${acc.latex}}` },
  ];
  return (
    <section aria-label="System type and error constants" className="flex flex-col gap-2">
      <h4 className="font-semibold">System type and error constants</h4>
      {loop && (
        <p className="text-ink-soft">
          From the loop gain broken at <span className="font-mono text-ink">{loop.breakPoint.label}</span>:{" "}
          <Tex latex={`L(s) = ${loop.L.latex}`} />
        </p>
      )}
      <p>
        System type: <span className="font-mono font-semibold">{ss.systemType}</span>{" "}
        <span className="text-ink-soft">(poles of L(s) at s = 0, net of zeros there)</span>
      </p>
      <div className="overflow-x-auto">
        <table className="w-full border-collapse">
          <caption className="pb-1 text-left font-semibold">Error constants and the errors they give</caption>
          <thead>
            <tr>
              <th scope="col" className={TH}>Error constant</th>
              <th scope="col" className={TH}>Value</th>
              <th scope="col" className={TH}>Unity-feedback error</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.constant.key}>
                <th scope="row" className={`${TD} text-left font-normal`}>
                  {capital(r.constant.name)} <Tex latex={r.constant.latex} />
                </th>
                <td className={TD}>
                  <Value q={r.k} />
                </td>
                <td className={TD}>
                  <span className="block text-xs text-ink-soft"><Tex latex={r.formula} /></span>
                  {r.error && <Value q={r.error} />}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="text-xs text-ink-soft">
        The errors from the constants assume unity feedback with the input at the reference; the table above is the exact error e = r − y of this pair.
      </p>
    </section>
  );
}
