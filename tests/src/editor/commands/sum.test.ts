import { describe, expect, it } from "vitest";
import { reduceDocument } from "@shared/reduce/reduceDiagram";
import { addSumPort, removeSumPort, setSign, toggleSign } from "@/features/editor/commands/sum";
import type { EditorDoc, Outcome } from "@/features/editor/commands/types";
import { unityLoop } from "../support";

const ok = (o: Outcome): EditorDoc => {
  if (!o.ok) throw new Error(o.reason);
  return o.doc;
};
const closedLoop = (doc: EditorDoc) => {
  const r = reduceDocument(doc);
  if (!r.ok) throw new Error(r.problems.map((p) => p.message).join("; "));
  return `${r.result.transfers[0].numerator} / ${r.result.transfers[0].denominator}`;
};

describe("summing junction commands", () => {
  // from memory: Ogata, Modern Control Engineering — unity negative feedback gives G/(1+G), positive G/(1−G).
  it("the sign of the feedback port decides negative or positive feedback (checked with the reducer)", () => {
    const doc = unityLoop();
    expect(closedLoop(doc)).toBe("K / s^2 + 2*s + K");
    expect(closedLoop(ok(toggleSign(doc, "e", 1)))).toBe("K / s^2 + 2*s - K");
    expect(closedLoop(ok(setSign(doc, "e", 1, "-")))).toBe(closedLoop(doc));
  });

  it("removing a port removes its wire and renumbers the ports above, so every wire keeps its sign", () => {
    // e gets a third port (+) fed by a disturbance input d; removing the unused middle sign must keep d on +.
    let doc = ok(addSumPort(unityLoop(), "e", "+"));
    doc = { ...doc, blocks: [...doc.blocks, { id: "d", type: "input" }], wires: [...doc.wires, { id: "w5", from: "d", to: "e", port: 2 }] };
    const signOf = (d: EditorDoc, wireId: string) => {
      const w = d.wires.find((x) => x.id === wireId)!;
      const sum = d.blocks.find((b) => b.id === w.to);
      return sum?.type === "sum" ? sum.signs[w.port!] : undefined;
    };
    const after = ok(removeSumPort(doc, "e", 1));
    expect(after.wires.map((w) => w.id)).toEqual(["w1", "w2", "w3", "w5"]);
    expect(signOf(after, "w5")).toBe("+");
    expect(signOf(after, "w1")).toBe("+");
    expect(after.wires.find((w) => w.id === "w5")?.port).toBe(1);
  });

  it("refuses to remove the last port and to add a seventeenth", () => {
    let doc = ok(removeSumPort(unityLoop(), "e", 1));
    expect(removeSumPort(doc, "e", 0)).toMatchObject({ ok: false, reason: expect.stringMatching(/keeps at least one port/) });
    for (let i = 0; i < 15; i += 1) doc = ok(addSumPort(doc, "e", "+"));
    expect(addSumPort(doc, "e", "+")).toMatchObject({ ok: false, reason: expect.stringMatching(/at most 16/) });
  });
});
