// Steady state by the limit theorems on exact polynomials: every limit s → 0 is read from the lowest
// coefficients, so "infinite" and "zero" are exact, never a large or small float.
import { qAdd, qDiv, qInv, qOne, qToNumber, qToString, type Q } from "@shared/algebra/rational";
import type { InputRole } from "@shared/analysis/inputRole";
import type { Verdict } from "@shared/analysis/stability";
import { upDeg, upSub, upZeroOrder, type UPoly } from "@shared/analysis/upoly";

/** A number, an infinite value (as a string, so JSON keeps it), or null when the quantity does not exist. */
export type LimitValue = number | "Infinity" | "-Infinity" | null;

export interface Quantity {
  value: LimitValue;
  /** Exact text when finite ("1/3"), else null. */
  exact: string | null;
  /** Why the value is null or infinite, or which theorem gave it. */
  note: string;
}

/**
 * The three error constants as every reader sees them: in words, with a symbol subscripted by a word, so that none is
 * taken for a parameter of the diagram (Kp and Kv are common parameter names). `key` is the field name in
 * `SteadyState.constants` and the JSON of the analysis, kept stable. Example: ERROR_CONSTANTS[1].latex is K_{\mathrm{vel}}.
 */
export const ERROR_CONSTANTS = [
  { key: "Kp", name: "position error constant", symbol: "K_pos", latex: "K_{\\mathrm{pos}}", limit: "lim s→0 L(s)", limitLatex: "\\lim_{s\\to 0} L(s)" },
  { key: "Kv", name: "velocity error constant", symbol: "K_vel", latex: "K_{\\mathrm{vel}}", limit: "lim s→0 s·L(s)", limitLatex: "\\lim_{s\\to 0} s\\,L(s)" },
  { key: "Ka", name: "acceleration error constant", symbol: "K_acc", latex: "K_{\\mathrm{acc}}", limit: "lim s→0 s²·L(s)", limitLatex: "\\lim_{s\\to 0} s^2 L(s)" },
] as const;

export interface SteadyState {
  /** Where the pair's input enters the loop: the errors e = r − y mean something only for a reference. */
  inputRole: InputRole;
  finalValue: Quantity;
  initialValue: Quantity;
  /** e = r − y for a unit step, ramp (t) and parabola (t²/2) at the pair's input; null values with a note for a disturbance. */
  errors: { step: Quantity; ramp: Quantity; parabola: Quantity };
  /** From the loop gain at the break; null without one. */
  systemType: number | null;
  constants: { Kp: Quantity; Kv: Quantity; Ka: Quantity } | null;
  /** Unity-feedback equivalent errors 1/(1 + Kp), 1/Kv, 1/Ka. */
  errorsFromConstants: { step: Quantity; ramp: Quantity; parabola: Quantity } | null;
}

const ZERO: Q = { n: 0n, d: 1n };
const finite = (x: Q, note: string): Quantity => ({ value: qToNumber(x), exact: qToString(x), note });
const none = (note: string): Quantity => ({ value: null, exact: null, note });

/** lim s→0 of s^k·a(s)/b(s), exactly. Example: limitAtZero(1, s, 1) is 1; limitAtZero(1, s^2, 1) is Infinity. */
export function limitAtZero(a: UPoly, b: UPoly, k: number): { kind: "finite"; value: Q } | { kind: "infinite"; sign: number } {
  if (!a.length) return { kind: "finite", value: ZERO };
  const [za, zb] = [upZeroOrder(a), upZeroOrder(b)];
  const net = k + za - zb;
  const ratio = qDiv(a[za], b[zb]);
  if (net > 0) return { kind: "finite", value: ZERO };
  if (net === 0) return { kind: "finite", value: ratio };
  return { kind: "infinite", sign: ratio.n > 0n ? 1 : -1 };
}

type Limit = ReturnType<typeof limitAtZero>;

const asQuantity = (lim: Limit, note: string, infiniteNote: string): Quantity =>
  lim.kind === "finite" ? finite(lim.value, note) : { value: lim.sign > 0 ? "Infinity" : "-Infinity", exact: null, note: infiniteNote };

