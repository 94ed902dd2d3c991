import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { DiagramDocument } from "@shared/diagram/schema";
import { complexPoint, paramPoint, wellPosedDiagram, type GeneratedDiagram } from "../support/arbitraries";
import { blockSolve } from "../support/blockSolve";
import { cAbs, cClose, cDiv, cMul, cText, cx, type Complex } from "../support/complex";
import { evalExpr, type ParamValues } from "../support/evalExpr";
import { mason } from "../support/mason";
import { evalTransfer, reduceOurs } from "../support/ours";

/**
 * Our exact reduction (reduceDocument, its printed strings evaluated by mathjs) against two
 * independent numeric methods on random well-posed diagrams, at random complex s and parameter values:
 * a linear solve of the block equations (every diagram) and Mason's gain formula (≤ 15 blocks).
 * Relative tolerance 1e-8 on each transfer value (absolute 1e-12 for transfers that vanish).
 * numRuns: 400 + 150 = 550 diagrams per run.
 */
const RTOL = 1e-8;
const ATOL = 1e-12;

const pairKey = (t: { input: string; output: string }) => `${t.input}→${t.output}`;

function expectTransfersAgree(doc: DiagramDocument, s: Complex, params: ParamValues, withMason: boolean): void {
  const ours = reduceOurs(doc);
  const references = [blockSolve(doc, s, params), ...(withMason ? [mason(doc, s, params)] : [])];
  for (const [k, ref] of references.entries()) {
    expect(ours.transfers.map(pairKey).sort()).toEqual(ref.transfers.map(pairKey).sort());
    for (const r of ref.transfers) {
      const t = ours.transfers.find((x) => pairKey(x) === pairKey(r))!;
      const mine = evalTransfer(t, s, params);
      const method = k === 0 ? "block-equation solve" : "Mason's formula";
      expect(
        cClose(mine, r.value, RTOL, ATOL),
        `${pairKey(t)} at s=${cText(s)}: ours ${cText(mine)} = (${t.numerator})/(${t.denominator}), ${method} ${cText(r.value)}`,
      ).toBe(true);
    }
  }
}

/** χ(s0) / (det(I − A)(s0) · Π den_b(s0)) is one nonzero constant across several s0. */
function expectCharacteristicMatches(g: GeneratedDiagram, params: ParamValues, points: Complex[]): void {
  const chi = reduceOurs(g.doc).characteristic;
  const ratios = points.map((s) => {
    const dens = Object.values(g.denominators).reduce((acc, d) => cMul(acc, evalExpr(d, s, params)), cx(1));
    return cDiv(evalExpr(chi, s, params), cMul(blockSolve(g.doc, s, params).det, dens));
  });
  expect(cAbs(ratios[0]), `χ = ${chi} vanishes identically?`).toBeGreaterThan(0);
  for (const r of ratios.slice(1)) {
    expect(cClose(r, ratios[0], 1e-7), `χ = ${chi}: ratio ${cText(r)} vs ${cText(ratios[0])}`).toBe(true);
  }
}

describe("reduceDocument agrees with independent numeric methods", () => {
  it("≤ 15 blocks: every transfer equals the block-equation solve and Mason's formula; χ ∝ det·Πden", () => {
    fc.assert(
      fc.property(
        wellPosedDiagram({ maxCore: 9 }),
        fc.array(complexPoint, { minLength: 3, maxLength: 3 }),
        paramPoint,
        (g, points, params) => {
          expectTransfersAgree(g.doc, points[0], params, true);
          expectCharacteristicMatches(g, params, points);
        },
      ),
      { numRuns: 400 },
    );
  });

  it("up to 24 blocks: every transfer equals the block-equation solve; χ ∝ det·Πden", () => {
    fc.assert(
      fc.property(
        wellPosedDiagram({ maxCore: 18 }),
        fc.array(complexPoint, { minLength: 3, maxLength: 3 }),
        paramPoint,
        (g, points, params) => {
          expectTransfersAgree(g.doc, points[0], params, false);
          expectCharacteristicMatches(g, params, points);
        },
      ),
      { numRuns: 150 },
    );
  });
});
