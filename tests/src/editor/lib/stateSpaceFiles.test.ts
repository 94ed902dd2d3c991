import { describe, expect, it } from "vitest";
import { stateSpaceCsv, stateSpaceFileName, stateSpaceJson } from "@/features/editor/lib/stateSpaceFiles";

// source: the implement --json contract (shared/implement/schema.ts): stateSpace = { form, A, B, C, D }.
describe("state-space files", () => {
  const ss = { A: [[-3, -2], [1, 0]], B: [[1], [0]], C: [[1, 3]], D: [[0.1]] };

  it("JSON in the CLI's stateSpace shape, numbers read back exactly", () => {
    const parsed = JSON.parse(stateSpaceJson("controllable", { ...ss, D: [[0.1 + 0.2]] }));
    expect(Object.keys(parsed)).toEqual(["form", "A", "B", "C", "D"]);
    expect(parsed).toEqual({ form: "controllable", ...ss, D: [[0.30000000000000004]] });
  });

  it("CSV: each matrix's name, its rows, an empty line; an order-0 system keeps the names", () => {
    expect(stateSpaceCsv(ss)).toBe("A\n-3,-2\n1,0\n\nB\n1\n0\n\nC\n1,3\n\nD\n0.1\n");
    expect(stateSpaceCsv({ A: [], B: [], C: [[]], D: [[4]] })).toBe("A\n\nB\n\nC\n\nD\n4\n");
  });

  it("names the file after the block or pair with portable characters", () => {
    expect(stateSpaceFileName("pi", "json")).toBe("state-space-pi.json");
    expect(stateSpaceFileName("r → y", "csv")).toBe("state-space-r_y.csv");
  });
});
