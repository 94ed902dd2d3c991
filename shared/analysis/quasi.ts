// A transfer with dead times kept, evaluated at a complex s: e^(−sT) is computed, not approximated, so the
// frequency response of a delayed loop is exact (to double precision).
import { qToNumber } from "@shared/algebra/rational";
import type { RatFn } from "@shared/algebra/ratfn";
import { S, type ZPoly } from "@shared/algebra/zpoly";
import type { Complex } from "@shared/analysis/frequency";
import { AnalysisError } from "@shared/analysis/errors";

const mul = ([a, b]: Complex, [c, d]: Complex): Complex => [a * c - b * d, a * d + b * c];

/**
 * f(s) for a transfer in s, parameters (real values) and dead-time symbols (their T in seconds).
 * Example: quasiEvaluator(K·E/(s + 1), { K: 2 }, new Map([[E, 0.5]]))([0, 1]) = 2·e^(−0.5j)/(1 + j).
 */
export function quasiEvaluator(r: RatFn, values: Readonly<Record<string, number>>, delays: ReadonlyMap<string, number>): (s: Complex) => Complex {
  const k = qToNumber(r.k);
  return (s) => {
    const at = (v: string): Complex => {
      if (v === S) return s;
      const T = delays.get(v);
      if (T !== undefined) {
        const m = Math.exp(-s[0] * T);
        return [m * Math.cos(s[1] * T), -m * Math.sin(s[1] * T)];
      }
      const x = values[v];
      if (x === undefined) throw new AnalysisError("bad-value", `No value for parameter ${v}: give it a nominal value.`, v);
      return [x, 0];
    };
    const walk = (z: ZPoly): Complex => {
      if (typeof z === "bigint") return [Number(z), 0];
      const x = at(z.v);
      let acc: Complex = [0, 0];
      for (let i = z.c.length - 1; i >= 0; i--) {
        const c = walk(z.c[i]);
        const p = mul(acc, x);
        acc = [p[0] + c[0], p[1] + c[1]];
      }
      return acc;
    };
    const [a, b] = walk(r.n);
    const [c, d] = walk(r.d);
    const m = c * c + d * d;
    return [(k * (a * c + b * d)) / m, (k * (b * c - a * d)) / m];
  };
}
