import type { Block } from "@shared/diagram/schema";
import { emptyDocument } from "@/features/editor/commands/document";
import type { EditorDoc, EditorWire } from "@/features/editor/commands/types";
import { runPythonSync } from "../../support/python";

/** A document from blocks and `from>to[:port]` wire specs; wires get ids w1, w2, … in order. */
export function docOf(blocks: Block[], wires: string[] = [], parameters: EditorDoc["parameters"] = {}): EditorDoc {
  const parsed: EditorWire[] = wires.map((spec, i) => {
    const [from, rest] = spec.split(">");
    const [to, port] = rest.split(":");
    return { id: `w${i + 1}`, from, to, ...(port === undefined ? {} : { port: Number(port) }) };
  });
  return { ...emptyDocument(), blocks, wires: parsed, parameters };
}

/** Unity negative feedback around G: r → e(+,−) → G → y with G fed back into port 1. */
export const unityLoop = (expr = "K/(s*(s+2))") =>
  docOf(
    [
      { id: "r", type: "input" },
      { id: "e", type: "sum", signs: ["+", "-"] },
      { id: "G", type: "transfer", expr },
      { id: "y", type: "output" },
    ],
    ["r>e:0", "e>G", "G>y", "G>e:1"],
    { K: 4 },
  );

/**
 * Asks Debian's sympy (`/usr/bin/python3`) whether each pair of expressions (expression syntax, `^` for
 * powers) is equal as rational functions. One process per batch.
 */
export function sympyEqual(pairs: [string, string][]): boolean[] {
  const script = `
import json, sys
from sympy import simplify
from sympy.parsing.sympy_parser import parse_expr, standard_transformations, convert_xor, rationalize
tr = standard_transformations + (convert_xor, rationalize)
print(json.dumps([bool(simplify(parse_expr(a, transformations=tr) - parse_expr(b, transformations=tr)) == 0) for a, b in json.load(sys.stdin)]))
`;
  return runPythonSync<boolean[]>({ code: script }, pairs);
}
