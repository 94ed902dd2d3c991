import { describe, expect, it } from "vitest";
import { runPythonSync } from "../../support/python";
import { gainGrid, wholeLocus } from "@shared/analysis/wholeLocus";
import { prepared } from "../../support/reduced";
import { unityFeedback } from "../../support/docBuilder";

const textbook = unityFeedback("K/(s*(s+1)*(s+2))", { K: { value: 1, min: 0.5, max: 3 } });
const p = prepared(textbook);

/** numpy.roots (Debian python3-numpy) of descending real coefficients, one list per row. */
const numpyRoots = (rows: number[][]) =>
  runPythonSync<[number, number][][]>({
    code: "import json, sys, numpy as np\nprint(json.dumps([[[float(r.real), float(r.imag)] for r in np.roots(c)] for c in json.load(sys.stdin)]))",
  }, rows);

describe("the root locus over the whole gain range", () => {
  it("runs from the open-loop poles at K = 0 through the slider range far out along the asymptotes", () => {
    const whole = wholeLocus(p, "K", [0.5, 3], { n: 120, base: p.nominal });
    const { values, branches } = whole.positive;
    expect(values[0]).toBe(0);
    expect(values).toContain(0.5);
    expect(values).toContain(3);
    // from memory: the textbook example's branches start at the poles 0, −1, −2 …
    expect(branches.map((b) => b[0]![0]).sort((a, b) => a - b).map((x) => Math.round(x * 1e9) / 1e9)).toEqual([-2, -1, 0]);
    // … and cross the imaginary axis at ±j√2 when K = 6, a gain the grid holds exactly.
    const i = values.indexOf(6);
    expect(i).toBeGreaterThan(0);
    const top = branches.map((b) => b[i]!).find(([, im]) => im > 0)!;
    expect(top[0]).toBeCloseTo(0, 9);
    expect(top[1]).toBeCloseTo(Math.SQRT2, 9);
    // Far out the complex branches head along ±60° from the centroid −1 (common practice: asymptote angles).
    const far = branches.map((b) => b[values.length - 1]!).find(([, im]) => im > 0)!;
    expect((Math.atan2(far[1], far[0] + 1) * 180) / Math.PI).toBeCloseTo(60, 0);
    expect(Math.hypot(far[0], far[1])).toBeGreaterThan(5);
    expect(whole.negative).toBeNull();
    expect(whole.note).toBeNull();
  });

  it("asked for negative gains, samples K from 0 down: one real branch enters the right half-plane at once", () => {
    const whole = wholeLocus(p, "K", [0.5, 3], { n: 60, base: p.nominal, negative: true });
    const neg = whole.negative!;
    expect(neg.values[0]).toBe(0);
    expect(neg.values.slice(1).every((k, j) => k < neg.values[j])).toBe(true);
    // common practice: s³ + 3s² + 2s + K with K < 0 is negative at s = 0 and positive as s → ∞: a root s > 0.
    neg.values.slice(1).forEach((_, j) => expect(Math.max(...neg.branches.map((b) => b[j + 1]![0]))).toBeGreaterThan(0));
    // Far out the real branch runs along the 0° asymptote (from memory: 2kπ/(n − m) for K < 0).
    const last = neg.branches.map((b) => b[neg.values.length - 1]!);
    expect(last.some(([re, im]) => re > 5 && Math.abs(im) < 1e-6)).toBe(true);
    // A slider range reaching below zero brings the negative side without being asked.
    expect(wholeLocus(p, "K", [-1, 1], { n: 20, base: p.nominal }).negative).not.toBeNull();
  });

  it("K entering χ nonlinearly (K² s³ + 3K s² + 2s + 1): no landmarks, a note, and the poles numpy finds", () => {
    const quad = prepared(unityFeedback("1/(s*(K*s+1)*(K*s+2))", { K: { value: 1, min: 0.5, max: 2 } }));
    const whole = wholeLocus(quad, "K", [0.5, 2], { n: 40, base: quad.nominal });
    expect(whole.geometry).toBeNull();
    expect(whole.note).toMatch(/does not enter the closed-loop denominator as A\(s\) \+ K·B\(s\)/);
    const { values, branches } = whole.positive;
    expect(values[0]).toBeCloseTo(0.5e-3, 12);
    expect(values[values.length - 1]).toBeCloseTo(2e3, 9);
    const picks = [0, 17, values.length - 1];
    const ref = numpyRoots(picks.map((i) => [values[i] ** 2, 3 * values[i], 2, 1]));
    picks.forEach((i, j) => {
      const ours = branches.map((b) => b[i]!).sort((a, b) => a[0] - b[0] || a[1] - b[1]);
      const theirs = ref[j].sort((a, b) => a[0] - b[0] || a[1] - b[1]);
      ours.forEach((r, k) => expect(Math.hypot(r[0] - theirs[k][0], r[1] - theirs[k][1])).toBeLessThan(1e-6 * (1 + Math.hypot(...theirs[k]))));
    });
  });

  it("the gain grid holds 0, the slider ends and the landmark gains, ascending in |K| (common practice)", () => {
    const g = wholeLocus(p, "K", [0.5, 3], { n: 50, base: p.nominal }).geometry;
    const grid = gainGrid(g, [0.5, 3], 50, 1);
    expect(grid[0]).toBe(0);
    for (const k of [0.5, 3, 6, ...g!.breakaways.filter((b) => b.gain.value > 0).map((b) => b.gain.value)]) expect(grid).toContain(k);
    expect(grid.slice(1).every((k, i) => k > grid[i])).toBe(true);
    expect(grid[grid.length - 1]).toBeGreaterThanOrEqual(g!.farGain!);
  });
});
