import { describe, expect, it } from "vitest";
import { analyzeAt } from "@shared/analysis/analyze";
import { OVERLAY_VALUES } from "@shared/analysis/analyzeDiagram";
import type { AnalysisAnswer, AnalysisQuery } from "@shared/analysis/answer";
import type { EditorDoc } from "@/features/editor/commands/types";
import { createLiveSession, reductionKey } from "@/features/editor/worker/liveSession";
import { prepared } from "../../../support/reduced";
import { docOf, unityLoop } from "../support";
import { diagram } from "../../../shared/reduce/diagramSpec";

type Query = AnalysisQuery & { document: EditorDoc };

const query = (document: EditorDoc, over: Partial<AnalysisQuery> = {}): Query => ({
  document,
  input: null,
  output: null,
  break: null,
  values: {},
  settlingBand: 0.02,
  sweepParameter: null,
  withSweep: true,
  ...over,
});

/** One worker session answering requests as live.worker.ts does: reduce the document, then analyse. */
function createAnalyzer() {
  const session = createLiveSession();
  return ({ document, ...q }: Query): AnalysisAnswer => {
    session.reduce(document);
    return session.analyze(q);
  };
}

function ok(a: AnalysisAnswer) {
  if (!a.ok) throw new Error(a.problems.map((p) => p.message).join("; "));
  return a;
}

/** common practice: standard second-order formula, overshoot = 100·exp(−ζπ/√(1−ζ²)). */
const overshoot = (zeta: number) => 100 * Math.exp((-zeta * Math.PI) / Math.sqrt(1 - zeta * zeta));

