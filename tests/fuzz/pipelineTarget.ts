import fc from "fast-check";
import { analyzeDocument } from "@shared/analysis/analyzeDiagram";
import type { Block, DiagramDocument } from "@shared/diagram/schema";
import { DISCRETISATION_METHODS, type DiscretisationMethod } from "@shared/implement/discretise";
import { ImplementError } from "@shared/implement/errors";
import { implement } from "@shared/implement/implement";
import { REALISATION_FORMS, type RealisationForm } from "@shared/implement/realise";
import type { ImplementSelection } from "@shared/implement/selection";
import { printReduction } from "@shared/reduce/printReduction";
import { reduceDocumentExact } from "@shared/reduce/reduceDiagram";
import { makeDoc } from "../support/docBuilder";
import { FUZZ_PARAMETERS, grammarExpression, hostileExpression } from "./exprArbitrary";
import { problemsFault, truncated, typedErrorFault, type FuzzTarget } from "./harness";

/**
 * The whole pipeline in-process — reduce (exact and printed), analyse, implement — on small diagrams whose block
 * expressions come from the expression generator, with random pair, break, Padé, Ts, method and form choices.
 */
const blockExpr = fc.oneof({ arbitrary: grammarExpression({ maxDepth: 3 }), weight: 5 }, hostileExpression);

/** Small loops with expression slots: unity feedback, controller and plant, a dead time, a feedforward branch. */
const shapes: ((e: string[]) => { blocks: Block[]; wires: string[] })[] = [
  ([g]) => ({
    blocks: [{ id: "r", type: "input" }, { id: "e", type: "sum", signs: ["+", "-"] }, { id: "g", type: "transfer", expr: g }, { id: "y", type: "output" }],
    wires: ["r->e:0", "e->g", "g->y", "g->e:1"],
  }),
  ([c, g, h]) => ({
    blocks: [
      { id: "r", type: "input" }, { id: "e", type: "sum", signs: ["+", "-"] }, { id: "c", type: "transfer", expr: c },
      { id: "g", type: "transfer", expr: g }, { id: "h", type: "gain", expr: h }, { id: "y", type: "output" },
    ],
    wires: ["r->e:0", "e->c", "c->g", "g->y", "g->h", "h->e:1"],
  }),
  ([c, t, g]) => ({
    blocks: [
      { id: "r", type: "input" }, { id: "e", type: "sum", signs: ["+", "-"] }, { id: "c", type: "transfer", expr: c },
      { id: "d", type: "delay", expr: t }, { id: "g", type: "transfer", expr: g }, { id: "y", type: "output" },
    ],
    wires: ["r->e:0", "e->c", "c->d", "d->g", "g->y", "g->e:1"],
  }),
  ([f, g, k]) => ({
    blocks: [
      { id: "r", type: "input" }, { id: "p", type: "branch" }, { id: "f", type: "transfer", expr: f }, { id: "e", type: "sum", signs: ["+", "-", "+"] },
      { id: "g", type: "transfer", expr: g }, { id: "i", type: "integrator" }, { id: "k", type: "gain", expr: k }, { id: "y", type: "output" },
    ],
    wires: ["r->p", "p->e:0", "p->f", "f->e:2", "e->g", "g->i", "i->y", "i->k", "k->e:1"],
  }),
];

// Mostly plain values (fc.double leans to the extremes, which the validator refuses before any algebra).
const valueArb = fc.oneof(
  { arbitrary: fc.integer({ min: -1000, max: 1000 }).map((x) => x / 100), weight: 12 },
  fc.double({ min: -100, max: 100, noNaN: true }),
  fc.constantFrom(0, -0, 1, -1, 1e-300, 1e300, 5e-324, Number.MAX_VALUE),
  fc.record({ value: fc.double({ min: 0, max: 10, noNaN: true }), min: fc.constant(0), max: fc.constant(10) }),
);

