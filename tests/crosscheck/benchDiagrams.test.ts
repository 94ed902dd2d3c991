import { describe, expect, it } from "vitest";
import { benchDiagram } from "../bench/diagrams";
import { blockSolve } from "../support/blockSolve";
import { cClose, cText, cx } from "../support/complex";
import { documentParams } from "../support/signalGraph";
import { evalTransfer, reduceOurs } from "../support/ours";

// The benchmark's generated diagrams: the sizes it claims, deterministic, clean, and reduced correctly
// (checked against the numeric block-equation solve, 1e-8 relative).
const families = ["ladder", "nested"] as const;

describe("generated benchmark diagrams", () => {
  it("have exactly the requested number of blocks and are deterministic", () => {
    for (const family of families) {
      for (let n = 6; n <= 60; n++) {
        for (const symbolic of [false, true]) {
          const doc = benchDiagram(family, n, { symbolic });
          expect(doc.blocks.length, `${family} ${n}`).toBe(n);
          expect(benchDiagram(family, n, { symbolic })).toEqual(doc);
        }
      }
    }
    expect(() => benchDiagram("ladder", 5)).toThrow(RangeError);
  });

  for (const family of families) {
    for (const [n, symbolic] of [[20, false], [60, false], [10, true], [30, true]] as const) {
      it(`${family}, ${n} blocks${symbolic ? ", K/a/tau" : ""}: no problems, transfer equals the block-equation solve`, () => {
        const doc = benchDiagram(family, n, { symbolic });
        const result = reduceOurs(doc);
        expect(result.warnings).toEqual([]);
        const params = documentParams(doc);
        for (const s of [cx(0.2, 1.7), cx(-1.3, 0.6)]) {
          const ref = blockSolve(doc, s, params).transfers[0].value;
          const mine = evalTransfer(result.transfers[0], s, params);
          expect(cClose(mine, ref, 1e-8), `${cText(mine)} vs ${cText(ref)}`).toBe(true);
        }
      });
    }
  }
});
