import ELK from "elkjs/lib/elk.bundled.js";
import { describe, expect, it } from "vitest";
import { elkGraph, elkPositions, returnBlocks } from "@/features/editor/lib/elkGraph";
import { docOf, unityLoop } from "../support";

/** A loop with a sensor in the return path: r → e → c → p → y, p → h → e. */
const withSensor = () =>
  docOf(
    [
      { id: "h", type: "gain", expr: "0.5" },
      { id: "y", type: "output" },
      { id: "p", type: "transfer", expr: "1/(s+1)" },
      { id: "c", type: "transfer", expr: "(s+2)/s" },
      { id: "e", type: "sum", signs: ["+", "-"] },
      { id: "r", type: "input" },
    ],
    ["r>e:0", "e>c", "c>p", "p>y", "p>h", "h>e:1"],
  );

describe("auto layout (ELK layered; common practice: signal flows left to right, feedback path underneath)", () => {
  it("finds the blocks that only lead back into the loop", () => {
    expect([...returnBlocks(withSensor())]).toEqual(["h"]);
    expect([...returnBlocks(unityLoop())]).toEqual([]);
  });

  it("puts the forward path left to right on one row and the return path below it", async () => {
    const pos = elkPositions(await new ELK().layout(elkGraph(withSensor(), new Map())));
    const order = ["r", "e", "c", "p"].map((id) => pos[id].x);
    expect(order).toEqual([...order].sort((a, b) => a - b));
    expect(new Set(["r", "e", "c", "p", "y"].map((id) => pos[id].y)).size).toBe(1);
    expect(pos.y.x).toBeGreaterThan(pos.p.x);
    expect(pos.h.y).toBeGreaterThan(pos.p.y);
  });

  it("uses measured sizes and pins a junction's feedback port to its bottom side", () => {
    const doc = unityLoop();
    const graph = elkGraph(doc, new Map([["G", { width: 140, height: 60 }]]));
    const g = graph.children!.find((c) => c.id === "G")!;
    expect([g.width, g.height]).toEqual([140, 60]);
    const e = graph.children!.find((c) => c.id === "e")!;
    expect(e.ports!.map((p) => p.layoutOptions!["elk.port.side"])).toEqual(["WEST", "SOUTH", "EAST"]);
    expect(graph.edges!.map((w) => `${w.sources[0]}->${w.targets[0]}`)).toContain("G::out->e::in1");
  });
});
