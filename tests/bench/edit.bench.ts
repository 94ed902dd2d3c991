import type { AnalysisQuery } from "@shared/analysis/answer";
import type { EditorDoc } from "@/features/editor/commands/types";
import { createLiveSession } from "@/features/editor/worker/liveSession";
import { ladderDiagram } from "./diagrams";

/**
 * What one edit costs the editor's worker, as live.worker.ts runs it: the result (parse, reduce, print) and the
 * analysis of the same reduction, for the 150- and 500-block ladders. Counts the reductions each step runs (a
 * slider move or a moved block must run none) and times from the request to the analysis answered.
 * Prints figures; asserts nothing. Run: npx tsx tests/bench/edit.bench.ts
 */
const RUNS = 3;
const query: AnalysisQuery = { input: null, output: null, break: null, values: {}, settlingBand: 0.02, sweepParameter: null, withSweep: false };

/** The ladder with its first section's gain changed: what typing into one block's expression does. */
function edited(doc: EditorDoc, n: number): EditorDoc {
  const i = doc.blocks.findIndex((b) => b.type === "transfer");
  const blocks = doc.blocks.slice();
  const b = blocks[i];
  if (b.type === "transfer") blocks[i] = { ...b, expr: `${n + 2}/(s + ${n + 3})` };
  return { ...doc, blocks };
}

const moved = (doc: EditorDoc): EditorDoc => ({ ...doc, layout: { ...doc.layout, [doc.blocks[0].id]: { x: 999, y: 999 } } });

interface Step {
  name: string;
  doc: (base: EditorDoc, run: number) => EditorDoc;
  values?: Record<string, number>;
}

const STEPS: Step[] = [
  { name: "open", doc: (base) => base },
  { name: "edit an expression", doc: (base, run) => edited(base, run) },
  { name: "move a block", doc: (base, run) => moved(edited(base, run)) },
  { name: "slider move", doc: (base, run) => moved(edited(base, run)), values: { K: 3 } },
];

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

for (const blocks of [150, 500]) {
  const base = ladderDiagram(blocks) as EditorDoc;
  const rows = STEPS.map(() => ({ reductions: 0, result: [] as number[], total: [] as number[], verdict: "" }));
  for (let run = 0; run < RUNS; run++) {
    const session = createLiveSession();
    STEPS.forEach((step, i) => {
      const t0 = performance.now();
      const { reduced } = session.reduce(step.doc(base, run));
      const t1 = performance.now();
      const answer = session.analyze({ ...query, values: step.values ?? {} });
      const t2 = performance.now();
      const row = rows[i];
      if (reduced) row.reductions++;
      row.result.push(t1 - t0);
      row.total.push(t2 - t0);
      row.verdict = answer.ok ? answer.analysis.stability.verdict : `refused: ${answer.problems.at(-1)?.code}`;
    });
  }
  console.log(`\n${blocks}-block ladder (${RUNS} runs, medians)`);
  console.log("step                  reductions/run  result ms  to analysis ms  analysis");
  STEPS.forEach((step, i) => {
    const r = rows[i];
    console.log(
      `${step.name.padEnd(22)}${String(r.reductions / RUNS).padStart(14)}${median(r.result).toFixed(0).padStart(11)}${median(r.total).toFixed(0).padStart(16)}  ${r.verdict}`,
    );
  });
}
