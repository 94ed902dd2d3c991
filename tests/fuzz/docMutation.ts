import fc from "fast-check";
import type { DiagramDocument } from "@shared/diagram/schema";
import { wellPosedDiagram } from "../support/arbitraries";
import { delayedLoop, hiddenUnstableLoop, piLoop, unityFeedback } from "../support/docBuilder";

/** Valid documents to start from: the hand-written loops and random well-posed diagrams. */
export const validDocument: fc.Arbitrary<DiagramDocument> = fc.oneof(
  fc.constantFrom(
    unityFeedback("K/(s*(s + 2))", { K: 4 }),
    piLoop("8/(0.25*s + 1)", { Kp: 2, Ti: 0.4 }),
    delayedLoop("2", "0.5", "1/(s + 1)"),
    hiddenUnstableLoop(),
  ),
  wellPosedDiagram({ maxCore: 4 }).map((g) => g.doc),
);

type Json = unknown;
type Path = (string | number)[];

function pathsOf(value: Json, at: Path = [], out: Path[] = []): Path[] {
  out.push(at);
  if (Array.isArray(value)) value.forEach((v, i) => pathsOf(v, [...at, i], out));
  else if (value !== null && typeof value === "object") for (const [k, v] of Object.entries(value)) pathsOf(v, [...at, k], out);
  return out;
}

const HOSTILE_VALUES: Json[] = [
  null, "", "s", 0, -0, -1, 1e308, -1e308, 5e-324, Number.NaN, Number.POSITIVE_INFINITY, true, [], {}, "x".repeat(5000),
  "__proto__", "constructor", { __proto__: { polluted: 1 } }, ["+", "-", "*"], 2.5, 2 ** 53 + 1,
];

const mutationArb = fc.record({
  pick: fc.nat(),
  op: fc.constantFrom("set", "set", "delete", "duplicate", "hostile"),
  value: fc.oneof(fc.anything({ maxDepth: 2 }), fc.constantFrom(...HOSTILE_VALUES)),
});
type Mutation = typeof mutationArb extends fc.Arbitrary<infer T> ? T : never;

function apply(doc: Json, m: Mutation): Json {
  const paths = pathsOf(doc);
  const path = paths[m.pick % paths.length];
  if (path.length === 0) return m.op === "set" ? m.value : doc;
  const parent = path.slice(0, -1).reduce<Json>((v, k) => (v as Record<string | number, Json>)[k], doc) as Record<string | number, Json>;
  const key = path[path.length - 1];
  if (m.op === "delete") {
    if (Array.isArray(parent)) parent.splice(Number(key), 1);
    else delete parent[key];
  } else if (m.op === "duplicate" && Array.isArray(parent)) parent.push(structuredClone(parent[Number(key)]));
  // Copies, so that no edit reaches a value another case shares.
  else if (m.op === "hostile") parent[key] = structuredClone(HOSTILE_VALUES[m.pick % HOSTILE_VALUES.length]);
  else parent[key] = structuredClone(m.value);
  return doc;
}

/** Many copies of a document's first block or wire, up to past the block limit (done last, and once). */
const floodArb = fc.option(fc.record({ list: fc.constantFrom("blocks", "wires"), count: fc.integer({ min: 1, max: 2100 }) }), { freq: 8 });

function flood(doc: Json, f: { list: "blocks" | "wires"; count: number } | null): Json {
  const list = f && doc !== null && typeof doc === "object" ? (doc as Record<string, Json>)[f.list] : undefined;
  if (!f || !Array.isArray(list) || list.length === 0) return doc;
  const first = list[0] as Json;
  const copy = (i: number) => (first !== null && typeof first === "object" && !Array.isArray(first) ? { ...first, id: `${f.list}${i}` } : first);
  list.push(...Array.from({ length: f.count }, (_, i) => copy(i)));
  return doc;
}

/** A valid document with one to four random edits (fields set to anything, deleted or duplicated), sometimes flooded. */
export const mutatedDocument: fc.Arbitrary<Json> = fc
  .tuple(validDocument, fc.array(mutationArb, { minLength: 1, maxLength: 4 }), floodArb)
  .map(([doc, ms, f]) => flood(ms.reduce<Json>((d, m) => apply(d, m), structuredClone(doc)), f));
