import { DIAGRAM_FORMAT, DIAGRAM_VERSION, type DiagramDocument } from "@shared/diagram/schema";
import { idSource, wireIds } from "@/features/editor/commands/ids";
import type { EditorDoc } from "@/features/editor/commands/types";

/** A diagram with nothing on it yet. */
export const emptyDocument = (): EditorDoc => ({
  format: DIAGRAM_FORMAT,
  version: DIAGRAM_VERSION,
  parameters: {},
  blocks: [],
  wires: [],
  layout: {},
});

/** Gives each id-less wire a fresh id `w<n>`; wires that have one keep it. Everything else is kept as loaded. */
export function withWireIds(doc: DiagramDocument): EditorDoc {
  const fresh = idSource(wireIds(doc));
  return { ...doc, wires: doc.wires.map((w) => (w.id === undefined ? { ...w, id: fresh("w") } : { ...w, id: w.id })) };
}
