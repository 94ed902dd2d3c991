import { describe, expect, it } from "vitest";
import { analyzeDocument } from "@shared/analysis/analyzeDiagram";
import { inputRole } from "@shared/analysis/inputRole";
import { makeDoc } from "../../support/docBuilder";

// r → e(+, −) → C → s2(+, +) → G → y, with y fed back into e; d enters s2 between controller and plant.
const loop = (controller: string) =>
  makeDoc(
    [
      { id: "r", type: "input" },
      { id: "d", type: "input" },
      { id: "e", type: "sum", signs: ["+", "-"] },
      { id: "C", type: "transfer", expr: controller },
      { id: "s2", type: "sum", signs: ["+", "+"] },
      { id: "G", type: "transfer", expr: "1/(s + 1)" },
      { id: "y", type: "output" },
    ],
    ["r->e:0", "e->C", "C->s2:0", "d->s2:1", "s2->G", "G->y", "G->e:1"],
  );

describe("inputRole", () => {
  it("tells the reference (at the comparison junction) from a disturbance (anywhere else in the loop)", () => {
    const doc = loop("2");
    expect(inputRole(doc, "r")).toEqual({ kind: "reference" });
    expect(inputRole(doc, "d")).toEqual({ kind: "disturbance", entersAt: ["s2"], junction: "e" });
  });
});

describe("steady state of a disturbance pair", () => {
  const steady = (controller: string, input: string) => {
    const out = analyzeDocument(loop(controller), { input, output: "y" });
    if (!out.ok) throw new Error(out.problems.map((p) => p.message).join("; "));
    return out.analysis.steadyState;
  };

  it("reports the output's final value, not e = r − y (common practice: Y/D = G/(1 + CG); at s = 0, 1/(1 + 2) = 1/3)", () => {
    const ss = steady("2", "d");
    expect(ss.inputRole.kind).toBe("disturbance");
    expect(ss.finalValue.exact).toBe("1/3");
    expect(ss.errors.step.value).toBeNull();
    expect(ss.errors.step.note).toMatch(/^Not a reference: the input enters the loop at s2, not at its comparison junction e/);
  });

  it("an integrating controller rejects a step disturbance fully (common practice: Y/D = s/(s² + s + 1) → 0)", () => {
    expect(steady("1/s", "d").finalValue.exact).toBe("0");
  });

  it("keeps e = r − y for the reference (common practice: T = 2/(s + 3), e = 1 − 2/3 = 1/3)", () => {
    const ss = steady("2", "r");
    expect(ss.inputRole.kind).toBe("reference");
    expect(ss.errors.step.exact).toBe("1/3");
  });
});
