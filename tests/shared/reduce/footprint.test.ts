import { describe, expect, test } from "vitest";
import { Footprint } from "@shared/reduce/footprint";
import { blockPart, SignalFlowGraph, wirePart, type Part } from "@shared/reduce/graph";
import { StepLog } from "@shared/reduce/trace";

// common practice (block-diagram reduction): an equivalent block replaces the blocks and the wires between them;
// the wires into and out of it stay, and a pickoff or summing junction goes once it splits or joins nothing.

const w = wirePart;
const b = blockPart;

function setUp(nodes: [string, { id: string; joins: boolean } | null][]) {
  const graph = new SignalFlowGraph<number>();
  nodes.forEach(([id, own], i) => graph.addNode(id, i, own));
  return graph;
}
const edge = (graph: SignalFlowGraph<number>, from: string, to: string, label: string | null, before: Part[], after: Part[] = []) =>
  graph.addEdge({ from, to, gain: 1, label, sign: 1, before, after });

describe("what a step consumes", () => {
  test("two branches of one pickoff merged: their blocks, the pickoff and the branch wires, not the wire into the pickoff", () => {
    const graph = setUp([["x", null], ["y", null]]);
    const e1 = edge(graph, "x", "y", "a", [w("w0"), b("p"), w("w1")], [w("w3")]);
    const e2 = edge(graph, "x", "y", "c", [w("w0"), b("p"), w("w2")], [w("w4")]);
    const footprint = new Footprint(graph);
    const step = new StepLog<number>().record("parallel", 2, (eq) => eq);
    footprint.note(step, [e1, e2], []);
    graph.removeEdge(e1);
    graph.removeEdge(e2);
    footprint.drop(e1);
    footprint.drop(e2);
    footprint.carry(edge(graph, "x", "y", step.produced, [w("w0"), b("p")]));
    footprint.settle(graph);
    expect(step.consumedBlocks).toEqual(["p", "a", "c"]);
    expect(step.consumedWires).toEqual(["w1", "w3", "w2", "w4"]);
    expect(footprint.consumed("p")).toBe(true);
  });

  test("a pickoff still feeding two branches stays; a pass-through junction stays while one edge carries it outside the step", () => {
    const graph = setUp([["x", null], ["y", null], ["z", null]]);
    const kept = edge(graph, "x", "z", "k", [w("w0"), b("p"), w("w9")]);
    const e1 = edge(graph, "x", "y", "a", [w("w0"), b("p"), w("w1")]);
    const e2 = edge(graph, "y", "z", "c", [b("s"), w("w2")]);
    const footprint = new Footprint(graph);
    const step = new StepLog<number>().record("series", 1, (eq) => eq);
    footprint.note(step, [e1, e2], []);
    for (const e of [e1, e2]) {
      graph.removeEdge(e);
      footprint.drop(e);
    }
    footprint.carry(edge(graph, "x", "z", step.produced, [w("w0"), b("p"), w("w1")], [w("w2")]));
    footprint.settle(graph);
    expect(step.consumedBlocks).toEqual(["a", "s", "c"]);
    expect(footprint.consumed("p")).toBe(false);
    expect(kept.before).toHaveLength(3);
  });

  test("a summing junction left with one input is consumed; one still adding two signals is not", () => {
    const graph = setUp([["r", null], ["d", null], ["e", { id: "e", joins: true }], ["f", { id: "f", joins: true }], ["g", null]]);
    edge(graph, "r", "e", null, [w("w1")]);
    edge(graph, "e", "g", "G", [w("w2")]);
    edge(graph, "r", "f", null, [w("w3")]);
    edge(graph, "d", "f", null, [w("w4")]);
    const footprint = new Footprint(graph);
    const step = new StepLog<number>().record("feedback", 1, (eq) => eq);
    footprint.note(step, [], [graph.node("e"), graph.node("f")]);
    footprint.settle(graph);
    expect(step.consumedBlocks).toEqual(["e"]);
  });

  test("the pair's last step takes the junctions and wires left between input and output, not the end wires", () => {
    const graph = setUp([["r", null], ["y", null]]);
    const final = edge(graph, "r", "y", "eq1", [w("w1"), b("s"), w("w2")], [w("w3"), b("q"), w("w4")]);
    const footprint = new Footprint(graph);
    const log = new StepLog<number>();
    const step = log.record("series", 1, (eq) => eq);
    footprint.note(step, [], []);
    footprint.settle(graph);
    footprint.finish(final);
    expect(step.consumedBlocks).toEqual(["s", "q"]);
    expect(step.consumedWires).toEqual(["w2", "w3"]);
  });

  test("a pair without steps has nothing to take", () => {
    const graph = setUp([["r", null], ["y", null]]);
    const final = edge(graph, "r", "y", "g", [w("w1"), b("s"), w("w2")]);
    const footprint = new Footprint(graph);
    footprint.finish(final);
    expect(footprint.consumed("s")).toBe(false);
  });
});
