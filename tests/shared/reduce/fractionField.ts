import type { Field } from "@shared/algebra/field";
import type { DiagramDocument } from "@shared/diagram/schema";

/** Exact rationals on BigInt: the plain-number field the graph rules are tested with. */
export interface Frac {
  n: bigint;
  d: bigint;
}

const gcd = (a: bigint, b: bigint): bigint => {
  a = a < 0n ? -a : a;
  b = b < 0n ? -b : b;
  while (b) [a, b] = [b, a % b];
  return a;
};

export function frac(n: bigint | number, d: bigint | number = 1n): Frac {
  let [nn, dd] = [BigInt(n), BigInt(d)];
  if (dd === 0n) throw new Error("zero denominator");
  if (dd < 0n) [nn, dd] = [-nn, -dd];
  const g = gcd(nn, dd) || 1n;
  return { n: nn / g, d: dd / g };
}

export const fracText = (a: Frac): string => (a.d === 1n ? `${a.n}` : `${a.n}/${a.d}`);

export const fracField: Field<Frac> = {
  zero: frac(0),
  one: frac(1),
  add: (a, b) => frac(a.n * b.d + b.n * a.d, a.d * b.d),
  sub: (a, b) => frac(a.n * b.d - b.n * a.d, a.d * b.d),
  mul: (a, b) => frac(a.n * b.n, a.d * b.d),
  div: (a, b) => {
    if (b.n === 0n) throw new Error("division by zero");
    return frac(a.n * b.d, a.d * b.n);
  },
  neg: (a) => frac(-a.n, a.d),
  isZero: (a) => a.n === 0n,
  isOne: (a) => a.n === 1n && a.d === 1n,
};

export const showFrac = (a: Frac) => ({ expr: fracText(a), latex: fracText(a) });

type BlockSpec = [id: string, type: string, extra?: string[] | string];

/**
 * A document from a compact spec: blocks as [id, type, signs|expr], wires as "from>to" or "from>to:port".
 * Wires get ids "w0", "w1", … so consumed-wire checks are easy.
 */
export function diagram(blocks: BlockSpec[], wires: string[]): DiagramDocument {
  return {
    format: "loopwright-diagram",
    version: 1,
    parameters: {},
    blocks: blocks.map(([id, type, extra]) =>
      type === "sum"
        ? { id, type, signs: extra as ("+" | "-")[] }
        : type === "gain" || type === "transfer"
          ? { id, type, expr: (extra as string) ?? "1" }
          : { id, type },
    ) as DiagramDocument["blocks"],
    wires: wires.map((w, i) => {
      const [from, rest] = w.split(">");
      const [to, port] = rest.split(":");
      return { id: `w${i}`, from, to, ...(port === undefined ? {} : { port: Number(port) }) };
    }),
  };
}
