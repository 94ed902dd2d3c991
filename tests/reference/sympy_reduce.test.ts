import { spawnSync } from "node:child_process";
import { describe, expect, it } from "vitest";
import { benchDiagram } from "../bench/diagrams";
import { SYMPY_SCRIPT, SYSTEM_PYTHON, sympyBench, sympyReduce } from "../support/sympy";
import { TEXTBOOK_CASES } from "../support/textbookDiagrams";

// The sympy reference itself, checked against closed forms from the literature before it is used to
// check the engine (tests/reference/engine.test.ts).
describe("sympy reference reproduces textbook closed forms exactly", () => {
  it("every pair and the characteristic polynomial of each textbook diagram", async () => {
    const jobs = TEXTBOOK_CASES.map((tc) => ({
      id: tc.name,
      doc: tc.doc,
      ours: {
        transfers: Object.entries(tc.expected).map(([pair, formula]) => {
          const [input, output] = pair.split("→");
          return { input, output, numerator: formula, denominator: "1" };
        }),
        characteristic: tc.characteristic,
      },
    }));
    const results = await sympyReduce(jobs, 60_000);
    expect(results).toHaveLength(TEXTBOOK_CASES.length);
    for (const [i, r] of results.entries()) {
      const tc = TEXTBOOK_CASES[i];
      expect(r.error, tc.name).toBeUndefined();
      expect(r.transfers.map((t) => `${t.input}→${t.output}`).sort(), tc.name).toEqual(Object.keys(tc.expected).sort());
      for (const t of r.transfers) expect(t.agrees, `${tc.name} ${t.input}→${t.output} (${tc.source})`).toBe(true);
      expect(r.characteristicAgrees, `${tc.name}: characteristic (${tc.source})`).toBe(true);
    }
  });

  it("notices a wrong answer: a sign error in G/(1+GH) does not agree (from memory: Nise, canonical feedback form)", async () => {
    const tc = TEXTBOOK_CASES.find((c) => c.name.startsWith("non-unity"))!;
    const [r] = await sympyReduce([
      {
        id: "wrong",
        doc: tc.doc,
        ours: {
          transfers: [{ input: "r", output: "y", numerator: "K*(s + 5)", denominator: "(s + 1)*(s + 5) - K" }],
          characteristic: "(s + 1)*(s + 5) - K",
        },
      },
    ]);
    expect(r.transfers[0].agrees).toBe(false);
    expect(r.characteristicAgrees).toBe(false);
  });

  it("decimals are exact rationals: 0.1 and 1e-3 (common practice: sympy Rational)", async () => {
    const doc = { ...TEXTBOOK_CASES[0].doc, parameters: {}, blocks: TEXTBOOK_CASES[0].doc.blocks.map((b) =>
      b.type === "transfer" ? { ...b, expr: "0.1/(s + 1e-3)" } : b) };
    const [r] = await sympyReduce([
      { id: "dec", doc, ours: { transfers: [{ input: "r", output: "y", numerator: "1/10", denominator: "s + 101/1000" }], characteristic: "s + 101/1000" } },
    ]);
    expect(r.transfers[0]).toMatchObject({ agrees: true, lowestTerms: true, monic: true });
    expect(r.characteristicAgrees).toBe(true);
  });

  it("bench mode, both methods: a generated ladder of m first-order sections has a denominator of degree m (common practice)", async () => {
    for (const method of ["rref", "linsolve"] as const) {
      const r = await sympyBench(benchDiagram("ladder", 20), "r", "y", 60_000, method);
      expect(r.denominatorDegree, method).toBe(6); // (20 − 1)/3 sections, rounded down
      expect(r.numeratorDegree, method).toBe(0);
      expect(r.seconds, method).toBeGreaterThan(0);
    }
  });

  it("without sympy the script fails with an install hint, not a silent pass", () => {
    // -S drops site-packages, which is where Debian installs python3-sympy
    const run = spawnSync(SYSTEM_PYTHON, ["-S", SYMPY_SCRIPT], { input: "{}", encoding: "utf8" });
    expect(run.status).toBe(3);
    expect(run.stderr).toContain("apt-get install -y python3-sympy");
  });
});
