import type { DiscretisationMethod } from "@shared/implement/discretise";
import type { FloatTf } from "@shared/implement/ssToTf";

/** A discrete transfer as H(z⁻¹) = (b₀ + b₁z⁻¹ + … + bₙz⁻ⁿ)/(1 + a₁z⁻¹ + … + aₙz⁻ⁿ), ready to paste. */
export interface DifferenceEquation {
  /** b₀…bₙ and a₀ = 1, a₁…aₙ, each list of length n + 1. */
  b: number[];
  a: number[];
  /** y[k] = b0*u[k] + … − a1*y[k-1] − …, every coefficient to 17 significant digits. */
  text: string;
  /** A C function with named coefficients and the past samples as static state. */
  code: string;
  /** H(z^{-1}) in LaTeX, coefficients to 6 significant digits. */
  latex: string;
}

export const METHOD_NAMES: Record<DiscretisationMethod, string> = {
  tustin: "Tustin (bilinear)",
  prewarp: "Tustin with pre-warping",
  zoh: "zero-order hold",
  matched: "matched pole-zero",
};

/** 17 significant digits: the double read back exactly. Example: digits17(0.1) === "0.10000000000000001". */
export const digits17 = (x: number): string => (x === 0 ? "0" : x.toPrecision(17));

const short = (x: number) => String(Number(x.toPrecision(6)));

/** b and a in powers of z⁻¹: the z-polynomials divided by zⁿ (the numerator padded to the denominator's length). */
export function inverseCoefficients(tf: FloatTf): { b: number[]; a: number[] } {
  const n = tf.denominator.length - 1;
  const pad = n + 1 - tf.numerator.length;
  return { b: [...new Array<number>(Math.max(0, pad)).fill(0), ...tf.numerator], a: tf.denominator.slice() };
}

/** "c*x" terms joined with their signs, zero terms left out. Example: signedSum([[2, "u[k]"], [-1, "y[k-1]"]]) is "2*u[k] - 1*y[k-1]". */
function signedSum(terms: [number, string][], number: (x: number) => string, times: string): string {
  const kept = terms.filter(([c]) => c !== 0);
  if (!kept.length) return "0";
  return kept.map(([c, v], i) => `${c < 0 ? (i ? " - " : "-") : i ? " + " : ""}${number(Math.abs(c))}${v ? `${times}${v}` : ""}`).join("");
}

const zPower = (i: number) => (i === 0 ? "" : i === 1 ? "z^{-1}" : `z^{-${i}}`);

/** A C identifier from a block id or pair. Example: cName("r → y") === "r_y". */
const cName = (id: string) => id.replace(/[^A-Za-z0-9_]+/g, "_").replace(/^(?=\d)/, "_").replace(/^_+|_+$/g, "") || "controller";

/**
 * The difference equation of a discrete transfer (monic denominator, descending powers of z), as text, as C code
 * named after `id`, and as H(z⁻¹) in LaTeX. Example: (0.5z + 0.5)/(z − 1) → "y[k] = 0.50000000000000000*u[k] +
 * 0.50000000000000000*u[k-1] + 1.0000000000000000*y[k-1]".
 */
export function differenceEquation(tf: FloatTf, opts: { ts: number; method: DiscretisationMethod; id: string; prewarp?: number }): DifferenceEquation {
  const { b, a } = inverseCoefficients(tf);
  const n = a.length - 1;
  const past = (s: string, i: number) => (i === 0 ? `${s}[k]` : `${s}[k-${i}]`);
  const text = `y[k] = ${signedSum([...b.map((c, i): [number, string] => [c, past("u", i)]), ...a.slice(1).map((c, i): [number, string] => [-c, past("y", i + 1)])], digits17, "*")}`;
  const range = (from: number) => Array.from({ length: n + 1 - from }, (_, i) => i + from);
  const name = cName(opts.id);
  const how = `${METHOD_NAMES[opts.method]}${opts.method === "prewarp" && opts.prewarp !== undefined ? ` at ${opts.prewarp} rad/s` : ""}`;
  const sum = [...range(0).map((i) => `b${i} * ${i ? `u_${i}` : "u"}`), ...range(1).map((i) => `a${i} * y_${i}`)];
  const statement = sum.map((t, i) => (i === 0 ? t : i <= n ? ` + ${t}` : ` - ${t}`)).join("");
  const shift = (s: string) => [...range(1).reverse().map((i) => (i === 1 ? `${s}_1 = ${s};` : `${s}_${i} = ${s}_${i - 1};`))].join(" ");
  const code = [
    `/* ${opts.id}: H(z) = (${range(0).map((i) => `b${i}${i ? ` z^-${i}` : ""}`).join(" + ")}) / (1${range(1).map((i) => ` + a${i} z^-${i}`).join("")})`,
    `   Ts = ${opts.ts} s, ${how}. Call once per sample with the new input u; returns the output y. */`,
    ...range(0).map((i) => `static const double b${i} = ${digits17(b[i])};`),
    ...range(1).map((i) => `static const double a${i} = ${digits17(a[i])};`),
    ...(n ? [`static double ${range(1).map((i) => `u_${i} = 0.0`).join(", ")}; /* past inputs u[k-1]… */`, `static double ${range(1).map((i) => `y_${i} = 0.0`).join(", ")}; /* past outputs y[k-1]… */`] : []),
    "",
    `double ${name}_step(double u)`,
    "{",
    `    double y = ${statement};`,
    ...(n ? [`    ${shift("u")}`, `    ${shift("y")}`] : []),
    "    return y;",
    "}",
  ].join("\n");
  const latexSide = (c: number[], one: boolean) => signedSum(c.map((x, i): [number, string] => [x, zPower(i)]), (x) => (one && x === 1 ? "1" : short(x)), "\\,").replace(/(^|[-+] )1\\,z/g, "$1z");
  const latex = `H(z^{-1}) = \\frac{${latexSide(b, false)}}{${latexSide(a, true)}}`;
  return { b, a, text, code, latex };
}
