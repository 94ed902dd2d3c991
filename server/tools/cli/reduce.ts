import type { Problem } from "@shared/diagram/problems";
// Static imports: behind an import() esbuild wraps the module graph and keeps the whole of mathjs, whose every
// function is then built at start-up (~0.2 s of each run, against ~0.04 s more for --help).
import { printReduction } from "@shared/reduce/printReduction";
import { reduceDocumentExact } from "@shared/reduce/reduceDiagram";
import { counted, plural } from "@shared/text/words";
import { HELP, USAGE, parseReduceArgs } from "@server/tools/cli/args";
import { CliExit, readJsonFile, runCommand, usageError as cliUsageError } from "@server/tools/cli/command";
import { caretLines, formatProblem, formatReport } from "@server/tools/cli/report";

/**
 * `reduce FILE.json [--json] [--timing] [--input ID] [--output ID]` — public contract, called from teams' CI (and
 * `--timing`'s "timing": { "reduceMs", "totalMs" } read by checks outside the project: keep its shape).
 * Exit 0 success, 1 bad file content, 2 bad command line, 3 internal error; never a stack trace.
 */

const usageError = (message: string) => cliUsageError("reduce", USAGE, message);

/** The expression text a problem points into, read from the raw document (which may be invalid). */
function exprText(raw: unknown, p: Problem): string | undefined {
  if (p.field !== "expr" || p.blockId === undefined || typeof raw !== "object" || raw === null) return undefined;
  const blocks = (raw as { blocks?: unknown }).blocks;
  if (!Array.isArray(blocks)) return undefined;
  const block = blocks.find((b) => typeof b === "object" && b !== null && (b as { id?: unknown }).id === p.blockId);
  const expr = (block as { expr?: unknown } | undefined)?.expr;
  return typeof expr === "string" ? expr : undefined;
}

/** The text for stdout; every failure is thrown as an Exit carrying its code and stderr lines. */
function run(argv: readonly string[]): string {
  const parsed = parseReduceArgs(argv, { timing: true });
  if (parsed.kind === "help") return HELP;
  if (parsed.kind === "usage-error") throw usageError(parsed.message);
  const { file, json, timing, input, output } = parsed.args;

  const raw = readJsonFile("reduce", USAGE, file);
  const started = performance.now();
  const reduced = reduceDocumentExact(raw, { input, output });
  const reduceMs = performance.now() - started;
  if (!reduced.ok) {
    const pairProblems = reduced.problems.filter((p) => p.code === "unknown-pair-id");
    if (pairProblems.length) throw new CliExit(2, [...pairProblems.map((p) => `reduce: ${p.message}`), USAGE]);
    const errors = reduced.problems.filter((p) => p.severity === "error").length;
    const lines = [`reduce: ${file}: ${counted(errors, "problem")} ${plural(errors, "prevents", "prevent")} reduction`];
    for (const p of reduced.problems) lines.push(formatProblem(p), ...caretLines(p, exprText(raw, p)));
    throw new CliExit(1, lines);
  }
  const result = printReduction(reduced.reduction);
  const text = json ? JSON.stringify(result, null, 2) : formatReport(result, reduced.reduction.diagram.doc.title);
  if (!timing) return json ? `${text}\n` : text;
  // performance.now() counts from the process start: the whole command up to the output, printing included.
  const figures = { reduceMs: round(reduceMs), totalMs: round(performance.now()) };
  if (!json) return `${text}\nTiming: reduction ${figures.reduceMs} ms, whole command ${figures.totalMs} ms\n`;
  // Spliced into the printed object so the JSON is not printed twice to time it.
  return `${text.slice(0, text.lastIndexOf("}")).trimEnd()},\n  "timing": ${JSON.stringify(figures)}\n}\n`;
}

const round = (ms: number): number => Math.round(ms * 1000) / 1000;

await runCommand("reduce", run);