describe("the editor worker's analysis (unity feedback around K/(s(s+2)): closed loop K/(s² + 2s + K))", () => {
  it("gives the verdict and the second-order overshoot at nominal and at slider values", () => {
    const analyze = createAnalyzer();
    const nominal = ok(analyze(query(unityLoop())));
    expect(nominal.analysis.stability.verdict).toBe("stable");
    // K = 4: ωn = 2, ζ = 0.5 → 16.3 % (common practice: standard second-order formulas).
    expect(nominal.analysis.step.overshootPercent).toBeCloseTo(overshoot(0.5), 3);
    expect(nominal.parameters).toEqual([{ name: "K", nominal: 4, range: [0.4, 40] }]);
    // K = 16: ωn = 4, ζ = 0.25 → 44.4 %.
    const moved = ok(analyze(query(unityLoop(), { values: { K: 16 } })));
    expect(moved.analysis.values.K).toBe(16);
    expect(moved.analysis.step.overshootPercent).toBeCloseTo(overshoot(0.25), 3);
    // K = −1: s² + 2s − 1 has a root at −1 + √2 > 0 (quadratic formula).
    expect(ok(analyze(query(unityLoop(), { values: { K: -1 } }))).analysis.stability.verdict).toBe("unstable");
  });

  it("keeps the stable range and the Routh conditions on slider moves (from memory: Ogata, Routh criterion for s² + 2s + K → K > 0)", () => {
    const analyze = createAnalyzer();
    ok(analyze(query(unityLoop())));
    const moved = ok(analyze(query(unityLoop(), { values: { K: 9 } })));
    expect(moved.analysis.stableSets).toHaveLength(1);
    expect(moved.analysis.stableSets[0].intervals).toMatchObject([{ lower: { value: 0 }, upper: null, lowerIncluded: false }]);
  });

  it("recomputes another parameter's stable range when a slider moves, agreeing with a full analysis at those values", () => {
    // Two parameters: G = K/(s (T s + 1) (s + 1)); the range of K depends on T and the other way round.
    const doc = { ...unityLoop("K/(s*(T*s+1)*(s+1))"), parameters: { K: 1, T: 0.5 } };
    const analyze = createAnalyzer();
    ok(analyze(query(doc)));
    const moved = ok(analyze(query(doc, { values: { T: 0.25 } })));
    const full = analyzeAt(prepared(doc), { values: { T: 0.25 } });
    expect(moved.analysis.stableSets).toEqual(full.stableSets);
    expect(moved.analysis.conditions).toEqual(full.conditions);
    // common practice: a cubic a3 s³ + a2 s² + a1 s + a0 is stable iff all aᵢ > 0 and a2·a1 > a3·a0; for
    // T s³ + (T+1) s² + s + K that is 0 < K < (T+1)/T → 5 at T = 0.25.
    const k = moved.analysis.stableSets.find((s) => s.parameter === "K");
    expect(k?.intervals[0].upper?.value).toBeCloseTo(5, 9);
  });

  it("sweeps the first parameter by default: the locus follows −1 ± j√(K−1) and the overlay spans the range", () => {
    const a = ok(createAnalyzer()(query(unityLoop(), { values: { K: 2 } })));
    const sweep = a.sweep;
    expect(sweep).toMatchObject({ parameter: "K", range: [0.4, 40], current: 2 });
    expect(sweep?.locus.branches).toHaveLength(2);
    const i = sweep!.locus.values.findIndex((v) => v > 5);
    const K = sweep!.locus.values[i];
    // common practice: roots of s² + 2s + K by the quadratic formula.
    const upper = sweep!.locus.branches.map((b) => b[i]).find((r) => r && r[1] > 0);
    expect(upper?.[0]).toBeCloseTo(-1, 9);
    expect(upper?.[1]).toBeCloseTo(Math.sqrt(K - 1), 9);
    expect(sweep?.overlay.map((o) => o.value)).toHaveLength(OVERLAY_VALUES);
    expect(sweep?.overlay[0].value).toBeCloseTo(0.4, 12);
    expect(sweep?.overlay[OVERLAY_VALUES - 1].value).toBeCloseTo(40, 12);
    // The step response of K/(s² + 2s + K) settles to 1 (final value theorem, common practice).
    const last = sweep!.overlay[2].points.at(-1)!;
    expect(last[1]).toBeCloseTo(1, 2);
  });

  it("leaves the sweep out while its tab is closed, with the same verdict (common practice: the sweep is extra work, not a different answer)", () => {
    const analyze = createAnalyzer();
    const closed = ok(analyze(query(unityLoop(), { withSweep: false })));
    expect(closed.sweep).toBeNull();
    const open = ok(analyze(query(unityLoop(), { withSweep: true })));
    expect(open.sweep?.parameter).toBe("K");
    expect(open.analysis.stability.verdict).toBe(closed.analysis.stability.verdict);
  });

  it("reports the break wire in use: the default, a chosen one, and the default again for a removed wire", () => {
    const analyze = createAnalyzer();
    // The default break is the wire into the junction's minus port: G → e port 1 is w4 in unityLoop.
    expect(ok(analyze(query(unityLoop()))).breakWire).toEqual({ id: "w4", chosen: "default" });
    const given = ok(analyze(query(unityLoop(), { break: "w2" })));
    expect(given.breakWire).toEqual({ id: "w2", chosen: "given" });
    // Breaking anywhere on a single loop gives the same loop gain K/(s(s+2)) (common practice).
    expect(given.analysis.loop?.L.denominator.replace(/\s|\*/g, "")).toMatch(/^(s\^2\+2s|2s\+s\^2)$/);
    const gone = ok(analyze(query(unityLoop(), { break: "w9" })));
    expect(gone.breakWire).toEqual({ id: "w4", chosen: "default" });
    expect(gone.analysis.notes[0]).toContain("w9 is no longer in the diagram");
  });

  it("names the problem of a document that cannot be analysed, and keeps the sliders when only the values are bad", () => {
    const analyze = createAnalyzer();
    const broken = analyze(query(docOf([{ id: "r", type: "input" }, { id: "G", type: "transfer", expr: "1/(s+" }, { id: "y", type: "output" }], ["r>G", "G>y"])));
    expect(broken.ok).toBe(false);
    if (broken.ok) return;
    expect(broken.problems.some((p) => p.blockId === "G" && p.field === "expr")).toBe(true);
    expect(broken.parameters).toEqual([]);
    // 1/(K s + K) is singular at K = 0: the answer says so and still lists K so its slider can move back.
    const open = docOf([{ id: "r", type: "input" }, { id: "G", type: "transfer", expr: "1/(K*s+K)" }, { id: "y", type: "output" }], ["r>G", "G>y"], { K: 1 });
    const singular = analyze(query(open, { values: { K: 0 } }));
    expect(singular).toMatchObject({ ok: false, problems: [{ code: "singular-at-values" }], parameters: [{ name: "K" }] });
  });
});

