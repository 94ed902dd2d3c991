import type { StateSpace } from "@shared/implement/stateSpace";
import { safe } from "@/features/editor/lib/responseCsv";

// A realisation as files: JSON in the `implement --json` stateSpace shape, CSV one matrix after another.
// Numbers in JavaScript's shortest round-trip form, so a script reads back the exact doubles.

const MATRICES = ["A", "B", "C", "D"] as const;

/** The JSON file: { form, A, B, C, D }. Example: stateSpaceJson("minimal", ss) starts with '{\n  "form": "minimal"'. */
export const stateSpaceJson = (form: string, ss: StateSpace): string =>
  `${JSON.stringify({ form, A: ss.A, B: ss.B, C: ss.C, D: ss.D }, null, 2)}\n`;

/**
 * The CSV file: for each matrix a line with its name, then its rows, then an empty line (an order-0 system's A, B
 * and C have no rows). Example: stateSpaceCsv({ A: [[-1]], B: [[1]], C: [[2]], D: [[0]] }) === "A\n-1\n\nB\n1\n\nC\n2\n\nD\n0\n".
 */
export const stateSpaceCsv = (ss: StateSpace): string =>
  MATRICES.map((name) => [name, ...ss[name].filter((row) => row.length).map((row) => row.join(","))].join("\n")).join("\n\n") + "\n";

/** The download's name. Example: stateSpaceFileName("r → y", "json") === "state-space-r_y.json". */
export const stateSpaceFileName = (id: string, ext: "json" | "csv"): string => `state-space-${safe(id)}.${ext}`;
