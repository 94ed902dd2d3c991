import { describe, expect, it } from "vitest";
import { ratToText } from "@shared/algebra/ratfn";
import { AnalysisError } from "@shared/analysis/errors";
import { cutGraph, defaultBreak, findBreak, loopGain } from "@shared/analysis/loopGain";
import { makeDoc } from "../../support/docBuilder";
import { reduced } from "../../support/reduced";

const loop = (signs: ("+" | "-")[], h = "1") =>
  makeDoc(
    [
      { id: "r", type: "input" },
      { id: "e", type: "sum", signs },
      { id: "g", type: "transfer", expr: "K/(s*(s + 2))" },
      { id: "b", type: "branch" },
      { id: "h", type: "gain", expr: h },
      { id: "y", type: "output" },
    ],
    ["r->e:0", "e->g", "g->b", "b->y", "b->h", "h->e:1"],
    { K: 4 },
  );

const L = (doc: ReturnType<typeof loop>, wire: string) => {
  const out = loopGain(reduced(doc), findBreak(doc, wire));
  if (!out.ok) throw new Error(out.problems.map((p) => p.message).join("; "));
  return ratToText(out.L);
};

describe("loop gain at a break, L = −w/u", () => {
  it("unity negative feedback around G gives L = G (definition of the analysis; from memory: Nise, open-loop transfer function G·H)", () => {
    expect(L(loop(["+", "-"]), "w6")).toBe("K/(s^2 + 2*s)");
  });

  it("non-unity feedback gives L = G·H, whichever loop wire is cut (common practice)", () => {
    const doc = loop(["+", "-"], "0.5");
    expect(L(doc, "w6")).toBe("(1/2*K)/(s^2 + 2*s)");
    expect(L(doc, "w2")).toBe("(1/2*K)/(s^2 + 2*s)");
  });

  it("a positive-feedback port gives L = −G·H, so 1 + L = 1 − G·H (common practice)", () => {
    expect(L(loop(["+", "+"]), "w6")).toBe("(-K)/(s^2 + 2*s)");
  });

  it("the default break is the wire into the minus port of the first summing junction the input reaches", () => {
    const bp = defaultBreak(loop(["+", "-"]), "r");
    expect(bp).toMatchObject({ index: 5, label: "w6", chosen: "default" });
    expect(defaultBreak(loop(["+", "+"]), "r")).toBeNull();
  });

  it("the default break for a disturbance entering a minus port is a wire of the loop, not the disturbance's own (common practice: L is read around the loop)", () => {
    // r → e(+, −) → g → s2(−, +) → y, with y fed back to e; d enters s2's minus port from outside the loop.
    const doc = makeDoc(
      [
        { id: "r", type: "input" },
        { id: "d", type: "input" },
        { id: "e", type: "sum", signs: ["+", "-"] },
        { id: "g", type: "transfer", expr: "K/(s*(s + 2))" },
        { id: "s2", type: "sum", signs: ["-", "+"] },
        { id: "y", type: "output" },
      ],
      ["r->e:0", "e->g", "d->s2:0", "g->s2:1", "s2->y", "s2->e:1"],
      { K: 4 },
    );
    expect(defaultBreak(doc, "d")).toMatchObject({ label: "w6" });
    const out = loopGain(reduced(doc), defaultBreak(doc, "d")!);
    expect(out.ok && ratToText(out.L)).toBe("K/(s^2 + 2*s)");
  });

  it("a wire by 0-based index; an unknown wire is an AnalysisError naming it", () => {
    expect(findBreak(loop(["+", "-"]), "5").label).toBe("w6");
    try {
      findBreak(loop(["+", "-"]), "nope");
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(AnalysisError);
      expect((e as AnalysisError).code).toBe("unknown-break-wire");
      expect((e as AnalysisError).subject).toBe("nope");
    }
  });

  it("the cut graph injects u through the port's sign and reads w at the source", () => {
    const doc = loop(["+", "-"]);
    const { graph } = reduced(doc);
    const cut = cutGraph(graph, findBreak(doc, "w6"));
    const edges = cut.graph.edges();
    expect(edges.find((e) => e.from === cut.input)).toMatchObject({ to: "e", sign: -1 });
    expect(edges.find((e) => e.to === cut.output)).toMatchObject({ from: "h", sign: 1 });
    expect(edges.some((e) => e.from === "h" && e.to === "e")).toBe(false);
    expect(edges).toHaveLength(graph.edges().length + 1);
  });
});
