import { describe, expect, it } from "vitest";
import { analyzeAt } from "@shared/analysis/analyze";
import { compareMetrics, versionMetrics } from "@/features/editor/lib/compareMetrics";
import { prepared } from "../../../support/reduced";
import { unityFeedback } from "../../../support/docBuilder";

const servo = (K: number) => analyzeAt(prepared(unityFeedback("K/(s*(s + 2))", { K })), { stableSets: false });
const row = (rows: ReturnType<typeof compareMetrics>, name: string) => rows.find((r) => r.name === name)!;

describe("compareMetrics", () => {
  // common practice (second-order closed loop ωn² / (s² + 2ζωn s + ωn²)): K = 4 gives ζ = 0.5, overshoot
  // exp(−πζ/√(1−ζ²)) = 16.30 %; the crossover of 4/(jω(jω+2)) at ω² = √20 − 2 gives PM = 90° − atan(ω/2) = 51.83°.
  // K = 1 gives ζ = 1 (no overshoot) and ω² = √5 − 2, PM = 76.35°.
  it("puts the two versions' figures side by side with their change", () => {
    const rows = compareMetrics(servo(4), servo(1));
    const pm = row(rows, "Phase margin");
    expect(pm.before).toBe("51.83");
    expect(pm.after).toBe("76.35");
    expect(pm.change).toBe("+24.52");
    const os = row(rows, "Overshoot");
    expect(os.before).toBe("16.3");
    expect(os.change.startsWith("\u2212")).toBe(true);
    expect(row(rows, "Closed-loop order")).toMatchObject({ before: "2", after: "2", change: "same" });
    expect(row(rows, "Stability")).toMatchObject({ before: "stable", after: "stable", change: "same" });
  });

  it("shows dashes for a version without an analysis and names no change", () => {
    const rows = compareMetrics(null, servo(4));
    expect(row(rows, "Phase margin")).toMatchObject({ before: "—", after: "51.83", change: "changed" });
    expect(compareMetrics(null, null).every((r) => r.change === "")).toBe(true);
  });
});

describe("versionMetrics", () => {
  const value = (name: string, K = 4) => versionMetrics(servo(K)).find((m) => m.name === name)?.value;

  // common practice: s² + 2s + 4 has the poles −1 ± j√3 (ζ = 0.5, ωn = 2), overshoot 16.30 %, PM 51.83° as above.
  it("lists one version's poles first, then the compared figures as a comparison shows them", () => {
    const metrics = versionMetrics(servo(4));
    expect(metrics[0]).toEqual({ name: "Poles", unit: "", value: "\u22121 ± 1.732j" });
    expect(value("Overshoot")).toBe("16.3");
    expect(value("Phase margin")).toBe("51.83");
    expect(value("Stability")).toBe("stable");
    expect(metrics.slice(1).map((m) => m.name)).toEqual(compareMetrics(null, null).map((r) => r.name));
  });

  // common practice: K = 1 gives s² + 2s + 1 = (s + 1)², one pole of multiplicity two, and no overshoot.
  it("names a repeated pole once with its multiplicity", () => {
    expect(value("Poles", 1)).toBe("\u22121 (×2)");
    expect(value("Overshoot", 1)).toBe("0");
  });
});
