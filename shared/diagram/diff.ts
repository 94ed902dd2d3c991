import type { Block, DiagramDocument, ParameterSpec, Wire } from "@shared/diagram/schema";

/** One field of a block or parameter that differs, old and new as the document writes them. */
export interface FieldChange {
  field: string;
  before: string;
  after: string;
}

export interface BlockChange {
  id: string;
  type: Block["type"];
  fields: FieldChange[];
}

/** A wire is named by what it connects, so a wire redrawn between the same ports (new id) is no change. */
export interface WireRef {
  from: string;
  to: string;
  port: number | null;
  id: string | null;
}

export interface ParameterChange {
  name: string;
  before: string | null;
  after: string | null;
}

/**
 * What changed between two diagram documents, in the model's terms (positions on the canvas are not a change).
 * Example: diffDiagrams(v1, v2).blocks.changed → [{ id: "g", type: "transfer", fields: [{ field: "expr", before: "K/s", after: "K/(s+1)" }] }].
 */
export interface DiagramDiff {
  blocks: { added: Block[]; removed: Block[]; changed: BlockChange[] };
  wires: { added: WireRef[]; removed: WireRef[] };
  parameters: ParameterChange[];
  /** True when nothing above differs. */
  same: boolean;
}

/** The fields a block kind may carry that change what it does or how it reads; the order is the display order. */
const BLOCK_FIELDS = ["type", "label", "expr", "signs"] as const;

function fieldText(block: Block, field: (typeof BLOCK_FIELDS)[number]): string {
  const value = (block as Record<string, unknown>)[field];
  if (value === undefined) return "";
  return Array.isArray(value) ? value.join(" ") : String(value);
}

function specText(spec: ParameterSpec | undefined): string | null {
  if (spec === undefined) return null;
  if (typeof spec === "number") return String(spec);
  const range = spec.min !== undefined || spec.max !== undefined ? ` in [${spec.min ?? "−∞"}, ${spec.max ?? "∞"}]` : "";
  return `${spec.value}${spec.unit ? ` ${spec.unit}` : ""}${range}`;
}

const wireRef = (w: Wire): WireRef => ({ from: w.from, to: w.to, port: w.port ?? null, id: w.id ?? null });
const wireKey = (w: WireRef) => `${w.from}→${w.to}#${w.port ?? ""}`;

export function diffDiagrams(before: DiagramDocument, after: DiagramDocument): DiagramDiff {
  const old = new Map(before.blocks.map((b) => [b.id, b]));
  const now = new Map(after.blocks.map((b) => [b.id, b]));
  const added = after.blocks.filter((b) => !old.has(b.id));
  const removed = before.blocks.filter((b) => !now.has(b.id));
  const changed: BlockChange[] = [];
  for (const b of after.blocks) {
    const a = old.get(b.id);
    if (!a) continue;
    const fields = BLOCK_FIELDS.map((field) => ({ field, before: fieldText(a, field), after: fieldText(b, field) })).filter((f) => f.before !== f.after);
    if (fields.length) changed.push({ id: b.id, type: b.type, fields });
  }

  const oldWires = new Map(before.wires.map((w) => [wireKey(wireRef(w)), wireRef(w)]));
  const newWires = new Map(after.wires.map((w) => [wireKey(wireRef(w)), wireRef(w)]));
  const wires = {
    added: [...newWires].filter(([k]) => !oldWires.has(k)).map(([, w]) => w),
    removed: [...oldWires].filter(([k]) => !newWires.has(k)).map(([, w]) => w),
  };

  const names = [...new Set([...Object.keys(before.parameters ?? {}), ...Object.keys(after.parameters ?? {})])].sort();
  const parameters = names
    .map((name) => ({ name, before: specText(before.parameters?.[name]), after: specText(after.parameters?.[name]) }))
    .filter((p) => p.before !== p.after);

  const same = !added.length && !removed.length && !changed.length && !wires.added.length && !wires.removed.length && !parameters.length;
  return { blocks: { added, removed, changed }, wires, parameters, same };
}
