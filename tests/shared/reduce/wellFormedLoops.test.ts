import { describe, expect, test } from "vitest";
import type { Problem } from "@shared/diagram/problems";
import { reduceDocument } from "@shared/reduce/reduceDiagram";
import { runPythonSync } from "../../support/python";
import { diagram } from "./diagramSpec";

const problemsOf = (doc: unknown, opts: Parameters<typeof reduceDocument>[1] = {}): Problem[] => {
  const out = reduceDocument(doc, opts);
  if (out.ok) throw new Error("expected the reduction to be refused");
  return out.problems;
};
const errors = (problems: Problem[]) => problems.filter((p) => p.severity === "error").map((p) => [p.code, p.blockId, p.related]);
const loopsIn = (problems: Problem[]) => problems.filter((p) => p.code === "algebraic-loop");

// common practice: positive unity feedback around a static gain k is singular when 1 − k = 0 (e = r + k·e).
const SINGULAR: Parameters<typeof diagram>[0] = [["r", "input"], ["e", "sum", ["+", "+"]], ["g", "gain", "1"], ["y", "output"]];
const SINGULAR_WIRES = ["r>e:0", "e>g", "g>e:1", "g>y"];
const LOOP = ["algebraic-loop", "e", ["e", "g"]];

describe("an algebraic loop is reported whatever else is wrong", () => {
  test("beside an unconnected block: both are listed", () => {
    const doc = diagram([...SINGULAR, ["h", "transfer", "1/(s+1)"]], SINGULAR_WIRES);
    expect(errors(problemsOf(doc))).toEqual([["unwired-port", "h", undefined], LOOP]);
  });

  test("beside a syntax error in another block: both are listed", () => {
    const doc = diagram(
      [...SINGULAR, ["c", "transfer", "2/(s+"], ["y2", "output"]],
      [...SINGULAR_WIRES, "r>c", "c>y2"],
    );
    const found = errors(problemsOf(doc));
    expect(found.filter(([code]) => code === "syntax").map(([, id]) => id)).toEqual(["c"]);
    expect(found.filter(([code]) => code !== "syntax")).toEqual([LOOP]);
  });

  test("beside a wire to a missing block and a missing output: all are listed, the loop once", () => {
    const doc = diagram(SINGULAR.filter(([id]) => id !== "y"), ["r>e:0", "e>g", "g>e:1", "g>nowhere"]);
    expect(errors(problemsOf(doc))).toEqual([["no-output-block", undefined, undefined], ["wire-to-missing-block", undefined, undefined], LOOP]);
  });

  test("beside a gain that cannot be formed (1/(s − s)): both are listed", () => {
    const doc = diagram([...SINGULAR, ["z", "transfer", "1/(s - s)"], ["y2", "output"]], [...SINGULAR_WIRES, "r>z", "z>y2"]);
    expect(errors(problemsOf(doc))).toEqual([["division-by-zero", "z", undefined], LOOP]);
  });

  test("beside a wrong pair id on a valid diagram: both are listed", () => {
    expect(errors(problemsOf(diagram(SINGULAR, SINGULAR_WIRES), { input: "nope" }))).toEqual([
      ["unknown-pair-id", undefined, undefined],
      LOOP,
    ]);
  });

  test("an unconnected block's own gain error is listed too", () => {
    const doc = diagram([...SINGULAR, ["z", "transfer", "1/(s - s)"]], SINGULAR_WIRES);
    expect(errors(problemsOf(doc)).map(([code]) => code)).toEqual(["unwired-port", "division-by-zero", "algebraic-loop"]);
  });
});

