// The plotted samples of a time response as a CSV file: a `t,y` header (more columns for a delayed loop's exact
// response) and one row per sample. Numbers are
// written in JavaScript's shortest round-trip form, so a spreadsheet or script reads back the exact doubles.
import type { InputKind } from "@shared/analysis/timeResponse";

/** CSV text of [t, y, …] samples, rows ended by "\n". Example: responseCsv([[0, 0], [0.5, 0.25]]) === "t,y\n0,0\n0.5,0.25\n". */
export function responseCsv(samples: readonly (readonly number[])[], columns: readonly string[] = ["t", "y"]): string {
  return [columns.join(","), ...samples.map((row) => row.join(","))].join("\n") + "\n";
}

/** Block ids may hold any character; a file name keeps the portable ones (letters, digits, ".", "_", "-"). Example: safe("r → y") === "r_y". */
export const safe = (id: string): string => id.replace(/[^A-Za-z0-9._-]+/g, "_") || "_";

/** Download name of a response. Example: responseCsvName("step", "r", "y") === "step-response-r-to-y.csv". */
export function responseCsvName(input: InputKind, from: string, to: string): string {
  return `${input}-response-${safe(from)}-to-${safe(to)}.csv`;
}
