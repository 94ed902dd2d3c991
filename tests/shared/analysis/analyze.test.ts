import { describe, expect, it } from "vitest";
import { analyzeAt } from "@shared/analysis/analyze";
import { analyzeDocument } from "@shared/analysis/analyzeDiagram";
import { prepared } from "../../support/reduced";
import { analysisResultSchema } from "@shared/analysis/schema";
import { hiddenUnstableLoop, makeDoc, unityFeedback } from "../../support/docBuilder";
import { diagram } from "../reduce/diagramSpec";



describe("analysis of a document", () => {
  it("K/(s(s+7)(s+11)) with K = 100: stable, stable range 0 < K < 1386, type 1 with Kv = K/77 (from memory: Nise, Examples 6.9 and 7.x)", () => {
    const a = analyzeAt(prepared(unityFeedback("K/(s*(s + 7)*(s + 11))", { K: 100 })));
    expect(a.stability.verdict).toBe("stable");
    expect(a.stableSets.map((s) => s.text)).toEqual(["0 < K < 1386"]);
    expect(a.steadyState.systemType).toBe(1);
    expect(a.steadyState.constants?.Kv.exact).toBe("100/77");
    expect(a.steadyState.errors.ramp.exact).toBe("77/100");
    expect(a.dcGain).toEqual({ value: 1, exact: "1" });
    expect(a.loop?.breakPoint).toMatchObject({ label: "w5", chosen: "default" });
    expect(a.loop?.nyquist.verdict).toBe("stable");
  });

  it("K beyond the range: the slider value K = 2000 gives an unstable loop, null step metrics and negative margins (Nise, Example 6.9)", () => {
    const p = prepared(unityFeedback("K/(s*(s + 7)*(s + 11))", { K: 100 }));
    const a = analyzeAt(p, { values: { K: 2000 }, stableSets: false });
    expect(a.stability.verdict).toBe("unstable");
    expect(a.step.overshootPercent).toBeNull();
    expect(a.notes.join(" ")).toMatch(/Step metrics are not defined: the transfer function is unstable/);
    expect(a.loop?.margins.gainMarginDb).toBeLessThan(0);
    expect(a.loop?.nyquist.closedLoopRhpPoles).toBe(2);
  });

  it("a hidden unstable mode is reported, not shown as a pole, and the characteristic verdict differs (common practice: unstable pole-zero cancellation)", () => {
    const doc = hiddenUnstableLoop();
    const a = analyzeAt(prepared(doc));
    expect(a.poles.map((p) => p.re)).toEqual([-3]);
    expect(a.stability.verdict).toBe("stable");
    expect(a.hiddenModes).toEqual([expect.objectContaining({ factor: "s - 1", unstable: true, source: "reduction" })]);
    expect(a.characteristic.stability?.verdict).toBe("unstable");
    expect(a.characteristic.sameVerdict).toBe(false);
    expect(a.notes.join(" ")).toMatch(/characteristic polynomial .* is unstable/);
  });

  const twoLags = (g: string, h: string) =>
    makeDoc(
      [
        { id: "r", type: "input" },
        { id: "e", type: "sum", signs: ["+", "-"] },
        { id: "g", type: "transfer", expr: g },
        { id: "h", type: "transfer", expr: h },
        { id: "b", type: "branch" },
        { id: "y", type: "output" },
      ],
      ["r->e:0", "e->g", "g->h", "h->b", "b->y", "b->e:1"],
    );

  it("a closed loop of degree 61 (above the typed-expression power limit of 50) is analysed (common practice: a polynomial with missing powers has roots off the open left half-plane)", () => {
    const out = analyzeDocument(twoLags("1/(s^30 + 3)", "1/(s^31 + 2)"));
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    // (s^30 + 3)(s^31 + 2) + 1 = s^61 + 3s^31 + 2s^30 + 7: 61 poles, not Hurwitz.
    expect(out.result.poles).toHaveLength(61);
    expect(out.result.stable).toBe("unstable");
  });

  it("a closed loop of degree 101 is refused with a degree-limit problem, not an internal error (common practice: clear refusal)", () => {
    const out = analyzeDocument(twoLags("1/(s^50 + 3)", "1/((s^50 + 2)*s)"));
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.problems).toEqual([expect.objectContaining({ severity: "error", code: "degree-limit", message: expect.stringMatching(/101/) })]);
  });

  it("improper T: metrics null with the reason, impulse terms in the response", () => {
    const doc = makeDoc([{ id: "r", type: "input" }, { id: "g", type: "transfer", expr: "(s^2 + 1)/(s + 1)" }, { id: "y", type: "output" }], ["r->g", "g->y"]);
    const a = analyzeAt(prepared(doc));
    expect(a.step.riseTime).toBeNull();
    expect(a.notes.join(" ")).toMatch(/T is improper/);
    expect(a.responses.step.impulses.length).toBeGreaterThan(0);
    expect(a.loop).toBeNull();
    expect(a.notes.join(" ")).toMatch(/No break point/);
  });

  it("T(0) = 0: metrics null and said so", () => {
    const a = analyzeAt(prepared(unityFeedback("s/((s + 1)*(s + 2))")));
    expect(a.step.settlingTime).toBeNull();
    expect(a.notes.join(" ")).toMatch(/T\(0\) = 0/);
  });

  it("analyzeDocument: the result parses with the published schema; an unknown break is a problem with its code", () => {
    const out = analyzeDocument(unityFeedback("4/((s + 1)*(s + 2))"));
    if (!out.ok) throw new Error("expected success");
    expect(analysisResultSchema.parse(out.result).stable).toBe("stable");
    const bad = analyzeDocument(unityFeedback("4/((s + 1)*(s + 2))"), { break: "nope" });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.problems[0]).toMatchObject({ code: "unknown-break-wire", field: "break" });
  });
});

describe("analyzeDocument's problems (the analysis CLI)", () => {
  // common practice: positive unity feedback around a gain of 1 is singular (e = r + e); h is left unconnected.
  it("lists an algebraic loop beside an unconnected block", () => {
    const out = analyzeDocument(diagram(
      [["r", "input"], ["e", "sum", ["+", "+"]], ["g", "gain", "1"], ["y", "output"], ["h", "transfer", "1/(s+1)"]],
      ["r>e:0", "e>g", "g>e:1", "g>y"],
    ));
    expect(out.ok ? [] : out.problems.filter((p) => p.severity === "error").map((p) => [p.code, p.blockId])).toEqual([
      ["unwired-port", "h"],
      ["algebraic-loop", "e"],
    ]);
  });
});