const documentArb: fc.Arbitrary<DiagramDocument> = fc
  .tuple(fc.nat(shapes.length - 1), fc.array(blockExpr, { minLength: 3, maxLength: 3 }), fc.array(valueArb, { minLength: FUZZ_PARAMETERS.length, maxLength: FUZZ_PARAMETERS.length }))
  .map(([shape, exprs, values]) => {
    const { blocks, wires } = shapes[shape](exprs);
    return makeDoc(blocks, wires, Object.fromEntries(FUZZ_PARAMETERS.map((name, i) => [name, values[i]])));
  });

const id = fc.oneof({ arbitrary: fc.constantFrom("r", "y", "e", "g", "c", "d", "h", "k", "i", "p", "f"), weight: 4 }, fc.string({ maxLength: 4 }));
const sampleTime = fc.oneof(fc.double({ min: 1e-4, max: 10, noNaN: true }), fc.constantFrom(0, -1, Number.NaN, Number.POSITIVE_INFINITY, 1e-300, 1e300));

const optionsArb = fc.record({
  input: fc.option(id, { freq: 3 }),
  output: fc.option(id, { freq: 3 }),
  break: fc.option(fc.oneof(fc.constantFrom("w1", "w2", "w4", "w6", "0", "3", "-1", "99"), fc.string({ maxLength: 4 })), { freq: 3 }),
  pade: fc.option(fc.integer({ min: 1, max: 10 }), { freq: 3 }),
  block: fc.option(id, { freq: 2 }),
  discretise: fc.option(
    fc.record({ ts: sampleTime, method: fc.constantFrom<DiscretisationMethod>(...DISCRETISATION_METHODS), prewarp: fc.option(fc.double({ min: -10, max: 1e4, noNaN: true }), { nil: undefined }) }),
    { nil: undefined },
  ),
  form: fc.constantFrom<RealisationForm>(...REALISATION_FORMS),
});
type PipelineOptions = typeof optionsArb extends fc.Arbitrary<infer T> ? T : never;

interface PipelineCase {
  doc: DiagramDocument;
  options: PipelineOptions;
}

const orUndefined = <T>(x: T | null): T | undefined => x ?? undefined;

function implementFault(c: PipelineCase, reduction: Parameters<typeof implement>[0]): string | null {
  const { options: o } = c;
  const selection: ImplementSelection = o.block !== null ? { block: o.block } : { input: o.input ?? "r", output: o.output ?? "y" };
  try {
    const done = implement(reduction, selection, { discretise: o.discretise, form: o.form });
    return done.result.stateSpace.A.every((row) => row.length === done.result.stateSpace.A.length) ? null : "A is not square";
  } catch (e) {
    return typedErrorFault(e, ImplementError);
  }
}

export const pipelineTarget: FuzzTarget<PipelineCase> = {
  name: "reduce → analyse → implement",
  arbitrary: fc.record({ doc: documentArb, options: optionsArb }),
  check(c) {
    const { doc, options: o } = c;
    const pair = { input: orUndefined(o.input), output: orUndefined(o.output) };
    const reduced = reduceDocumentExact(doc, pair);
    if (!reduced.ok) return problemsFault(reduced.problems, true);
    if (printReduction(reduced.reduction).transfers.length === 0) return "reduced to no transfer";
    const analysed = analyzeDocument(doc, { ...pair, break: orUndefined(o.break), padeOrder: orUndefined(o.pade) });
    const fault = analysed.ok ? problemsFault(analysed.result.warnings, false) : problemsFault(analysed.problems, true);
    return fault ?? implementFault(c, reduced.reduction);
  },
  show: ({ doc, options }) =>
    truncated(`${doc.blocks.flatMap((b) => ("expr" in b ? [`${b.id}: ${b.expr}`] : [])).join(" | ")} params ${JSON.stringify(doc.parameters)} ${JSON.stringify(options)}`, 300),
};
