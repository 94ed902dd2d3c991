import type { Block, DiagramDocument, Wire } from "@shared/diagram/schema";

/** Inside the editor every wire carries an id, so selection, undo, highlights and messages can name it. */
export type EditorWire = Wire & { id: string };

/** A diagram document whose wires all have ids; unknown fields of the format are kept as loaded. */
export interface EditorDoc {
  [field: string]: unknown;
  format: DiagramDocument["format"];
  version: DiagramDocument["version"];
  title?: string;
  notes?: string;
  parameters: DiagramDocument["parameters"];
  blocks: Block[];
  wires: EditorWire[];
  layout?: DiagramDocument["layout"];
}

export type { Point } from "@shared/geometry/wireRoute";

/** What is selected on the canvas, by id. */
export interface Selection {
  blocks: string[];
  wires: string[];
}

/**
 * What every command returns: the next document (plus what to select afterwards), or the reason it was
 * refused — a sentence the editor shows where the user is looking.
 */
export type Outcome = { ok: true; doc: EditorDoc; select?: Selection } | { ok: false; reason: string };

export const done = (doc: EditorDoc, select?: Selection): Outcome => ({ ok: true, doc, ...(select ? { select } : {}) });
export const refuse = (reason: string): Outcome => ({ ok: false, reason });