/** Unity-feedback error 1/(shift + K) from an error constant K (0 when K is infinite). */
function errorFromConstant(k: Limit, shift: Q, name: string): Quantity {
  if (k.kind === "infinite") return finite(ZERO, `Unity-feedback ${name} error: the constant is infinite.`);
  const denom = qAdd(shift, k.value);
  if (denom.n === 0n) return { value: "Infinity", exact: null, note: `Unity-feedback ${name} error: the error grows without bound.` };
  return finite(qInv(denom), `Unity-feedback ${name} error.`);
}

/**
 * Final and initial values of the unit step response, the steady-state errors e = r − y, and the error
 * constants of the loop gain L (when a break is known). The final value theorem is applied only when every
 * pole of sY(s) = T(s) is in the open left half-plane. Example: T = 1/(s + 2) → final value 1/2, step error 1/2.
 */
export function steadyState(num: UPoly, den: UPoly, verdict: Verdict, loop: { num: UPoly; den: UPoly } | null, inputRole: InputRole = { kind: "reference" }): SteadyState {
  const stable = verdict === "stable";
  const noSteadyState = `No steady state: T(s) is ${verdict}, so sY(s) has a pole outside the open left half-plane and the final value theorem does not apply.`;
  const finalValue = stable
    ? asQuantity(limitAtZero(num, den, 0), "Final value theorem: lim s→0 s·T(s)/s = T(0).", "")
    : none(noSteadyState);
  const initialValue =
    upDeg(num) > upDeg(den)
      ? none("The initial value theorem does not apply: T is improper, so the step response has impulses at t = 0.")
      : upDeg(num) < upDeg(den)
        ? finite(ZERO, "Initial value theorem: lim s→∞ s·T(s)/s = 0 (T strictly proper).")
        : finite(qDiv(num[num.length - 1], den[den.length - 1]), "Initial value theorem: lim s→∞ T(s), the ratio of leading coefficients.");
  const oneMinusT = upSub(den, num); // 1 − T = (den − num)/den
  const error = (order: number, name: string): Quantity =>
    stable
      ? asQuantity(limitAtZero(oneMinusT, den, 1 - order), `Final value theorem on E(s) = (1 − T(s))·R(s) for a unit ${name}.`, `The error grows without bound for a unit ${name} (sE(s) keeps a pole at s = 0).`)
      : none(noSteadyState);
  const notReference =
    inputRole.kind === "disturbance"
      ? none(`Not a reference: the input enters the loop at ${inputRole.entersAt.join(", ")}, not at its comparison junction ${inputRole.junction}, so e = r − y does not apply; the final value is the output's steady response to it.`)
      : null;
  const errors = notReference
    ? { step: notReference, ramp: notReference, parabola: notReference }
    : { step: error(1, "step"), ramp: error(2, "ramp"), parabola: error(3, "parabola") };
  if (!loop) return { inputRole, finalValue, initialValue, errors, systemType: null, constants: null, errorsFromConstants: null };
  const type = Math.max(0, upZeroOrder(loop.den) - upZeroOrder(loop.num));
  const lims = [0, 1, 2].map((k) => limitAtZero(loop.num, loop.den, k));
  const [Kp, Kv, Ka] = lims.map((lim, k) => {
    const c = ERROR_CONSTANTS[k];
    return asQuantity(lim, `The ${c.name} ${c.symbol} = ${c.limit}.`, `The ${c.name} ${c.symbol} is infinite (type ${type} loop).`);
  });
  const errorsFromConstants = stable
    ? {
        step: errorFromConstant(lims[0], qOne, "step"),
        ramp: errorFromConstant(lims[1], ZERO, "ramp"),
        parabola: errorFromConstant(lims[2], ZERO, "parabola"),
      }
    : { step: none(noSteadyState), ramp: none(noSteadyState), parabola: none(noSteadyState) };
  return { inputRole, finalValue, initialValue, errors, systemType: type, constants: { Kp, Kv, Ka }, errorsFromConstants };
}
