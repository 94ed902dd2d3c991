import { flatRoots, rootsOf } from "@shared/analysis/poles";
import { upDeg } from "@shared/analysis/upoly";
import { BALANCE_MAX_ORDER, balancedForm } from "@shared/implement/balanced";
import type { Subject } from "@shared/implement/errors";
import { controllableForm, observableForm, requireProper, type ExactTf, type StateSpace } from "@shared/implement/stateSpace";

export const REALISATION_FORMS = ["controllable", "observable", "minimal"] as const;
export type RealisationForm = (typeof REALISATION_FORMS)[number];

export interface Realisation {
  form: RealisationForm;
  ss: StateSpace;
  /** Which realisation stands behind the form: "minimal" is balanced when it can be, else controllable canonical. */
  basis: "controllable" | "observable" | "balanced";
  /** Hankel singular values of a balanced realisation, largest first. */
  hankel: number[] | null;
  /** Why "minimal" is not balanced, when it is not. */
  note: string | null;
}

/** Why a minimal realisation falls back to the controllable canonical form, or null when it can be balanced. */
function balanceRefusal(tf: ExactTf): string | null {
  const n = upDeg(tf.den);
  if (n > BALANCE_MAX_ORDER) return `Order ${n} is above ${BALANCE_MAX_ORDER}, the highest balanced here`;
  if (flatRoots(rootsOf(tf.den)).some(([re]) => re >= 0)) return "The system is not asymptotically stable, so it has no finite Gramians to balance";
  return null;
}

/**
 * A state-space realisation of a proper transfer in lowest terms (so of its least order n = deg den): the
 * controllable or observable canonical form, or "minimal" — the balanced realisation when the system is stable,
 * otherwise the controllable canonical form (also minimal, the transfer being in lowest terms), with a note.
 * Throws ImplementError "improper" for more zeros than poles. Example: realise(1/(s + 1), "minimal").basis === "balanced".
 */
export function realise(tf: ExactTf, form: RealisationForm, subject: Subject): Realisation {
  requireProper(tf, subject, "it has no state-space realisation (its output would need derivatives of the input)");
  if (form === "controllable") return { form, ss: controllableForm(tf), basis: form, hankel: null, note: null };
  if (form === "observable") return { form, ss: observableForm(tf), basis: form, hankel: null, note: null };
  const refusal = upDeg(tf.den) === 0 ? null : balanceRefusal(tf);
  const balanced = refusal === null ? balancedForm(controllableForm(tf)) : null;
  if (balanced) return { form, ss: balanced.ss, basis: "balanced", hankel: balanced.hankel, note: null };
  const why = refusal ?? "A Gramian is not positive definite to working precision";
  return { form, ss: controllableForm(tf), basis: "controllable", hankel: null, note: `${why}: the minimal realisation shown is the controllable canonical form of the transfer in lowest terms.` };
}
