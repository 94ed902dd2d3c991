import { describe, expect, it } from "vitest";
import { fallbackPosition } from "@shared/geometry/blockBox";
import { buildEdges, buildNodes, inHandle, portOfHandle } from "@/features/editor/lib/flowModel";
import { problemMarks, stepFootprint } from "@/features/editor/lib/marks";
import { unityLoop } from "../support";

const none = problemMarks([], null);

describe("canvas model of a document", () => {
  it("wires into a junction's bottom port enter from below and name their sign; others enter from the left", () => {
    const edges = buildEdges(unityLoop(), none, { blocks: [], wires: ["w4"] });
    expect(edges.map((e) => [e.id, e.targetHandle, e.data?.side, e.selected])).toEqual([
      ["w1", "in0", "left", false],
      ["w2", "in", "left", false],
      ["w3", "in", "left", false],
      ["w4", "in1", "bottom", true],
    ]);
    expect(edges[3].ariaLabel).toBe("Wire w4 from G to e port 1 (minus)");
  });

  it("the wire where the analysis breaks the loop says so in its accessible name, not by colour alone (WCAG 1.4.1)", () => {
    const edges = buildEdges(unityLoop(), problemMarks([], null, "w4"), { blocks: [], wires: [] });
    expect(edges.filter((e) => e.data?.isBreak).map((e) => e.id)).toEqual(["w4"]);
    expect(edges[3].ariaLabel).toBe("Wire w4 from G to e port 1 (minus), loop broken here for analysis");
    expect(edges[1].ariaLabel).toBe("Wire w2 from e to G");
  });

  it("marks what a reduction step consumed with aria-current=step, and problems by worst severity", () => {
    const step = { index: 0, rule: "feedback" as const, description: "", consumedBlocks: ["G"], consumedWires: ["w2", "w4"], produced: "eq1", expr: "", latex: "" };
    const marks = problemMarks(
      [
        { severity: "warning", code: "x", message: "", blockId: "e" },
        { severity: "error", code: "y", message: "", blockId: "e", related: ["G"] },
      ],
      stepFootprint([step], 0),
    );
    const doc = { ...unityLoop(), layout: { r: { x: 5, y: 7 } } };
    const nodes = buildNodes(doc, marks, { selection: { blocks: ["r"], wires: [] }, dragging: new Map([["y", { x: 1, y: 2 }]]), measured: new Map() });
    expect(nodes.map((n) => [n.id, n.domAttributes?.["aria-current"], n.data.problem])).toEqual([
      ["r", undefined, null],
      ["e", undefined, "error"],
      ["G", "step", "error"],
      ["y", undefined, null],
    ]);
    expect(nodes[0]).toMatchObject({ position: { x: 5, y: 7 }, selected: true, ariaLabel: "Input r" });
    expect(nodes[1].position).toEqual(fallbackPosition(1));
    expect(nodes[3].position).toEqual({ x: 1, y: 2 });
    expect(buildEdges(doc, marks, { blocks: [], wires: [] }).filter((e) => e.domAttributes).map((e) => e.id)).toEqual(["w2", "w4"]);
  });

  it("an equivalent block stands for everything the step that made it consumed (reduction trace semantics)", () => {
    const base = { description: "", expr: "", latex: "" };
    const steps = [
      { ...base, index: 0, rule: "series" as const, consumedBlocks: ["c", "p"], consumedWires: ["w3"], produced: "eq1" },
      { ...base, index: 1, rule: "feedback" as const, consumedBlocks: ["eq1", "h"], consumedWires: ["w5", "w6"], produced: "eq2" },
    ];
    const second = stepFootprint(steps, 1);
    expect([...second.blocks].sort()).toEqual(["c", "h", "p"]);
    expect([...second.wires].sort()).toEqual(["w3", "w5", "w6"]);
    expect([...stepFootprint(steps, 0).blocks].sort()).toEqual(["c", "p"]);
  });
});

describe("input handle ids and junction ports (the editor's own naming: in, in0, in1, …)", () => {
  it("read back the port each handle was named for", () => {
    for (const port of [0, 1, 2, 7]) expect(portOfHandle(inHandle(port))).toBe(port);
  });
  it("have no port for a single-input block's handle, an output or nothing", () => {
    expect(portOfHandle(inHandle(undefined))).toBeUndefined();
    expect(portOfHandle("out")).toBeUndefined();
    expect(portOfHandle(null)).toBeUndefined();
  });
});
