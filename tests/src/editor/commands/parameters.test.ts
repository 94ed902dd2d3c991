import { describe, expect, it } from "vitest";
import { validateDiagram } from "@shared/diagram/validate";
import { blocksUsing, removeParameter, renameParameter, setParameter, undeclaredNames } from "@/features/editor/commands/parameters";
import type { EditorDoc, Outcome } from "@/features/editor/commands/types";
import { docOf } from "../support";

const ok = (o: Outcome): EditorDoc => {
  if (!o.ok) throw new Error(o.reason);
  return o.doc;
};
const doc = docOf(
  [
    { id: "r", type: "input" },
    { id: "c", type: "transfer", expr: "Kp*(s + K)/(K*s)" },
    { id: "y", type: "output" },
  ],
  ["r>c", "c>y"],
  { K: 2, Kp: { value: 3, unit: "V/V" } },
);
const unknownNames = (d: EditorDoc) => validateDiagram(d).problems.filter((p) => p.code === "unknown-name");

describe("parameter commands", () => {
  it("renames every use of a name token by token, leaving longer names alone (checked with the validator)", () => {
    const after = ok(renameParameter(doc, "K", "Ka"));
    expect(after.blocks[1]).toMatchObject({ expr: "Kp*(s + Ka)/(Ka*s)" });
    expect(Object.keys(after.parameters)).toEqual(["Ka", "Kp"]);
    expect(unknownNames(after)).toEqual([]);
  });

  it("refuses names the format forbids, with the format's own message (document schema rules)", () => {
    expect(renameParameter(doc, "K", "s")).toMatchObject({ ok: false, reason: expect.stringMatching(/Laplace variable/) });
    expect(setParameter(doc, "2K", { value: 1 })).toMatchObject({ ok: false, reason: expect.stringMatching(/starts with a letter/) });
    expect(renameParameter(doc, "K", "Kp")).toMatchObject({ ok: false, reason: "A parameter named Kp already exists" });
    expect(setParameter(doc, "T", { value: Number.NaN })).toMatchObject({ ok: false });
  });

  it("stores a bare number when only the value is set, an object otherwise", () => {
    expect(ok(setParameter(doc, "T", { value: 0.5 })).parameters.T).toBe(0.5);
    expect(ok(setParameter(doc, "T", { value: 0.5, unit: "s", min: 0.1 })).parameters.T).toEqual({ value: 0.5, unit: "s", min: 0.1 });
  });

  it("will not remove a parameter that is still used, and says where", () => {
    expect(blocksUsing(doc, "K")).toEqual(["c"]);
    expect(removeParameter(doc, "K")).toMatchObject({ ok: false, reason: 'Parameter K is used by "c"; change those expressions first' });
    const unused = ok(setParameter(doc, "T", { value: 1 }));
    expect(Object.keys(ok(removeParameter(unused, "T")).parameters)).toEqual(["K", "Kp"]);
  });

  it("lists undeclared names in first-use order, agreeing with the validator's unknown-name problems", () => {
    const bare = { ...doc, parameters: {} };
    expect(undeclaredNames(bare)).toEqual(["Kp", "K"]);
    // Every use is its own problem, at its own position (Kp*(s + K)/(K*s): 0, 8, 12), all on block c.
    expect(unknownNames(bare).map((p) => [p.blockId, p.position])).toEqual([
      ["c", 0],
      ["c", 8],
      ["c", 12],
    ]);
    expect([...new Set(unknownNames(bare).map((p) => /`(\w+)`/.exec(p.message)?.[1]))]).toEqual(undeclaredNames(bare));
  });
});
