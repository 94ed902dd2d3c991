import { describe, expect, it } from "vitest";
import { blocksById, incomingWiresByPort, inputPortCount, outgoingWires, reachable } from "@shared/diagram/graph";
import { loadDiagram } from "@shared/diagram/validate";
import { exampleDiagram } from "./exampleDiagram";

// source: the format spec's example loop r → e → c → p → y with feedback p → h → e (port 1).
const doc = loadDiagram(exampleDiagram()).doc!;

describe("diagram adjacency", () => {
  it("counts input ports per block type", () => {
    expect(doc.blocks.map((b) => `${b.id}:${inputPortCount(b)}`)).toEqual(["r:0", "e:2", "c:1", "p:1", "h:1", "y:1"]);
  });

  it("lists outgoing wires in document order, including a fan-out", () => {
    const out = outgoingWires(doc);
    expect(out.get("p")?.map((r) => `${r.index}:${r.wire.to}`)).toEqual(["3:y", "4:h"]);
    expect(out.get("y")).toEqual([]);
    expect(out.get("r")?.[0].label).toBe("w1");
    expect(out.get("e")?.[0].label).toBe("wire #1 (e → c)");
  });

  it("groups incoming wires by port", () => {
    const into = incomingWiresByPort(doc);
    expect(into.get("e")?.map((port) => port.map((r) => r.wire.from))).toEqual([["r"], ["h"]]);
    expect(into.get("r")).toEqual([]);
    expect(into.get("y")?.[0].map((r) => r.label)).toEqual(["wire #3 (p → y)"]);
  });

  it("leaves out wires to missing blocks and wires with an unusable port", () => {
    const raw = exampleDiagram();
    raw.wires.push({ from: "c", to: "nowhere" }, { from: "c", to: "e", port: 9 }, { from: "c", to: "e" });
    const broken = loadDiagram(raw).doc!;
    expect(outgoingWires(broken).get("c")?.map((r) => r.wire.to)).toEqual(["p", "e", "e"]);
    expect(incomingWiresByPort(broken).get("e")?.map((port) => port.length)).toEqual([1, 1]);
  });

  it("keeps the first block of a duplicated id", () => {
    const raw = exampleDiagram();
    raw.blocks.push({ id: "c", type: "gain", expr: "1" });
    expect(blocksById(loadDiagram(raw).doc!).get("c")?.type).toBe("transfer");
  });

  it("finds what is reachable, through loops, starting blocks included", () => {
    const out = outgoingWires(doc);
    const next = (id: string) => (out.get(id) ?? []).map((r) => r.wire.to);
    expect([...reachable(["r"], next)].sort()).toEqual(["c", "e", "h", "p", "r", "y"]);
    expect([...reachable(["h"], next)].sort()).toEqual(["c", "e", "h", "p", "y"]);
    expect([...reachable(["y"], next)]).toEqual(["y"]);
  });
});
