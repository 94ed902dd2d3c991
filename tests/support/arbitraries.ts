import fc from "fast-check";
import type { Block, DiagramDocument, Wire } from "@shared/diagram/schema";
import { makeDoc } from "./docBuilder";

/**
 * fast-check arbitraries of random WELL-POSED diagrams: interlocked loops, fan-out, explicit branch
 * blocks, multi-input sums, several inputs and outputs, numeric and symbolic (K, a, tau) parameters.
 *
 * Well-posed by construction: core blocks are ordered; a wire may go backwards (closing a loop) only
 * from a strictly proper block, so every loop contains one; improper blocks are kept off every loop
 * (made proper if the wiring puts them on one). Hence every loop gain vanishes as s → ∞ and Δ(∞) = 1.
 * Numerator and denominator factors come from disjoint pools, so each written denominator is the
 * block's lowest-terms denominator (generically in the parameters) — `denominators` records them.
 */
export interface GeneratedDiagram {
  doc: DiagramDocument;
  /** Each block's lowest-terms denominator in s, up to a constant factor (diagram syntax). */
  denominators: Record<string, string>;
}

type Factor = readonly [text: string, degree: number];
const DEN_NUMERIC: Factor[] = [
  ["s", 1], ["s + 1", 1], ["s + 2", 1], ["s + 0.5", 1], ["s + 3", 1], ["s - 0.5", 1],
  ["s^2 + 2*s + 5", 2], ["s^2 + 0.4*s + 1", 2],
];
const DEN_SYMBOLIC: Factor[] = [["tau*s + 1", 1], ["s + a", 1], ["s^2 + a*s + K", 2]];
const NUM_NUMERIC = ["s + 0.75", "s + 5", "s + 2.5", "s - 1", "s + 1.5"];
const NUM_SYMBOLIC = ["tau*s + 2", "s + 2*a"];
const SCALE_NUMERIC = ["2", "0.5", "-1.5", "3", "1.25", "-4", "1e-1"];
const SCALE_SYMBOLIC = ["K", "K/2", "-a", "2*tau", "(K + 1)"];
/** Extra denominator that makes an improper block proper when the wiring puts it on a loop. */
const PROPER_FIX = "s + 6";

type Properness = "strict" | "bi" | "improper";
type Kind = "sum" | "gain" | "transfer" | "integrator" | "branch";

const pick = <T>(pool: readonly T[], n: number): T => pool[n % pool.length];

const exprSpecArb = fc.record({
  properness: fc.constantFrom<Properness>("strict", "strict", "strict", "bi", "improper"),
  denCount: fc.integer({ min: 1, max: 2 }),
  picks: fc.array(fc.nat(1000), { minLength: 6, maxLength: 6 }),
  style: fc.nat(3),
});
type ExprSpec = typeof exprSpecArb extends fc.Arbitrary<infer T> ? T : never;

const coreArb = fc.record({
  kind: fc.constantFrom<Kind>("sum", "sum", "gain", "transfer", "transfer", "transfer", "integrator", "branch"),
  ports: fc.integer({ min: 1, max: 3 }),
  minus: fc.array(fc.boolean(), { minLength: 3, maxLength: 3 }),
  sources: fc.array(fc.nat(1000), { minLength: 3, maxLength: 3 }),
  // about three ports in four close a loop when a strictly proper block is there to close it
  back: fc.array(fc.nat(3).map((x) => x > 0), { minLength: 3, maxLength: 3 }),
  expr: exprSpecArb,
});
type CoreSpec = typeof coreArb extends fc.Arbitrary<infer T> ? T : never;

const specArb = (maxCore: number, minCore: number) =>
  fc.record({
    symbolic: fc.boolean(),
    objectForm: fc.boolean(),
    values: fc.array(fc.integer({ min: 300, max: 3000 }).map((v) => v / 1000), { minLength: 3, maxLength: 3 }),
    inputs: fc.integer({ min: 1, max: 3 }),
    outputs: fc.integer({ min: 1, max: 3 }),
    outSources: fc.array(fc.nat(1000), { minLength: 3, maxLength: 3 }),
    core: fc.array(coreArb, { minLength: minCore, maxLength: maxCore }),
  });
