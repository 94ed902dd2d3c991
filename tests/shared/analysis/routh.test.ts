import { describe, expect, it } from "vitest";
import { routhArray } from "@shared/analysis/routh";
import { stabilityOf } from "@shared/analysis/stability";
import { upInts, upToPoly, type UPoly } from "@shared/analysis/upoly";
import { parseTransfer } from "../../support/parseTransfer";
import { ratDenominator } from "@shared/algebra/ratfn";

/** Ascending integer coefficients from descending ones, as textbooks print them. */
const descending = (...c: number[]): UPoly => upInts(c.slice().reverse());

describe("Routh array: textbook worked examples", () => {
  it("regular case, two sign changes (from memory: Nise, Control Systems Engineering, Example 6.1: 1000/((s+2)(s+3)(s+5)) in unity feedback)", () => {
    const r = routhArray(upToPoly(descending(1, 10, 31, 1030)));
    expect(r.firstColumn).toEqual(["1", "10", "-72", "1030"]);
    expect(r.signChanges).toBe(2);
    expect(r.special).toEqual([]);
    expect(stabilityOf(descending(1, 10, 31, 1030)).counts.rhp).toBe(2);
  });

  it("zero first element, ε method (from memory: Nise, Example 6.2: s^5 + 2s^4 + 3s^3 + 6s^2 + 5s + 3, two RHP poles)", () => {
    const r = routhArray(upToPoly(descending(1, 2, 3, 6, 5, 3)));
    expect(r.special.map((x) => [x.power, x.kind])).toEqual([[3, "zero-first-element"]]);
    expect(r.special[0].explanation).toMatch(/replaced by a small ε > 0/);
    expect(r.rows[2].entries[0]).toBe("ε");
    expect(r.signChanges).toBe(2);
    expect(r.conclusion).toMatch(/^2 sign changes/);
  });

  it("all-zero row, auxiliary polynomial (from memory: Nise, Example 6.4: s^5 + 7s^4 + 6s^3 + 42s^2 + 8s + 56, four poles on the jω axis)", () => {
    const p = descending(1, 7, 6, 42, 8, 56);
    const r = routhArray(upToPoly(p));
    expect(r.special.map((x) => [x.power, x.kind])).toEqual([[3, "zero-row"]]);
    expect(r.special[0].explanation).toContain("auxiliary polynomial A(s) = (7)*s^4 + (42)*s^2 + (56)");
    expect(r.rows[2].entries).toEqual(["28", "84"]); // dA/ds = 28s^3 + 84s
    expect(r.signChanges).toBe(0);
    expect(r.axisRoots).toBe(4);
    const st = stabilityOf(p);
    expect(st.verdict).toBe("marginal");
    expect(st.counts.axisFrequencies.map((w) => Number(w.toFixed(12)))).toEqual([Number(Math.SQRT2.toFixed(12)), 2]);
  });

  it("two sign changes (from memory: Ogata, Modern Control Engineering, Routh example s^4 + 2s^3 + 3s^2 + 4s + 5)", () => {
    const r = routhArray(upToPoly(descending(1, 2, 3, 4, 5)));
    expect(r.firstColumn).toEqual(["1", "2", "1", "-6", "5"]);
    expect(r.signChanges).toBe(2);
  });

  it("one symbolic parameter: the first column as functions of K (from memory: Nise, Example 6.9: K/(s(s+7)(s+11)))", () => {
    const den = ratDenominator(parseTransfer("1", "s^3 + 18*s^2 + 77*s + K", ["K"]));
    const r = routhArray(den);
    expect(r.firstColumn).toEqual(["1", "18", "-1/18*K + 77", "K"]);
    expect(r.signChanges).toBeNull();
  });

  it("zero row and ε together: s^4 − 1 has one RHP root and two on the axis (common practice: (s − 1)(s + 1)(s^2 + 1))", () => {
    const r = routhArray(upToPoly(descending(1, 0, 0, 0, -1)));
    expect(r.special.map((x) => x.kind)).toEqual(["zero-row", "zero-first-element"]);
    expect(r.signChanges).toBe(1);
    expect(r.axisRoots).toBe(2);
  });
});
