import { describe, expect, test } from "vitest";
import { reduceDocument } from "@shared/reduce/reduceDiagram";
import { diagram } from "../reduce/diagramSpec";
import { exact, resultOf, sameValue, transferValue } from "./exact";

/** Unity negative feedback around controller c then plant p. */
const loop = (c: string, p: string, parameters = {}) =>
  diagram(
    [["r", "input"], ["e", "sum", ["+", "-"]], ["c", "transfer", c], ["p", "transfer", p], ["y", "output"]],
    ["r>e:0", "e>c", "c>p", "p>y", "p>e:1"],
    parameters,
  );

const close = (a: number, b: number) => Math.abs(a - b) < 1e-9 * Math.max(1, Math.abs(b));

describe("cancelled modes", () => {
  test("an unstable plant pole cancelled by a controller zero is reported as a hidden unstable mode", () => {
    // common practice: cancelling the unstable pole s = 1 leaves it in the loop; T = 1/(s + 3) hides it.
    // By hand: χ = (1 + 1/(s+2))·(s+2)(s−1) = (s+3)(s−1) = s^2 + 2s − 3.
    const r = resultOf(reduceDocument(loop("(s-1)/(s+2)", "1/(s-1)")));
    const t = r.transfers[0];
    expect(sameValue(transferValue(t), exact("1/(s+3)"))).toBe(true);
    expect(sameValue(exact(r.characteristic), exact("s^2 + 2*s - 3"))).toBe(true);
    expect(t.cancelled).toHaveLength(1);
    expect(sameValue(exact(t.cancelled[0].factor), exact("s - 1"))).toBe(true);
    expect(t.cancelled[0].roots).toHaveLength(1);
    expect(close(t.cancelled[0].roots[0][0], 1) && close(t.cancelled[0].roots[0][1], 0)).toBe(true);
    expect(t.cancelled[0].unstable).toBe(true);
  });

  test("a stable cancellation is reported as stable", () => {
    // common practice: pole-zero cancellation at s = −1; T = 2/(s + 5), χ = (s+1)(s+5)
    const r = resultOf(reduceDocument(loop("2*(s+1)/(s+3)", "1/(s+1)")));
    const t = r.transfers[0];
    expect(sameValue(transferValue(t), exact("2/(s+5)"))).toBe(true);
    expect(t.cancelled.map((c) => c.unstable)).toEqual([false]);
    expect(sameValue(exact(t.cancelled[0].factor), exact("s + 1"))).toBe(true);
    expect(close(t.cancelled[0].roots[0][0], -1)).toBe(true);
  });

  test("a cancelled integrator (root 0) counts as unstable: Re ≥ 0", () => {
    // by hand: c = s/(s+1), p = 1/s: L = 1/(s+1), T = 1/(s+2), χ = s(s+2)
    const r = resultOf(reduceDocument(loop("s/(s+1)", "1/s")));
    expect(r.transfers[0].cancelled).toEqual([{ factor: "s", roots: [[0, 0]], unstable: true }]);
  });

  test("a complex pair cancelled with a symbolic parameter is evaluated at the nominal value", () => {
    // by hand: c = (s^2 + w)/(s+1), p = 1/(s^2 + w): T = 1/(s+2); hidden mode s^2 + w, roots ±j·sqrt(w) at w = 4
    const r = resultOf(reduceDocument(loop("(s^2 + w)/(s+1)", "1/(s^2 + w)", { w: 4 })));
    const [c] = r.transfers[0].cancelled;
    expect(sameValue(exact(c.factor, ["w"]), exact("s^2 + w", ["w"]))).toBe(true);
    expect(c.roots.map(([re, im]) => [Math.round(re * 1e9) / 1e9, Math.round(im * 1e9) / 1e9])).toEqual([[0, -2], [0, 2]]);
    expect(c.unstable).toBe(true);
  });

  test("the modes of a loop off the path show in χ and as cancelled in the pair", () => {
    // a separate unstable loop q → f (positive feedback around 2/(s+1)) that y does not see: Δ_f = (s − 1)/(s + 1)
    const doc = diagram(
      [
        ["r", "input"], ["g", "transfer", "1/(s+4)"], ["y", "output"], ["j", "sum", ["+", "+"]], ["f", "transfer", "2/(s+1)"],
        ["q", "output"],
      ],
      ["r>g", "g>y", "g>j:0", "j>f", "f>j:1", "f>q"],
    );
    const r = resultOf(reduceDocument(doc));
    // χ = (s+4)·(s−1) by hand
    expect(sameValue(exact(r.characteristic), exact("(s+4)*(s-1)"))).toBe(true);
    const ry = r.transfers.find((t) => t.output === "y")!;
    expect(ry.cancelled.map((c) => [c.factor, c.unstable])).toEqual([["s - 1", true]]);
    const rq = r.transfers.find((t) => t.output === "q")!;
    expect(sameValue(transferValue(rq), exact("2/((s+4)*(s-1))"))).toBe(true);
    expect(rq.cancelled).toEqual([]);
  });

  test("χ is the same whether the loop lies on the reduced pair's path or not", () => {
    // the loop e–g–h feeds y; z is fed by r directly. Reducing r→y forms χ from the pair's own reduction,
    // reducing r→z from the loop's separate determinant; by hand Δ = 1 + K/((s + 2)(s + 3)), χ = (s + 2)(s + 3) + K.
    const doc = diagram(
      [
        ["r", "input"], ["e", "sum", ["+", "-"]], ["g", "transfer", "1/(s+2)"], ["q", "transfer", "K/(s+3)"], ["y", "output"],
        ["z", "output"], ["f", "gain", "2"],
      ],
      ["r>e:0", "e>g", "g>q", "q>y", "q>e:1", "r>f", "f>z"],
      { K: 1.5 },
    );
    const viaPair = resultOf(reduceDocument(doc, { output: "y" })).characteristic;
    const apart = resultOf(reduceDocument(doc, { output: "z" })).characteristic;
    expect(viaPair).toBe(apart);
    expect(sameValue(exact(viaPair, ["K"]), exact("(s+2)*(s+3) + K", ["K"]))).toBe(true);
  });

  test("characteristic polynomial keeps what a pair cancels: Δ times every block denominator", () => {
    // by hand for the minor-loop case: Δ = 1 + 2/(s+1) + 3/(s(s+1)) → χ = s^2 + 3s + 3
    const doc = diagram(
      [
        ["r", "input"], ["e1", "sum", ["+", "-"]], ["e2", "sum", ["+", "-"]], ["g2", "transfer", "1/(s+1)"], ["h2", "gain", "2"],
        ["g3", "integrator"], ["k", "gain", "3"], ["y", "output"],
      ],
      ["r>e1:0", "e1>k", "k>e2:0", "e2>g2", "g2>h2", "h2>e2:1", "g2>g3", "g3>y", "g3>e1:1"],
    );
    expect(resultOf(reduceDocument(doc)).characteristic).toBe("s^2 + 3*s + 3");
  });
});
