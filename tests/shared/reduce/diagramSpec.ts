import type { DiagramDocument } from "@shared/diagram/schema";

type BlockSpec = [id: string, type: string, extra?: string[] | string];

/**
 * A document from a compact spec: blocks as [id, type, signs|expr], wires as "from>to" or "from>to:port".
 * Wires get ids "w0", "w1", … so consumed-wire checks are easy.
 */
export function diagram(
  blocks: BlockSpec[],
  wires: string[],
  parameters: DiagramDocument["parameters"] = {},
): DiagramDocument {
  return {
    format: "loopwright-diagram",
    version: 1,
    parameters,
    blocks: blocks.map(([id, type, extra]) =>
      type === "sum"
        ? { id, type, signs: extra as ("+" | "-")[] }
        : type === "gain" || type === "transfer"
          ? { id, type, expr: (extra as string) ?? "1" }
          : { id, type },
    ) as DiagramDocument["blocks"],
    wires: wires.map((w, i) => {
      const [from, rest] = w.split(">");
      const [to, port] = rest.split(":");
      return { id: `w${i}`, from, to, ...(port === undefined ? {} : { port: Number(port) }) };
    }),
  };
}

