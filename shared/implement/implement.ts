import type { ExactReduction } from "@shared/reduce/reduceDiagram";
import { discretise, type DiscretiseOptions } from "@shared/implement/discretise";
import { realise, type RealisationForm, type Realisation } from "@shared/implement/realise";
import type { ImplementResult } from "@shared/implement/schema";
import { selectedTransfer, type ImplementSelection } from "@shared/implement/selection";
import type { Subject } from "@shared/implement/errors";
import type { ExactTf } from "@shared/implement/stateSpace";
import { qToNumber } from "@shared/algebra/rational";

export interface ImplementOptions {
  /** Discretise at this sample time with this method (none: `discrete` is null). */
  discretise?: DiscretiseOptions;
  /** The state-space form (default "controllable"). */
  form?: RealisationForm;
  /** Parameter values over the nominal ones. */
  values?: Readonly<Record<string, number>>;
}

export interface Implementation {
  subject: Subject;
  tf: ExactTf;
  realisation: Realisation;
  result: ImplementResult;
}

/** Exact ascending coefficients as floats, DESCENDING (0 is [0]). Example: continuousFloats(s + 1/2) is [1, 0.5]. */
export const descendingFloats = (u: ExactTf["num"]): number[] => (u.length ? u.map(qToNumber).reverse() : [0]);

/**
 * The implementation stage's entry: a block's transfer or a pair's closed loop at the nominal values, its discrete
 * equivalent and a state-space realisation — the published `implement --json` result. Throws ImplementError with
 * a code and the block or pair it is about. Example: implement(reduction, { block: "pi" }, { discretise: { ts: 0.01,
 * method: "tustin" } }).result.discrete.denominator is [1, −1].
 */
export function implement(reduction: ExactReduction, selection: ImplementSelection, opts: ImplementOptions = {}): Implementation {
  const { subject, tf } = selectedTransfer(reduction, selection, opts.values);
  const d = opts.discretise;
  const discrete = d ? { ts: d.ts, method: d.method, ...discretise(tf, d, subject) } : null;
  const realisation = realise(tf, opts.form ?? "controllable", subject);
  const { A, B, C, D } = realisation.ss;
  return {
    subject,
    tf,
    realisation,
    result: {
      continuous: { numerator: descendingFloats(tf.num), denominator: descendingFloats(tf.den) },
      discrete,
      stateSpace: { form: realisation.form, A, B, C, D },
    },
  };
}
