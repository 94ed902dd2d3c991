import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { DiagramDocument } from "@shared/diagram/schema";
import { benchDiagram } from "../bench/diagrams";
import { wellPosedDiagram } from "../support/arbitraries";
import { makeDoc } from "../support/docBuilder";
import { reduceOurs } from "../support/ours";
import { sympyReduce, type SympyJob } from "../support/sympy";
import { TEXTBOOK_CASES } from "../support/textbookDiagrams";

/**
 * Our engine against Debian's sympy, run live and exact: every transfer cross-multiplied
 * (expand(N_ours·D_ref − N_ref·D_ours) == 0), in lowest terms, numeric denominators monic, χ equal to
 * sympy's det of the cleared block equations up to a constant, and χ = D · Π(cancelled) · constant.
 * 7 textbook diagrams + 7 generated ladders/chains + 1 hidden-mode case + 24 random = 39 diagrams.
 */
const hiddenMode = makeDoc(
  [
    { id: "r", type: "input" },
    { id: "e", type: "sum", signs: ["+", "-"] },
    { id: "c", type: "transfer", expr: "(s - 1)/(s + 1)" },
    { id: "p", type: "transfer", expr: "1/(s - 1)" },
    { id: "y", type: "output" },
  ],
  ["r->e:0", "e->c", "c->p", "p->y", "p->e:1"],
  {},
  "Unstable pole cancelled by a controller zero",
);

const diagrams: { id: string; doc: DiagramDocument }[] = [
  ...TEXTBOOK_CASES.map((tc) => ({ id: `textbook: ${tc.name}`, doc: tc.doc })),
  ...[
    benchDiagram("ladder", 12),
    benchDiagram("ladder", 20),
    benchDiagram("nested", 14),
    benchDiagram("nested", 22),
    benchDiagram("ladder", 10, { symbolic: true }),
    benchDiagram("ladder", 16, { symbolic: true }),
    benchDiagram("nested", 10, { symbolic: true }),
  ].map((doc) => ({ id: doc.title ?? "generated", doc })),
  { id: "hidden unstable mode", doc: hiddenMode },
  ...fc
    .sample(wellPosedDiagram({ maxCore: 9 }), { numRuns: 24, seed: 20240611 })
    .map((g, i) => ({ id: `random #${i}`, doc: g.doc })),
];

describe("reduceDocument agrees exactly with sympy (Debian python3-sympy, live)", () => {
  it(`${diagrams.length} diagrams: transfers, lowest terms, monic, characteristic polynomial, cancelled modes`, { timeout: 180_000 }, async () => {
    expect(diagrams.length).toBeGreaterThanOrEqual(30);
    const ours = new Map(diagrams.map((d) => [d.id, reduceOurs(d.doc)]));
    const jobs: SympyJob[] = diagrams.map((d) => ({ id: d.id, doc: d.doc, ours: ours.get(d.id)! }));
    const results = await sympyReduce(jobs, 170_000);
    expect(results).toHaveLength(diagrams.length);
    for (const r of results) {
      const mine = ours.get(r.id)!;
      expect(r.error, r.id).toBeUndefined();
      expect(r.transfers.length, r.id).toBe(mine.transfers.length);
      for (const t of r.transfers) {
        const m = mine.transfers.find((x) => x.input === t.input && x.output === t.output);
        const label = `${r.id} ${t.input}→${t.output}: ours (${m?.numerator})/(${m?.denominator}), sympy (${t.numerator})/(${t.denominator})`;
        expect(t.agrees, label).toBe(true);
        expect(t.lowestTerms, `${label} — not in lowest terms`).toBe(true);
        expect(t.monic, `${label} — numeric denominator not monic`).not.toBe(false);
        expect(t.cancelledAgrees, `${label} — cancelled factors ${JSON.stringify(m?.cancelled)}`).toBe(true);
      }
      expect(r.characteristicAgrees, `${r.id}: χ ours ${mine.characteristic}, sympy ${r.characteristic}`).toBe(true);
      for (const text of [mine.characteristic, ...mine.transfers.flatMap((t) => [t.numerator, t.denominator])]) {
        expect(text, `${r.id}: exact coefficients, never decimals`).not.toMatch(/\d\.\d/);
      }
    }
  });

  it("an unstable pole cancelled by a controller zero is reported as a hidden unstable mode (from memory: Ogata, Modern Control Engineering, why unstable pole-zero cancellation must be avoided)", async () => {
    const result = reduceOurs(hiddenMode);
    const t = result.transfers[0];
    const hidden = t.cancelled.filter((c) => c.roots.some(([re, im]) => Math.abs(re - 1) < 1e-9 && Math.abs(im) < 1e-9));
    expect(hidden, JSON.stringify(t.cancelled)).toHaveLength(1);
    expect(hidden[0].unstable).toBe(true);
    // T = C·P/(1 + C·P) with C·P = 1/(s + 1) → 1/(s + 2); the modes are (s + 2)(s − 1).
    const [r] = await sympyReduce([
      {
        id: "hand",
        doc: hiddenMode,
        ours: { transfers: [{ input: "r", output: "y", numerator: "1", denominator: "s + 2" }], characteristic: "(s + 2)*(s - 1)" },
      },
    ]);
    expect(r.transfers[0].agrees).toBe(true);
    expect(r.characteristicAgrees).toBe(true);
  });
});
