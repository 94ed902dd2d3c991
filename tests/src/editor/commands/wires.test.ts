import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { Block } from "@shared/diagram/schema";
import { validateDiagram } from "@shared/diagram/validate";
import { connect, connectionRefusal, openInputs } from "@/features/editor/commands/wires";
import type { EditorDoc } from "@/features/editor/commands/types";
import { docOf, unityLoop } from "../support";

// The codes the shared validator raises for a wire that breaks the format's wiring rules.
const WIRING_CODES = new Set(["port-occupied", "second-incoming-wire", "input-has-incoming-wire", "output-has-outgoing-wire", "port-out-of-range", "port-missing"]);
const wiringCodes = (doc: EditorDoc) => validateDiagram(doc).problems.filter((p) => WIRING_CODES.has(p.code)).map((p) => p.code);

const blocks: Block[] = [
  { id: "r", type: "input" },
  { id: "e", type: "sum", signs: ["+", "-", "+"] },
  { id: "k", type: "gain", expr: "2" },
  { id: "b", type: "branch" },
  { id: "y", type: "output" },
];
const ids = blocks.map((b) => b.id);

describe("connect", () => {
  it("refuses exactly the wires the document validator would reject (property, cross-checked with validateDiagram)", () => {
    const attempt = fc.record({ from: fc.constantFrom(...ids), to: fc.constantFrom(...ids), port: fc.option(fc.integer({ min: 0, max: 3 }), { nil: undefined }) });
    fc.assert(
      fc.property(fc.array(attempt, { maxLength: 12 }), (attempts) => {
        let doc = docOf(blocks);
        for (const a of attempts) {
          const before = wiringCodes(doc).length;
          const out = connect(doc, a);
          // What the validator says about the same wire added without any checks.
          const target = blocks.find((b) => b.id === a.to)!;
          const raw = { ...doc, wires: [...doc.wires, { id: "raw", from: a.from, to: a.to, ...(target.type === "sum" ? { port: a.port } : {}) }] };
          const rejected = wiringCodes(raw).length > before;
          expect(out.ok).toBe(!rejected);
          if (out.ok) doc = out.doc;
        }
        expect(wiringCodes(doc)).toEqual([]);
      }),
      { numRuns: 200 },
    );
  });

  it("names the wire already feeding an occupied port and the block that refuses a wire (message content)", () => {
    const doc = unityLoop();
    expect(connectionRefusal(doc, { from: "r", to: "e", port: 1 })).toMatch(/Port 1 \(−\) of summing junction "e" is already fed by wire "w4" from "G"/);
    expect(connectionRefusal(doc, { from: "r", to: "G" })).toMatch(/Block "G" already takes its input from wire "w2"/);
    expect(connectionRefusal(doc, { from: "G", to: "r" })).toMatch(/Input block "r" is an external signal/);
    expect(connectionRefusal(doc, { from: "y", to: "G" })).toMatch(/Output block "y" only receives a signal/);
  });

  it("gives every new wire a fresh stable id and selects it", () => {
    const doc = docOf(blocks, ["r>e:0"]);
    const out = connect(doc, { from: "e", to: "k" });
    expect(out.ok && out.doc.wires.map((w) => w.id)).toEqual(["w1", "w2"]);
    expect(out.ok && out.select).toEqual({ blocks: [], wires: ["w2"] });
  });

  it("lists as open inputs only ports a wire may still enter", () => {
    const doc = unityLoop();
    expect(openInputs(doc, "G")).toEqual([]);
    const wider = { ...doc, blocks: doc.blocks.map((b) => (b.type === "sum" ? { ...b, signs: ["+", "-", "+"] as ("+" | "-")[] } : b)) };
    expect(openInputs(wider, "G")).toEqual([{ from: "G", to: "e", port: 2 }]);
  });
});