type DiagramSpec = typeof specArb extends (n: number, m: number) => fc.Arbitrary<infer T> ? T : never;

interface BuiltExpr {
  text: string;
  den: string;
  properness: Properness;
}

const product = (factors: string[]): string => factors.map((f) => (f === "s" ? "s" : `(${f})`)).join("*");

function transferExpr(e: ExprSpec, symbolic: boolean): BuiltExpr {
  const properness = e.properness;
  const denPool = symbolic ? [...DEN_NUMERIC, ...DEN_SYMBOLIC] : DEN_NUMERIC;
  const numPool = symbolic ? [...NUM_NUMERIC, ...NUM_SYMBOLIC] : NUM_NUMERIC;
  const scalePool = symbolic ? [...SCALE_NUMERIC, ...SCALE_SYMBOLIC] : SCALE_NUMERIC;
  const dens = Array.from({ length: e.denCount }, (_, i) => pick(denPool, e.picks[i]));
  const denDeg = dens.reduce((d, f) => d + f[1], 0);
  const numDeg = properness === "strict" ? e.picks[2] % denDeg : properness === "bi" ? denDeg : denDeg + 1;
  const nums = Array.from({ length: numDeg }, (_, i) => pick(numPool, e.picks[3] + i));
  const scale = pick(scalePool, e.picks[4]);
  const denText = product(dens.map((d) => d[0]));
  const over = dens.length === 1 ? `/${denText}` : `/(${denText})`;
  const distinct = dens.length === 2 && dens[0][0] !== dens[1][0];
  if (properness === "strict" && nums.length === 0 && distinct && e.style === 3) {
    // partial-fraction form: same lowest-terms denominator since the two factors are coprime
    const c2 = pick(SCALE_NUMERIC, e.picks[5]);
    return { text: `${scale}/(${dens[0][0]}) + ${c2}/(${dens[1][0]})`, den: denText, properness };
  }
  const numText = nums.length ? product(nums) : "";
  const styles = [
    () => `${scale}${numText ? `*${numText}` : ""}${over}`,
    () => `${scale}${over}${numText ? `*${numText}` : ""}`,
    () => [numText || "1", scale].join("*") + dens.map((d) => `/(${d[0]})`).join(""),
  ];
  return { text: pick(styles, e.style)(), den: denText, properness };
}

/** True when block `id` lies on a directed cycle of the wiring. */
function onCycle(id: string, wires: Wire[]): boolean {
  const seen = new Set<string>();
  const stack = wires.filter((w) => w.from === id).map((w) => w.to);
  while (stack.length) {
    const at = stack.pop()!;
    if (at === id) return true;
    if (seen.has(at)) continue;
    seen.add(at);
    for (const w of wires) if (w.from === at) stack.push(w.to);
  }
  return false;
}

/**
 * Deterministic assembly of a spec into a document: shrinking a spec shrinks the diagram. With `chain`, each core
 * block after the inputs' first takes its first port from the block before it, so the blocks form a forward path
 * and every backward wire closes a loop on it.
 */