describe("the editor's problems", () => {
  // common practice: positive unity feedback around a gain of 1 is singular (e = r + e); h is left unconnected.
  it("lists an algebraic loop beside an unconnected block, in the result and in the analysis", () => {
    const session = createLiveSession();
    const doc = diagram(
      [["r", "input"], ["e", "sum", ["+", "+"]], ["g", "gain", "1"], ["y", "output"], ["h", "transfer", "1/(s+1)"]],
      ["r>e:0", "e>g", "g>e:1", "g>y"],
    );
    const { outcome } = session.reduce(doc);
    const errors = (problems: { severity: string; code: string; blockId?: string }[]) =>
      problems.filter((p) => p.severity === "error").map((p) => [p.code, p.blockId]);
    expect(outcome.ok ? [] : errors(outcome.problems)).toEqual([["unwired-port", "h"], ["algebraic-loop", "e"]]);
    const answer = session.analyze(query(unityLoop()));
    expect(answer.ok ? [] : errors(answer.problems)).toEqual([["unwired-port", "h"], ["algebraic-loop", "e"]]);
  });
});

describe("one reduction per change of what the result depends on", () => {
  const doc = unityLoop();
  it("reduces an edit once, and reuses it (and an unchanged analysis) for moved blocks, a new title and slider moves", () => {
    const session = createLiveSession();
    expect(session.reduce(doc).reduced).toBe(true);
    const first = ok(session.analyze(query(doc)));
    expect(session.reduce({ ...doc, title: "Other", notes: "n", layout: { r: { x: 10, y: 20 } } }).reduced).toBe(false);
    // Nothing the analysis reads changed either: the last answer stands.
    expect(session.analyze(query(doc))).toBe(first);
    expect(ok(session.analyze(query(doc, { values: { K: 16 } }))).analysis.values.K).toBe(16);
    const edited = unityLoop("K/(s*(s+5))");
    const after = session.reduce(edited);
    expect(after.reduced).toBe(true);
    expect(after.outcome.ok && after.outcome.result.transfers[0].denominator).toBe("s^2 + 5*s + K");
    // The analysis follows the new reduction: 4/(s² + 5s + 4) has real poles −1, −4 (no overshoot); 4/(s² + 2s + 4) overshoots.
    expect(first.analysis.step.overshootPercent).toBeGreaterThan(0);
    expect(ok(session.analyze(query(edited))).analysis.step.overshootPercent).toBeCloseTo(0, 9);
  });
  it("analyses the first pair when the chosen pair's block is gone, as the results panel shows it", () => {
    const session = createLiveSession();
    session.reduce(doc);
    const gone = ok(session.analyze(query(doc, { input: "r-deleted", output: "y" })));
    expect([gone.analysis.input, gone.analysis.output]).toEqual(["r", "y"]);
  });
  it("keys the reduction on blocks, wires and parameters, not on layout, title or notes", () => {
    const moved = { ...doc, title: "Other", notes: "n", layout: { r: { x: 10, y: 20 } } };
    expect(reductionKey(moved)).toBe(reductionKey(doc));
    const base = reductionKey(doc);
    const variants = [reductionKey(unityLoop("K/(s*(s+3))")), reductionKey({ ...doc, wires: doc.wires.slice(1) }), reductionKey({ ...doc, parameters: { K: 5 } })];
    for (const v of variants) expect(v).not.toBe(base);
  });
  it("implements the analysed pair at the slider values beside the analysis, only when asked", () => {
    const session = createLiveSession();
    session.reduce(doc);
    const answer = session.analyze(query(doc, { values: { K: 9 } }));
    const view = session.implement({ block: null, ts: 0.01, method: "tustin", prewarp: null, form: "controllable" }, answer);
    if (!view?.ok) throw new Error("no implementation");
    // T = K/(s² + 2s + K) at the slider value K = 9 (from memory: unity feedback around K/(s(s + 2))).
    expect(view.subject.what).toBe("the pair r → y");
    expect(view.continuous).toMatchObject({ numerator: [9], denominator: [1, 2, 9] });
    expect(view.advice.bandwidth).toBe(ok(answer).analysis.bandwidth);
    expect(session.implement({ block: null, ts: 0.01, method: "tustin", prewarp: null, form: "controllable" }, { ok: false, problems: [], parameters: [] })).toBeNull();
  });
});
