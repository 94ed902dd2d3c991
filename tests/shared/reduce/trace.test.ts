import { describe, expect, test } from "vitest";
import type { SfgEdge } from "@shared/reduce/graph";
import { edgeName, StepLog, printSteps, times } from "@shared/reduce/trace";

const edge = (label: string | null, sign: 1 | -1): SfgEdge<number> => ({ seq: 0, from: "a", to: "b", gain: sign, label, sign, before: [], after: [] });

describe("step sentences and records", () => {
  test("names and products fold signs to the front (common practice: −a·b = a·(−b))", () => {
    expect(edgeName(edge("h", -1))).toBe("−h");
    expect(edgeName(edge(null, -1))).toBe("−1");
    expect(times("eq3", "−k2")).toBe("−eq3·k2");
    expect(times("−1", "g")).toBe("−g");
    expect(times("−a", "−b")).toBe("a·b");
    expect(times("1", "1")).toBe("1");
  });

  test("the log numbers eq ids across pairs and tags each step with its pair; what it consumed is filled in later", () => {
    const log = new StepLog<number>();
    log.beginPair("r", "y");
    const first = log.record("series", 6, (eq) => `Series: c then p become ${eq} = c·p.`);
    log.beginPair("d", "y");
    const second = log.record("parallel", 1, (eq) => `${eq}`);
    expect([first.produced, second.produced]).toEqual(["eq1", "eq2"]);
    expect(log.steps[0]).toMatchObject({ index: 0, description: "Series: c then p become eq1 = c·p.", consumedBlocks: [], consumedWires: [], input: "r", output: "y" });
    expect(log.steps[1]).toMatchObject({ index: 1, input: "d", output: "y" });
    expect(printSteps(log.steps, (g) => ({ expr: `<${g}>`, latex: String(g) })).map((s) => s.expr)).toEqual(["<6>", "<1>"]);
  });
});