function assembleDiagram(spec: DiagramSpec, chain: boolean): GeneratedDiagram {
  const inputs = Array.from({ length: spec.inputs }, (_, i) => `u${i + 1}`);
  const outputs = Array.from({ length: spec.outputs }, (_, i) => `y${i + 1}`);
  const core = spec.core.map((c: CoreSpec, i) => {
    const id = `${c.kind}${i + 1}`;
    const expr =
      c.kind === "transfer" ? transferExpr(c.expr, spec.symbolic) : undefined;
    const strict = c.kind === "integrator" || expr?.properness === "strict";
    return { spec: c, id, expr, strict, ports: c.kind === "sum" ? c.ports : 1 };
  });
  const wires: string[] = [];
  core.forEach((c, i) => {
    for (let p = 0; p < c.ports; p++) {
      const back = core.filter((d, j) => d.strict && (j > i || (j === i && c.strict)));
      const forward = [...inputs, ...core.slice(0, i).map((d) => d.id)];
      let from: string;
      if (i < inputs.length && p === 0) from = inputs[i];
      else if (chain && p === 0) from = core[i - 1].id;
      else if (c.spec.back[p] && back.length) from = pick(back, c.spec.sources[p]).id;
      else from = pick(forward, c.spec.sources[p]);
      wires.push(c.spec.kind === "sum" ? `${from}->${c.id}:${p}` : `${from}->${c.id}`);
    }
  });
  outputs.forEach((y, o) => wires.push(`${pick(core, spec.outSources[o]).id}->${y}`));

  const draft = makeDoc([], wires);
  const denominators: Record<string, string> = {};
  const blocks: Block[] = [...inputs.map((id): Block => ({ id, type: "input" }))];
  for (const c of core) {
    denominators[c.id] = c.spec.kind === "integrator" ? "s" : "1";
    if (c.spec.kind === "sum") {
      blocks.push({ id: c.id, type: "sum", signs: c.spec.minus.slice(0, c.ports).map((m) => (m ? "-" : "+")) });
    } else if (c.spec.kind === "gain") {
      const pool = spec.symbolic ? [...SCALE_NUMERIC, ...SCALE_SYMBOLIC] : SCALE_NUMERIC;
      blocks.push({ id: c.id, type: "gain", expr: pick(pool, c.spec.expr.picks[4]) });
    } else if (c.spec.kind === "transfer" && c.expr) {
      let { text, den } = c.expr;
      if (c.expr.properness === "improper" && onCycle(c.id, draft.wires)) {
        text = `(${text})/(${PROPER_FIX})`;
        den = `${den}*(${PROPER_FIX})`;
      }
      denominators[c.id] = den;
      blocks.push({ id: c.id, type: "transfer", expr: text });
    } else {
      blocks.push({ id: c.id, type: c.spec.kind as "integrator" | "branch" });
    }
  }
  blocks.push(...outputs.map((id): Block => ({ id, type: "output" })));
  for (const id of [...inputs, ...outputs]) denominators[id] = "1";

  const [K, a, tau] = spec.values;
  const parameters: DiagramDocument["parameters"] = spec.symbolic
    ? spec.objectForm
      ? { K: { value: K, min: 0, max: 10 }, a, tau: { value: tau, unit: "s", description: "time constant" } }
      : { K, a, tau }
    : {};
  return { doc: makeDoc(blocks, wires, parameters, "Random well-posed diagram"), denominators };
}

/**
 * Random well-posed diagrams with at most `maxCore` blocks (at least `minCore`, default 2) besides 1–3 inputs and
 * 1–3 outputs. `chain` strings the core blocks into one forward path (see assembleDiagram): most pairs then have
 * loops on their paths, where otherwise few do. Example: fc.sample(wellPosedDiagram({ maxCore: 9 }), 1)[0].doc.blocks.length <= 15.
 */
export const wellPosedDiagram = (opts: { maxCore: number; minCore?: number; chain?: boolean }): fc.Arbitrary<GeneratedDiagram> =>
  specArb(opts.maxCore, opts.minCore ?? 2).map((spec) => assembleDiagram(spec, opts.chain ?? false));

/** A random complex evaluation point away from the real axis (where poles of the pools lie). */
export const complexPoint = fc
  .record({ re: fc.integer({ min: -2000, max: 2000 }), im: fc.integer({ min: 300, max: 3000 }) })
  .map(({ re, im }) => ({ re: re / 1000, im: im / 1000 }));

/** Random parameter values for evaluation, distinct from the nominal ones. */
export const paramPoint = fc
  .array(fc.integer({ min: 200, max: 4000 }), { minLength: 3, maxLength: 3 })
  .map(([K, a, tau]) => ({ K: K / 1000, a: a / 1000, tau: tau / 1000 }));
