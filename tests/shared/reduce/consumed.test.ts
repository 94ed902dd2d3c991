import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { demoDiagrams } from "@server/db/demoDiagrams";
import type { DiagramDocument } from "@shared/diagram/schema";
import type { TraceStep } from "@shared/reduce/trace";
import { wellPosedDiagram } from "../../support/arbitraries";
import { elementaryLoops, pairStructure } from "../../support/pathsAndLoops";
import { reduced } from "../../support/reduced";
import { traceViolations } from "./traceCheck";

/*
 * What a step consumes: the blocks (sums and pickoff points included) and wires its equivalent block replaces.
 * Over one pair's steps every block the pair's transfer depends on is consumed exactly once, and nothing else:
 * by Mason's definitions (common practice) those are the blocks on the forward paths and on the loops touching
 * them, directly or through touching loops. The reference set is enumerated from the wires (tests/support/pathsAndLoops.ts).
 */

const demo = (title: string) => demoDiagrams.find((d) => d.title === title)!.document;
const pairSteps = <T>(steps: readonly TraceStep<T>[], input: string, output: string) =>
  steps.filter((s) => s.input === input && s.output === output);
const docBlocks = (doc: DiagramDocument, ids: Iterable<string>) => {
  const known = new Set(doc.blocks.map((b) => b.id));
  return [...ids].filter((id) => known.has(id)).sort();
};

/** For each pair: consumed blocks over its steps against Mason's path and loop blocks; violations listed. */
function unionMismatches(doc: DiagramDocument, rules = new Set<string>()): string[] {
  const { steps, transfers } = reduced(doc);
  for (const s of steps) rules.add(s.rule);
  const out = traceViolations(doc, steps).map((v) => `trace: ${v}`);
  const loops = elementaryLoops(doc);
  for (const { input, output } of transfers) {
    const mine = pairSteps(steps, input, output);
    const reference = pairStructure(doc, input, output, loops);
    const expected = [...reference.blocks].sort();
    if (mine.length === 0) {
      // No step: the transfer is one block reached through wires and pass-through junctions, or a wire.
      const real = expected.filter((id) => !["sum", "branch"].includes(doc.blocks.find((b) => b.id === id)!.type));
      if (reference.loops.length > 0 || reference.paths.length > 1 || real.length > 1) {
        out.push(`${input}→${output}: no step, yet ${reference.paths.length} paths, ${reference.loops.length} loops, blocks ${real.join(", ")}`);
      }
      continue;
    }
    const consumed = docBlocks(doc, mine.flatMap((s) => s.consumedBlocks));
    if (JSON.stringify(consumed) !== JSON.stringify(expected)) {
      out.push(`${input}→${output}: consumed ${consumed.join(", ")}; on its paths and loops ${expected.join(", ")}`);
    }
  }
  return out;
}

describe("what each reduction step consumes", () => {
  test("a feedback step consumes its summing junction (felt conveyor: err with the tachometer loop)", () => {
    const { steps } = reduced(demo("Felt conveyor speed loop"));
    const feedback = steps.find((s) => s.rule === "feedback")!;
    expect(feedback.consumedBlocks).toContain("err");
    expect(feedback.consumedBlocks).toContain("tacho");
    // the loop's wires: sum → forward block, drive → tachometer, tachometer → sum; not the set-point's wire w1
    expect([...feedback.consumedWires].sort()).toEqual(["w2", "w5", "w6"]);
  });

  test("a series step consumes the wire between its blocks, not the wire into the first (felt conveyor: pi then drive)", () => {
    const { steps } = reduced(demo("Felt conveyor speed loop"));
    expect(steps[0]).toMatchObject({ rule: "series", consumedBlocks: ["pi", "drive"], consumedWires: ["w3"] });
  });

  test("nested loops: the inner sum and pickoff go with the inner feedback, the outer sum with the outer one (slitter servo)", () => {
    const { steps } = reduced(demo("Slitter knife position servo"));
    const feedbacks = steps.filter((s) => s.rule === "feedback");
    expect(feedbacks).toHaveLength(2);
    expect(feedbacks[0].consumedBlocks).toEqual(expect.arrayContaining(["ev", "v_pick"]));
    expect(feedbacks[1].consumedBlocks).toContain("ep");
    for (const s of steps.filter((x) => x.rule === "series")) {
      expect(s.consumedBlocks, s.description).not.toContain("ev");
      expect(s.consumedBlocks, s.description).not.toContain("v_pick");
    }
  });

  test("every seeded demo diagram: over each pair's steps, exactly the blocks on its paths and loops are consumed", () => {
    expect(demoDiagrams.length).toBeGreaterThan(0);
    for (const d of demoDiagrams) expect(unionMismatches(d.document), d.title).toEqual([]);
  });

  test("random well-posed diagrams: the same, pair by pair (300 diagrams, ≤ 18 blocks)", () => {
    fc.assert(
      fc.property(wellPosedDiagram({ maxCore: 12 }), ({ doc }) => {
        expect(unionMismatches(doc)).toEqual([]);
      }),
      { numRuns: 300 },
    );
  });

  test("random diagrams strung on a forward path, loops on most pairs: the same (300 diagrams, 8–20 blocks)", () => {
    const rules = new Set<string>();
    fc.assert(
      fc.property(wellPosedDiagram({ minCore: 6, maxCore: 14, chain: true }), ({ doc }) => {
        expect(unionMismatches(doc, rules)).toEqual([]);
      }),
      { numRuns: 300 },
    );
    // every rule took part
    expect([...rules].sort()).toEqual(["eliminate-node", "feedback", "move-pickoff", "move-sum", "parallel", "series"]);
  });
});
