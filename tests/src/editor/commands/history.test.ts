import { describe, expect, it } from "vitest";
import { COALESCE_MS, HISTORY_LIMIT, record, redo, startHistory, undo } from "@/features/editor/commands/history";
import { addBlock } from "@/features/editor/commands/blocks";
import { emptyDocument } from "@/features/editor/commands/document";
import type { EditorDoc } from "@/features/editor/commands/types";

const next = (doc: EditorDoc, i: number) => {
  const out = addBlock(doc, "gain", { x: i * 16, y: 0 });
  if (!out.ok) throw new Error(out.reason);
  return out.doc;
};

describe("undo/redo history", () => {
  it("undoes at least 100 steps back to the exact earlier documents and redoes them (common practice: ≥100-step undo)", () => {
    let h = startHistory(emptyDocument());
    const seen: EditorDoc[] = [h.present];
    for (let i = 0; i < 150; i += 1) {
      h = record(h, "Add gain", next(h.present, i), { now: i * 10_000 });
      seen.push(h.present);
    }
    for (let k = 1; k <= 120; k += 1) {
      h = undo(h);
      expect(h.present).toBe(seen[150 - k]);
    }
    expect(h.present.blocks).toHaveLength(30);
    for (let k = 1; k <= 120; k += 1) h = redo(h);
    expect(h.present).toBe(seen[150]);
    expect(h.present.blocks).toHaveLength(150);
  });

  it(`keeps the newest ${HISTORY_LIMIT} steps and drops older ones (common practice: bounded history)`, () => {
    let h = startHistory(emptyDocument());
    for (let i = 0; i < HISTORY_LIMIT + 25; i += 1) h = record(h, "Add gain", next(h.present, i), { now: i * 10_000 });
    expect(h.past).toHaveLength(HISTORY_LIMIT);
    for (let i = 0; i < HISTORY_LIMIT + 10; i += 1) h = undo(h);
    expect(h.present.blocks).toHaveLength(25);
  });

  it("a new command after undo clears the redo list (common practice: linear undo)", () => {
    let h = startHistory(emptyDocument());
    h = record(h, "a", next(h.present, 0), { now: 0 });
    h = record(h, "b", next(h.present, 1), { now: 10_000 });
    h = undo(h);
    expect(h.future).toHaveLength(1);
    h = record(h, "c", next(h.present, 2), { now: 20_000 });
    expect(h.future).toHaveLength(0);
    expect(redo(h)).toBe(h);
  });

  it("merges keystrokes into one field into one step, but not across fields or after a pause (common practice)", () => {
    const base = emptyDocument();
    let h = startHistory(base);
    const docs = [0, 1, 2, 3].map((i) => ({ ...base, title: `t${i}` }));
    h = record(h, "Edit", docs[0], { coalesce: "expr:G", now: 0 });
    h = record(h, "Edit", docs[1], { coalesce: "expr:G", now: COALESCE_MS - 1 });
    expect(h.past).toHaveLength(1);
    h = record(h, "Edit", docs[2], { coalesce: "label:G", now: COALESCE_MS });
    h = record(h, "Edit", docs[3], { coalesce: "label:G", now: 3 * COALESCE_MS });
    expect(h.past).toHaveLength(3);
    h = undo(undo(undo(h)));
    expect(h.present).toBe(base);
  });

  it("records nothing for a command that left the document unchanged", () => {
    const h = startHistory(emptyDocument());
    expect(record(h, "Move", h.present)).toBe(h);
    expect(undo(h)).toBe(h);
  });
});
