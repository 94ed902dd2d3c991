import { describe, expect, test } from "vitest";
import type { SfgEdge } from "@shared/reduce/graph";
import { edgeName, StepLog, printSteps, times } from "@shared/reduce/trace";

const edge = (label: string | null, sign: 1 | -1, blocks: string[], wires: string[]): SfgEdge<number> => ({
  seq: 0, from: "a", to: "b", gain: sign, label, sign, blocks, wires,
});

describe("step sentences and records", () => {
  test("names and products fold signs to the front (common practice: −a·b = a·(−b))", () => {
    expect(edgeName(edge("h", -1, [], []))).toBe("−h");
    expect(edgeName(edge(null, -1, [], []))).toBe("−1");
    expect(times("eq3", "−k2")).toBe("−eq3·k2");
    expect(times("−1", "g")).toBe("−g");
    expect(times("−a", "−b")).toBe("a·b");
    expect(times("1", "1")).toBe("1");
  });

  test("a step lists every block and wire its edges stand for, once, and numbers eq ids across pairs", () => {
    const log = new StepLog<number>();
    log.beginPair("r", "y");
    const first = log.record("series", [edge("c", 1, ["e"], ["w1", "w2"]), edge("p", 1, [], ["w2", "w3"])], ["e"], 6, (eq) => `${eq}`);
    log.beginPair("d", "y");
    const second = log.record("parallel", [edge(null, 1, [], ["w9"])], [null], 1, (eq) => `${eq}`);
    expect([first, second]).toEqual(["eq1", "eq2"]);
    expect(log.steps[0]).toMatchObject({ index: 0, consumedBlocks: ["c", "e", "p"], consumedWires: ["w1", "w2", "w3"], input: "r", output: "y" });
    expect(log.steps[1]).toMatchObject({ index: 1, consumedBlocks: [], consumedWires: ["w9"], input: "d", output: "y" });
    expect(printSteps(log.steps, (g) => ({ expr: `<${g}>`, latex: String(g) })).map((s) => s.expr)).toEqual(["<6>", "<1>"]);
  });
});
