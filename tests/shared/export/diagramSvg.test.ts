import { describe, expect, it } from "vitest";
import { DOMParser } from "@xmldom/xmldom";
import { diagramSvg } from "@shared/export/diagramSvg";
import { diagramDocumentSchema } from "@shared/diagram/schema";
import { servoDocument } from "../../api/support/servo";

// A stand-in typesetter: the builder only places what it is given.
const typeset = (tex: string) => ({ svg: `<svg width="40" height="20"><path d="M0 0 L40 20"/><desc>${tex.length}</desc></svg>`, width: 40, height: 20 });
const doc = diagramDocumentSchema.parse({ ...servoDocument("x"), layout: { r: { x: 0, y: 40 }, e: { x: 120, y: 34 }, g: { x: 240, y: 34 }, y: { x: 400, y: 40 } } });
const build = (title = "Servo", pins = undefined as Parameters<typeof diagramSvg>[0]["pins"]) =>
  diagramSvg({ document: doc, result: null, meta: { title, version: 3, savedAt: "2026-12-03T07:00:00.000Z" }, pins, typeset });
const parse = (svg: string) => new DOMParser().parseFromString(svg, "image/svg+xml");

describe("diagramSvg (common practice: SVG 1.1 as XML)", () => {
  it("parses as XML, has no foreignObject, and names every block in a <title>", () => {
    const svg = build();
    const xml = parse(svg);
    expect(xml.getElementsByTagName("foreignObject").length).toBe(0);
    const titles = Array.from(xml.getElementsByTagName("title")).map((t) => t.textContent);
    for (const b of doc.blocks) expect(titles.some((t) => t?.startsWith(b.id))).toBe(true);
    expect(xml.getElementsByTagName("g").length).toBeGreaterThanOrEqual(doc.blocks.length);
  });
  it("draws an arrowhead per wire and the junction's signs", () => {
    const xml = parse(build());
    const heads = Array.from(xml.getElementsByTagName("path")).filter((p) => p.getAttribute("class") === "arrowhead");
    expect(heads.length).toBe(doc.wires.length);
    const signs = Array.from(xml.getElementsByTagName("text")).filter((t) => t.getAttribute("class") === "sign").map((t) => t.textContent);
    expect(signs).toEqual(["+", "−"]);
  });
  it("escapes user strings and draws pins", () => {
    const svg = build("A <&> B", [{ id: "c1", target: { blockId: "g" }, number: 2, label: "Check <gain>" }]);
    expect(svg).toContain("A &lt;&amp;&gt; B");
    const pins = Array.from(parse(svg).getElementsByTagName("g")).filter((g) => g.getAttribute("class") === "pin");
    expect(pins.length).toBe(1);
    // The marker carries the thread's own number (the panel's), not its place among the pins drawn.
    expect(pins[0]!.textContent).toContain("2");
    expect(svg).toContain("2. Check &lt;gain&gt;");
  });
  it("widens the figure to hold a long caption on its outermost block, which used to run off the edge", () => {
    // The plant is the rightmost block; its caption, centred on it, reaches far past its box.
    const label = "plant with a caption much wider than its own box";
    const long = diagramDocumentSchema.parse({ ...doc, blocks: doc.blocks.map((b) => (b.id === "g" ? { ...b, label } : b)), layout: { ...doc.layout, y: { x: 100, y: 200 } } });
    const xml = parse(diagramSvg({ document: long, result: null, meta: { title: "Servo", version: 3, savedAt: "2026-12-03T07:00:00.000Z" }, typeset }));
    const width = Number(xml.documentElement!.getAttribute("width"));
    const caption = Array.from(xml.getElementsByTagName("text")).find((t) => t.textContent === `g: ${label}`)!;
    // The caption is centred (text-anchor middle) in its block's group, inside the group shifted by the left margin.
    const figure = Array.from(xml.getElementsByTagName("g")).find((g) => g.getAttribute("transform")?.startsWith("translate("))!;
    const shift = Number(/translate\(([-\d.]+)/.exec(figure.getAttribute("transform")!)![1]);
    // Sans 11 px runs about 0.55 em a character.
    const right = Number(caption.getAttribute("x")) + shift + (label.length + 3) * 11 * 0.55 / 2;
    expect(right).toBeLessThanOrEqual(width);
  });
  it("draws a dead-time block with its typeset e^(−sT) inside its box", () => {
    const seen: string[] = [];
    const record = (tex: string) => (seen.push(tex), typeset(tex));
    const delayed = diagramDocumentSchema.parse({
      ...doc,
      blocks: [...doc.blocks.filter((b) => b.id !== "y"), { id: "d", type: "delay", expr: "0.5" }, { id: "y", type: "output" }],
      wires: [...doc.wires.filter((w) => w.to !== "y"), { from: "g", to: "d" }, { from: "d", to: "y" }],
      layout: { ...doc.layout, d: { x: 340, y: 34 }, y: { x: 480, y: 40 } },
    });
    const xml = parse(diagramSvg({ document: delayed, result: null, meta: { title: "Servo", version: 3, savedAt: "2026-12-03T07:00:00.000Z" }, typeset: record }));
    expect(seen).toContain("e^{-\\frac{1}{2}\\,s}");
    const group = Array.from(xml.getElementsByTagName("g")).find((g) => g.getAttribute("data-block-id") === "d")!;
    expect(group.getElementsByTagName("title")[0]!.textContent).toBe("d");
    expect(group.getElementsByTagName("svg").length).toBe(1); // the typeset formula is placed inside the block
  });
});