describe("a loop that cannot be judged is skipped, not guessed", () => {
  test("a loop through the block with the syntax error is not reported as singular", () => {
    const doc = diagram(
      [["r", "input"], ["e", "sum", ["+", "+"]], ["g", "gain", "1 +"], ["y", "output"]],
      ["r>e:0", "e>g", "g>e:1", "g>y"],
    );
    const problems = problemsOf(doc);
    expect(problems.some((p) => p.code === "syntax" && p.blockId === "g")).toBe(true);
    expect(loopsIn(problems)).toEqual([]);
  });

  test("a singular inner loop sharing its junction with a loop through an unparsable block is skipped", () => {
    // e = r + k + b, k = e, b = 2·e: the inner loop e–k alone has det 0, but with b written "2" the whole
    // component's det(I − A) is −2 (sympy below), so judging e–k without b would report a loop that is not there.
    const det = runPythonSync<{ inner: string; whole: string }>(
      {
        code: [
          "import json, sympy as sp",
          "inner = sp.Matrix([[1, -1], [-1, 1]]).det()",
          "whole = sp.Matrix([[1, -1, -1], [-1, 1, 0], [-2, 0, 1]]).det()",
          "print(json.dumps({'inner': str(inner), 'whole': str(whole)}))",
        ].join("\n"),
      },
      {},
    );
    expect(det).toEqual({ inner: "0", whole: "-2" });
    const blocks: Parameters<typeof diagram>[0] = [["r", "input"], ["e", "sum", ["+", "+", "+"]], ["k", "gain", "1"], ["b", "gain", "2"], ["y", "output"]];
    const wires = ["r>e:0", "e>k", "k>e:1", "e>b", "b>e:2", "k>y"];
    const broken = problemsOf(diagram(blocks.map((b) => (b[0] === "b" ? ["b", "gain", "2*("] : b)), wires));
    expect(broken.some((p) => p.code === "syntax" && p.blockId === "b")).toBe(true);
    expect(loopsIn(broken)).toEqual([]);
    // The same diagram with b readable is well-posed, as sympy says.
    expect(reduceDocument(diagram(blocks, wires)).ok).toBe(true);
  });

  test("a loop with a doubtful wire inside (a second wire into the same port) is skipped", () => {
    // Counted, the extra feedback wire would make e = r + 2·e (det −1); left out, e = r + e (det 0): neither is the diagram.
    const problems = problemsOf(diagram(SINGULAR, [...SINGULAR_WIRES, "g>e:1"]));
    expect(errors(problems).map(([code]) => code)).toEqual(["port-occupied"]);
  });

  test("a doubtful wire entering a loop from outside does not hide it", () => {
    // The second wire into g comes from r, outside the loop e–g, so det(I − A) of the loop is unchanged.
    const problems = problemsOf(diagram(SINGULAR, [...SINGULAR_WIRES, "r>g"]));
    expect(errors(problems)).toEqual([["second-incoming-wire", "g", ["w1"]], LOOP]);
  });

  test("a singular loop apart from the doubtful part is still reported", () => {
    // The second wire into q makes the q loop doubtful; the e–g loop is untouched by it.
    const doc = diagram(
      [...SINGULAR, ["f", "sum", ["+", "-"]], ["q", "gain", "3"], ["y2", "output"]],
      [...SINGULAR_WIRES, "r>f:0", "f>q", "q>f:1", "q>y2", "r>q"],
    );
    expect(errors(problemsOf(doc)).map(([code, id]) => [code, id])).toEqual([["second-incoming-wire", "q"], ["algebraic-loop", "e"]]);
  });
});

describe("the work limit", () => {
  test("loops too large to judge within it stay unjudged; the errors found still stand", () => {
    const doc = diagram([...SINGULAR, ["h", "transfer", "1/(s+1)"]], SINGULAR_WIRES);
    const problems = problemsOf(doc, { limits: { maxEdges: -1 } });
    expect(errors(problems)).toEqual([["unwired-port", "h", undefined]]);
  });
});

describe("valid diagrams: exactly today's problems", () => {
  test("a valid singular loop is reported once, with its warnings", () => {
    // g2 hangs off the loop and reaches no output: a warning, and the loop still counted once.
    const doc = diagram([...SINGULAR, ["g2", "gain", "2"]], [...SINGULAR_WIRES, "g>g2"]);
    expect(problemsOf(doc).map((p) => [p.severity, p.code, p.blockId])).toEqual([
      ["warning", "does-not-reach-output", "g2"],
      ["error", "algebraic-loop", "e"],
    ]);
  });

  test("a valid well-posed loop still reduces", () => {
    // common practice: negative unity feedback around k = 1 gives T = k/(1 + k) = 1/2 (printed over 1).
    const doc = diagram(
      [["r", "input"], ["e", "sum", ["+", "-"]], ["g", "gain", "1"], ["y", "output"]],
      ["r>e:0", "e>g", "g>e:1", "g>y"],
    );
    const out = reduceDocument(doc);
    expect(out.ok && out.result.transfers.map((t) => [t.numerator, t.denominator])).toEqual([["1/2", "1"]]);
  });
});
