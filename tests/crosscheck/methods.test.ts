import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { complexPoint, wellPosedDiagram } from "../support/arbitraries";
import { blockSolve } from "../support/blockSolve";
import { cAbs, cClose, cSub, cText, cx, type Complex } from "../support/complex";
import { evalExpr } from "../support/evalExpr";
import { mason } from "../support/mason";
import { documentParams } from "../support/signalGraph";
import { TEXTBOOK_CASES } from "../support/textbookDiagrams";

// The two numeric reference methods checked against closed forms from the literature before they
// are trusted to check the engine; then against each other on random diagrams.
const RTOL = 1e-10;
const POINTS: Complex[] = [cx(0.3, 1.1), cx(-0.7, 2.5), cx(2, -0.4), cx(-3.1, 0.2)];

describe("reference methods reproduce textbook closed forms", () => {
  for (const tc of TEXTBOOK_CASES) {
    it(`${tc.name} (${tc.source})`, () => {
      const params = documentParams(tc.doc);
      for (const s of POINTS) {
        for (const method of [blockSolve, mason]) {
          const got = method(tc.doc, s, params).transfers;
          expect(got.map((t) => `${t.input}→${t.output}`).sort()).toEqual(Object.keys(tc.expected).sort());
          for (const t of got) {
            const want = evalExpr(tc.expected[`${t.input}→${t.output}`], s, params);
            expect(cClose(t.value, want, RTOL), `${method.name} ${t.input}→${t.output} at ${cText(s)}: ${cText(t.value)} vs ${cText(want)}`).toBe(true);
          }
        }
      }
    });
  }
});

describe("reference methods agree with each other on random well-posed diagrams", () => {
  it("Mason's Δ equals det(I − A) and the transfers agree (common practice: two exact methods)", () => {
    fc.assert(
      fc.property(wellPosedDiagram({ maxCore: 9 }), complexPoint, ({ doc }, s) => {
        const params = documentParams(doc);
        const a = blockSolve(doc, s, params);
        const b = mason(doc, s, params);
        expect(cClose(a.det, b.det, 1e-9)).toBe(true);
        a.transfers.forEach((t, i) => expect(cClose(t.value, b.transfers[i].value, 1e-8, 1e-12)).toBe(true));
      }),
      { numRuns: 200 },
    );
  });

  it("generated diagrams are well posed: Δ(s) → 1 as |s| → ∞ (every loop strictly proper)", () => {
    fc.assert(
      fc.property(wellPosedDiagram({ maxCore: 18 }), ({ doc }) => {
        const det = blockSolve(doc, cx(0, 1e7), documentParams(doc)).det;
        expect(cAbs(cSub(det, cx(1)))).toBeLessThan(1e-4);
      }),
      { numRuns: 200 },
    );
  });

  it("generated diagrams stay within the Mason size (≤ 15 blocks) and contain loops", () => {
    const samples = fc.sample(wellPosedDiagram({ maxCore: 9 }), { numRuns: 300, seed: 7 });
    expect(Math.max(...samples.map((g) => g.doc.blocks.length))).toBeLessThanOrEqual(15);
    const withLoops = samples.filter((g) => cAbs(cSub(blockSolve(g.doc, cx(0.5, 1), documentParams(g.doc)).det, cx(1))) > 1e-9);
    expect(withLoops.length).toBeGreaterThan(150);
  });
});
