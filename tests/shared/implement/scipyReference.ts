import { fileURLToPath } from "node:url";
import { q, qDiv, qOne } from "@shared/algebra/rational";
import { upFrom, upLead, upScale } from "@shared/analysis/upoly";
import type { FloatTf } from "@shared/implement/ssToTf";
import type { ExactTf, StateSpace } from "@shared/implement/stateSpace";
import { runPython } from "../../support/python";

/** tests/reference/scipy_implement.py: one process for the whole batch. */
const SCRIPT = fileURLToPath(new URL("../../reference/scipy_implement.py", import.meta.url));

export interface ScipyCase {
  id: string;
  /** DESCENDING powers of s. */
  num: number[];
  den: number[];
  ts: number;
  prewarp?: number;
  /** The same transfer exactly ("p/q", descending), Ts as written, and the pre-warp constant ω/tan(ωTs/2) used. */
  numExact: string[];
  denExact: string[];
  tsExact: string;
  prewarpC?: number;
  realisations: Record<string, StateSpace>;
  /** Discrete transfers in powers of z⁻¹ and the ω (rad/s) at which freqz evaluates them. */
  discrete: Record<string, FloatTf & { w: number[] }>;
}

export interface ScipyTf {
  num: number[];
  den: number[];
}

export interface ScipyAnswer {
  id: string;
  tustin: ScipyTf;
  prewarp?: ScipyTf;
  zoh?: ScipyTf;
  tf2ss?: StateSpace;
  ss2tf: Record<string, ScipyTf>;
  gramians: Record<string, { wc: number[][]; wo: number[][] }>;
  freqz: Record<string, [number, number][]>;
  /** Exact (sympy) Tustin and pre-warped Tustin, 50-digit (mpmath) ZOH. */
  precise: { tustin: ScipyTf; prewarp?: ScipyTf; zoh?: ScipyTf };
}

export function runScipyImplement(cases: ScipyCase[]): Promise<{ results: ScipyAnswer[]; scipy: string }> {
  return runPython({ file: SCRIPT }, { cases }, 120_000);
}

/** An exact transfer from decimal coefficients in ASCENDING powers, made monic. Example: tfOf([2], [1, 1]) is 2/(s + 1). */
export function tfOf(numAsc: number[], denAsc: number[]): ExactTf {
  const exact = (c: number[]) => upFrom(c.map((x) => q(Math.round(x * 1e6), 1e6)));
  const den = exact(denAsc);
  const k = qDiv(qOne, upLead(den));
  return { num: upScale(exact(numAsc), k), den: upScale(den, k) };
}

/**
 * max |a − b| / max(|b|) over two coefficient lists in descending powers, the shorter padded with leading zeros
 * (scipy leaves rounding-level leading coefficients where ours are exactly 0).
 */
export function relativeDifference(a0: readonly number[], b0: readonly number[]): number {
  const n = Math.max(a0.length, b0.length);
  const pad = (c: readonly number[]) => [...new Array<number>(n - c.length).fill(0), ...c];
  const [a, b] = [pad(a0), pad(b0)];
  const scale = Math.max(...b.map(Math.abs), Number.MIN_VALUE);
  return Math.max(0, ...a.map((x, i) => Math.abs(x - b[i]))) / scale;
}

/** A case from float coefficients (DESCENDING) as a command prints them, each read as its shortest decimal. */
export function floatCase(id: string, num: number[], den: number[], ts: number, prewarp?: number, realisations: Record<string, StateSpace> = {}): ScipyCase {
  return {
    id,
    num,
    den,
    ts,
    prewarp,
    numExact: num.map(String),
    denExact: den.map(String),
    tsExact: String(ts),
    prewarpC: prewarp === undefined ? undefined : prewarp / Math.tan((prewarp * ts) / 2),
    realisations,
    discrete: {},
  };
}
