import type { Problem } from "@shared/diagram/problems";
import { counted, plural } from "@shared/text/words";
import { HELP, USAGE, parseReduceArgs } from "@server/tools/cli/args";
import { CliExit, readJsonFile, runCommand, usageError as cliUsageError } from "@server/tools/cli/command";
import { caretLines, formatProblem, formatReport } from "@server/tools/cli/report";

/**
 * `reduce FILE.json [--json] [--input ID] [--output ID]` — public contract, called from teams' CI.
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
async function run(argv: readonly string[]): Promise<string> {
  const parsed = parseReduceArgs(argv);
  if (parsed.kind === "help") return HELP;
  if (parsed.kind === "usage-error") throw usageError(parsed.message);
  const { file, json, input, output } = parsed.args;

  const raw = readJsonFile("reduce", USAGE, file);
  // Loaded only now: --help and command-line mistakes answer without loading the algebra.
  const { reduceDocument } = await import("@shared/reduce/reduceDiagram");
  const reduced = reduceDocument(raw, { input, output });
  if (!reduced.ok) {
    const pairProblems = reduced.problems.filter((p) => p.code === "unknown-pair-id");
    if (pairProblems.length) throw new CliExit(2, [...pairProblems.map((p) => `reduce: ${p.message}`), USAGE]);
    const errors = reduced.problems.filter((p) => p.severity === "error").length;
    const lines = [`reduce: ${file}: ${counted(errors, "problem")} ${plural(errors, "prevents", "prevent")} reduction`];
    for (const p of reduced.problems) lines.push(formatProblem(p), ...caretLines(p, exprText(raw, p)));
    throw new CliExit(1, lines);
  }
  return json ? `${JSON.stringify(reduced.result, null, 2)}\n` : formatReport(reduced.result, reduced.doc.title);
}

await runCommand("reduce", run);
