import fc from "fast-check";

/**
 * Block expressions as users might type them, and as an attacker might: grammar-shaped random expressions
 * (numbers of every form, s, parameter names, + - * / ^, parentheses, implicit products, deep nesting, huge
 * exponents, long numbers) and arbitrary strings.
 */
export const FUZZ_PARAMETERS = ["K", "a", "tau", "Kp", "Ti", "w_n"] as const;

const digits = (min: number, max: number) => fc.string({ unit: fc.constantFrom(..."0123456789"), minLength: min, maxLength: max });

const numberArb = fc.oneof(
  { arbitrary: fc.nat(100).map(String), weight: 6 },
  fc.tuple(fc.nat(99), digits(1, 4)).map(([a, b]) => `${a}.${b}`),
  digits(1, 3).map((d) => `.${d}`),
  fc.tuple(fc.nat(9), fc.integer({ min: -500, max: 500 })).map(([m, e]) => `${m}e${e}`),
  fc.tuple(fc.nat(9), fc.integer({ min: -30, max: 30 })).map(([m, e]) => `${m}.5E${e >= 0 ? "+" : ""}${e}`),
  digits(20, 600).map((d) => `1${d}`),
  fc.constantFrom("0", "0.0", "1.", "00012", "1e", "1e+", "1..2", "1_000", "0x1F", "Infinity", "NaN"),
);

const nameArb = fc.oneof(
  { arbitrary: fc.constantFrom(...FUZZ_PARAMETERS), weight: 4 },
  fc.constantFrom("pi", "e", "i", "sin", "Ks", "tauS", "ss", "S", "x"),
  fc.stringMatching(/^[A-Za-z][A-Za-z0-9_]{0,6}$/),
);

const leafArb = fc.oneof({ arbitrary: fc.constant("s"), weight: 3 }, { arbitrary: numberArb, weight: 3 }, { arbitrary: nameArb, weight: 2 });

const exponentArb = fc.oneof(
  { arbitrary: fc.nat(6).map(String), weight: 6 },
  fc.integer({ min: 7, max: 60 }).map(String),
  fc.constantFrom("99999999999", "1e3", "(2)", "(-1)", "-1", "0.5", "(1+1)", "s", "K", "(((3)))", "2^2"),
);

const space = fc.constantFrom("", "", "", " ", "  ", "\t");

export interface ExprShape {
  /** Deepest nesting of the grammar (leaves count 0). */
  maxDepth: number;
}

/** Grammar-shaped expressions, syntactically plausible most of the time. */
export function grammarExpression({ maxDepth }: ExprShape): fc.Arbitrary<string> {
  const { e } = fc.letrec<{ e: string }>((tie) => ({
    e: fc.oneof(
      { depthSize: "small", maxDepth, withCrossShrink: true },
      { arbitrary: leafArb, weight: 4 },
      fc.tuple(tie("e"), space, fc.constantFrom("+", "-", "*", "/", "+", "*"), space, tie("e")).map((p) => p.join("")),
      fc.tuple(fc.constantFrom("-", "+", "--"), tie("e")).map(([op, x]) => `${op}${x}`),
      tie("e").map((x) => `(${x})`),
      fc.tuple(tie("e"), exponentArb).map(([b, x]) => `${b.length > 1 ? `(${b})` : b}^${x}`),
      fc.tuple(tie("e"), tie("e"), fc.nat(3)).map(([a, b, how]) => [`${a}(${b})`, `(${a})(${b})`, `2${b}`, `${a} ${b}`][how]),
    ),
  }));
  return e;
}

/** Shapes no grammar rule gives often: deep or unbalanced nesting, exponent towers, very long sums. */
const extremeExpression = fc.oneof(
  fc.tuple(fc.nat(1500), leafArb, fc.integer({ min: -2, max: 2 })).map(([n, x, off]) => `${"(".repeat(n)}${x}${")".repeat(Math.max(0, n + off))}`),
  fc.tuple(fc.integer({ min: 2, max: 400 }), fc.constantFrom("s", "2", "K", "(s+1)")).map(([n, b]) => Array(n).fill(b).join("^")),
  fc.tuple(fc.integer({ min: 2, max: 700 }), fc.constantFrom("s", "1", "K*s", "(s+1)", "s^50")).map(([n, t]) => Array(n).fill(t).join("+")),
  fc.tuple(fc.integer({ min: 2, max: 700 }), fc.constantFrom("(s+1)", "(K+a)", "s^50", "(s+1)^50")).map(([n, t]) => Array(n).fill(t).join("*")),
  fc.tuple(fc.integer({ min: 2, max: 400 }), fc.constantFrom("-", "+", "(")).map(([n, op]) => `${op.repeat(n)}s`),
);

const alphabet = fc.constantFrom(..."0123456789s+-*/^().eEKa_ \t".split(""), "tau", "Kp", "\u00b7", "\u2212", "\u00b2");

/** Every kind of hostile expression text. */
export const hostileExpression: fc.Arbitrary<string> = fc.oneof(
  { arbitrary: grammarExpression({ maxDepth: 6 }), weight: 6 },
  { arbitrary: extremeExpression, weight: 2 },
  { arbitrary: fc.string({ unit: alphabet, maxLength: 60 }), weight: 2 },
  fc.string({ unit: "binary", maxLength: 80 }),
  fc.string({ unit: "grapheme", maxLength: 40 }),
  fc.string({ unit: alphabet, minLength: 1990, maxLength: 2010 }),
);
