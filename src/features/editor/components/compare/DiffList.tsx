import type { DiagramDiff, WireRef } from "@shared/diagram/diff";
import type { Block } from "@shared/diagram/schema";
import { BLOCK_VIEWS } from "@/features/editor/blockKinds";

const blockName = (b: Pick<Block, "id" | "type"> & { label?: string }) => `${BLOCK_VIEWS[b.type].name} ${b.id}${b.label ? ` (${b.label})` : ""}`;
const wireName = (w: WireRef) => `${w.from} → ${w.to}${w.port !== null ? ` port ${w.port}` : ""}`;
const FIELD_NAMES: Record<string, string> = { type: "kind", label: "label", expr: "expression", signs: "signs" };

function Section({ title, items }: { title: string; items: string[] }) {
  if (!items.length) return null;
  return (
    <div>
      <h4 className="text-xs font-medium tracking-wide text-ink-faint uppercase">{title}</h4>
      <ul className="mt-1 list-disc pl-5 text-sm">
        {items.map((t) => (
          <li key={t}>{t}</li>
        ))}
      </ul>
    </div>
  );
}

/** The diagram difference in the model's terms: blocks and wires added or removed, changed fields and parameters side by side. */
export function DiffList({ diff, before, after }: { diff: DiagramDiff; before: string; after: string }) {
  if (diff.same) return <p className="text-sm text-ink-soft">The two diagrams are the same (only positions on the canvas may differ).</p>;
  const changedRows = [
    ...diff.blocks.changed.flatMap((c) => c.fields.map((f) => ({ what: blockName({ id: c.id, type: c.type }), field: FIELD_NAMES[f.field] ?? f.field, before: f.before, after: f.after }))),
    ...diff.parameters.map((p) => ({ what: `Parameter ${p.name}`, field: "value", before: p.before ?? "(none)", after: p.after ?? "(none)" })),
  ];
  return (
    <div className="flex flex-col gap-3">
      <Section title="Blocks added" items={diff.blocks.added.map(blockName)} />
      <Section title="Blocks removed" items={diff.blocks.removed.map(blockName)} />
      <Section title="Wires added" items={diff.wires.added.map(wireName)} />
      <Section title="Wires removed" items={diff.wires.removed.map(wireName)} />
      {changedRows.length > 0 && (
        <table className="w-full text-left text-sm">
          <caption className="mb-1 text-left text-xs font-medium tracking-wide text-ink-faint uppercase">Changed</caption>
          <thead className="border-b border-rule text-xs text-ink-soft">
            <tr>
              <th scope="col" className="py-1.5 pr-4 font-medium">Block or parameter</th>
              <th scope="col" className="py-1.5 pr-4 font-medium">Field</th>
              <th scope="col" className="py-1.5 pr-4 font-medium">{before}</th>
              <th scope="col" className="py-1.5 pr-4 font-medium">{after}</th>
            </tr>
          </thead>
          <tbody>
            {changedRows.map((r) => (
              <tr key={`${r.what}:${r.field}`} className="border-b border-rule last:border-b-0">
                <td className="py-1.5 pr-4">{r.what}</td>
                <td className="py-1.5 pr-4">{r.field}</td>
                <td className="py-1.5 pr-4 font-mono text-xs">{r.before || "—"}</td>
                <td className="py-1.5 pr-4 font-mono text-xs">{r.after || "—"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </div>
  );
}
