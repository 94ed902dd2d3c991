import { DIAGRAM_FORMAT, DIAGRAM_VERSION, type Block, type DiagramDocument, type Wire } from "@shared/diagram/schema";

/**
 * Compact notation for hand-written test diagrams: wires as "from->to" or "from->to:port".
 * Example: makeDoc([{ id: "r", type: "input" }, { id: "y", type: "output" }], ["r->y"]).
 */
export function makeDoc(
  blocks: Block[],
  wires: string[],
  parameters: DiagramDocument["parameters"] = {},
  title = "Test diagram",
): DiagramDocument {
  return {
    format: DIAGRAM_FORMAT,
    version: DIAGRAM_VERSION,
    title,
    parameters,
    blocks,
    wires: wires.map((text, i): Wire => {
      const m = /^([^-]+)->([^:]+)(?::(\d+))?$/.exec(text);
      if (!m) throw new Error(`bad wire notation "${text}"`);
      const wire: Wire = { id: `w${i + 1}`, from: m[1], to: m[2] };
      if (m[3] !== undefined) wire.port = Number(m[3]);
      return wire;
    }),
  };
}
