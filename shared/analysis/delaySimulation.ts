// The time response of a transfer with its dead times kept, by simulating the delay differential equation
// D(p, e^(−pτ))·z = u, y = N(p, e^(−pτ))·z on a fixed grid (p = d/dt). Between grid points the undelayed part
// is integrated exactly (matrix exponential) and the delayed terms, known from the history, are taken as linear:
// second-order accurate in the step, with no step-size limit from fast stable poles.
import { expm } from "@shared/algebra/expm";
import type { Matrix } from "@shared/algebra/matrix";
import type { DelayTerm } from "@shared/analysis/delayTerms";
import { AnalysisError } from "@shared/analysis/errors";

export type SimulatedInput = "step" | "ramp";

export interface Simulation {
  t: number[];
  y: number[];
  stepSize: number;
  /** Set when the grid is coarser than the shortest delay or the response overflowed. */
  note: string | null;
}

/** Grid steps per horizon; the step also never exceeds the shortest delay. */
const STEPS = 8000;
const MAX_STEPS = 200_000;
const OVERFLOW = 1e150;

type Side = "left" | "right";

/**
 * y(t) on [0, tEnd] for a unit step or ramp into N/D, each given by its delay terms (from delayTerms).
 * Example: N = [{ tau: 0.5, coeffs: [1] }], D = [{ tau: 0, coeffs: [1, 1] }] gives y = 1 − e^(−(t − 0.5)) after 0.5 s.
 */
export function simulateDelayed(num: DelayTerm[], den: DelayTerm[], input: SimulatedInput, tEnd: number): Simulation {
  const d0 = den.find((d) => d.tau === 0);
  if (!d0 || d0.coeffs.length === 0) {
    throw new AnalysisError("delay-response", "Every term of the denominator carries a dead time: the output would depend on the future input, so it cannot be simulated.");
  }
  const n = d0.coeffs.length - 1;
  const lead = d0.coeffs[n];
  const delayed = den.filter((d) => d.tau > 0 && d.coeffs.length > 0);
  if (delayed.some((d) => d.coeffs.length - 1 > n)) {
    throw new AnalysisError("delay-response", "A delayed term of the denominator is of higher order in s than the undelayed one (an advanced equation): it cannot be simulated.");
  }
  if (num.some((d) => d.coeffs.length - 1 > n)) {
    throw new AnalysisError("delay-response", "T is improper (more zeros than poles): its response holds impulses, so it is not simulated.");
  }
  const taus = [...num, ...delayed].map((d) => d.tau).filter((t) => t > 0);
  const shortest = Math.min(tEnd, ...taus);
  // A step that divides the shortest delay keeps it on the grid, where the history is exact.
  const h = Math.max(shortest / Math.ceil((shortest * STEPS) / tEnd), tEnd / MAX_STEPS);
  const total = Math.ceil(tEnd / h - 1e-9);
  const note = shortest < h * (1 - 1e-9) ? `The shortest dead time (${shortest} s) is below the simulation step (${h.toPrecision(3)} s): the response is approximate.` : null;

  const c = d0.coeffs.slice(0, n).map((x) => x / lead); // z^(n) = −Σ c_j·z^(j) + g
  const { phi, p, q } = stepMatrices(c, h);
  // hist[j][k]: z^(j) at grid point k for j < n (continuous); top[side][k]: z^(n), which jumps where u does.
  const hist = Array.from({ length: n }, () => new Float64Array(total + 1));
  const top = { left: new Float64Array(total + 1), right: new Float64Array(total + 1) };
  let known = -1;

  // Σ_j coeffs[j]·z^(j)(time): exact on a grid point (its left or right limit), else linear between two.
  const combination = (coeffs: number[], time: number, side: Side): number => {
    if (time < 0 || (time === 0 && side === "left")) return 0;
    const pos = time / h;
    const k0 = Math.round(pos);
    const onGrid = Math.abs(pos - k0) < 1e-7;
    const k = onGrid ? Math.min(k0, known) : Math.min(Math.floor(pos), known);
    const f = onGrid || k + 1 > known ? 0 : pos - k;
    const at = (j: number, i: number, s: Side) => (j < n ? hist[j][i] : top[s][i]);
    let sum = 0;
    for (let j = 0; j < coeffs.length; j++) {
      const v = f === 0 ? at(j, k, onGrid ? side : "right") : (1 - f) * at(j, k, "right") + f * at(j, k + 1, "left");
      sum += coeffs[j] * v;
    }
    return sum;
  };
  const u = (time: number, side: Side) => (time < 0 || (time === 0 && side === "left") ? 0 : input === "step" ? 1 : time);
  const forcing = (time: number, side: Side) => {
    let g = u(time, side);
    for (const d of delayed) g -= combination(d.coeffs, time - d.tau, side);
    return g / lead;
  };
  const output = (time: number) => num.reduce((y, d) => y + combination(d.coeffs, time - d.tau, "right"), 0);

  let x = new Float64Array(n);
  const highest = (g: number) => g - c.reduce((acc, cj, j) => acc + cj * x[j], 0);
  const store = (k: number, gLeft: number, gRight: number) => {
    for (let j = 0; j < n; j++) hist[j][k] = x[j];
    top.left[k] = highest(gLeft);
    top.right[k] = highest(gRight);
    known = k;
  };
  let gRight = forcing(0, "right");
  store(0, forcing(0, "left"), gRight);
  const t = [0];
  const y = [output(0)];
  let overflow: string | null = null;
  for (let k = 0; k < total; k++) {
    const t1 = (k + 1) * h;
    const g0 = gRight;
    const g1 = forcing(t1, "left");
    const slope = (g1 - g0) / h;
    const next = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      let v = p[i] * g0 + q[i] * slope;
      for (let j = 0; j < n; j++) v += phi[i][j] * x[j];
      next[i] = v;
    }
    x = next;
    gRight = forcing(t1, "right");
    store(k + 1, g1, gRight);
    const yk = output(t1);
    if (!Number.isFinite(yk) || Math.abs(yk) > OVERFLOW) {
      overflow = `The response grows beyond ${OVERFLOW} by t = ${t1.toPrecision(3)} s: the simulation stops there.`;
      break;
    }
    t.push(t1);
    y.push(yk);
  }
  return { t, y, stepSize: h, note: overflow ?? note };
}

/**
 * Over one step h of x' = A·x + e_n·g with g linear in the step, x(h) = Φ·x(0) + P·g(0) + Q·g'; all three from
 * one exponential of the augmented matrix [[A, e_n, 0], [0, 0, 1], [0, 0, 0]]·h.
 */
function stepMatrices(c: number[], h: number): { phi: Matrix; p: number[]; q: number[] } {
  const n = c.length;
  const m: Matrix = Array.from({ length: n + 2 }, () => new Array<number>(n + 2).fill(0));
  for (let i = 0; i + 1 < n; i++) m[i][i + 1] = h;
  if (n > 0) {
    c.forEach((cj, j) => (m[n - 1][j] = -cj * h));
    m[n - 1][n] = h;
  }
  m[n][n + 1] = h;
  const e = expm(m);
  return { phi: e.slice(0, n).map((row) => row.slice(0, n)), p: e.slice(0, n).map((row) => row[n]), q: e.slice(0, n).map((row) => row[n + 1]) };
}
