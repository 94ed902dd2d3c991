import { readFileSync, statSync } from "node:fs";
import type { Problem } from "@shared/diagram/problems";
import { HELP, USAGE, parseReduceArgs } from "@server/cli/args";
import { parseJsonText } from "@server/cli/jsonText";
import { caretLines, formatProblem, formatReport } from "@server/cli/report";

/**
 * `reduce FILE.json [--json] [--input ID] [--output ID]` — public contract, called from teams' CI.
 * Exit 0 success, 1 bad file content, 2 bad command line, 3 internal error; never a stack trace.
 */
const MAX_FILE_BYTES = 16 * 1024 * 1024;

class Exit extends Error {
  constructor(
    readonly code: number,
    readonly lines: string[],
  ) {
    super(lines.join("\n"));
  }
}

const usageError = (message: string) => new Exit(2, [`reduce: ${message}`, USAGE]);

function readDiagramFile(file: string): string {
  let size: number;
  try {
    const st = statSync(file);
    if (st.isDirectory()) throw usageError(`cannot read "${file}": it is a directory`);
    size = st.size;
  } catch (e) {
    if (e instanceof Exit) throw e;
    const code = (e as NodeJS.ErrnoException).code;
    throw usageError(code === "ENOENT" ? `no such file "${file}"` : `cannot read "${file}" (${code ?? "error"})`);
  }
  if (size > MAX_FILE_BYTES) {
    throw new Exit(1, [`reduce: ${file}: the file is ${(size / 1048576).toFixed(1)} MB; the limit is ${MAX_FILE_BYTES / 1048576} MB`]);
  }
  try {
    return readFileSync(file, "utf8");
  } catch (e) {
    throw usageError(`cannot read "${file}" (${(e as NodeJS.ErrnoException).code ?? "error"})`);
  }
}

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

  const text = readDiagramFile(file);
  const doc = parseJsonText(text);
  if (!doc.ok) {
    const { line, column, message } = doc.error;
    throw new Exit(1, [`reduce: ${file}: not valid JSON at line ${line}, column ${column}: ${message}`]);
  }
  // Loaded only now: --help and command-line mistakes answer without loading the algebra.
  const { reduceDocument } = await import("@shared/engine/reduceDocument");
  const reduced = reduceDocument(doc.value, { input, output });
  if (!reduced.ok) {
    const pairProblems = reduced.problems.filter((p) => p.code === "unknown-pair-id");
    if (pairProblems.length) throw new Exit(2, [...pairProblems.map((p) => `reduce: ${p.message}`), USAGE]);
    const errors = reduced.problems.filter((p) => p.severity === "error").length;
    const lines = [`reduce: ${file}: ${errors} problem${errors === 1 ? "" : "s"} prevent reduction`];
    for (const p of reduced.problems) lines.push(formatProblem(p), ...caretLines(p, exprText(doc.value, p)));
    throw new Exit(1, lines);
  }
  return json ? `${JSON.stringify(reduced.result, null, 2)}\n` : formatReport(reduced.result, reduced.doc.title);
}

async function main(): Promise<void> {
  try {
    process.stdout.write(await run(process.argv.slice(2)));
    process.exitCode = 0;
  } catch (e) {
    if (e instanceof Exit) {
      process.stderr.write(`${e.lines.join("\n")}\n`);
      process.exitCode = e.code;
    } else {
      const message = e instanceof Error ? e.message : String(e);
      process.stderr.write(`reduce: internal error: ${message}\nPlease report it together with the diagram file.\n`);
      process.exitCode = 3;
    }
  }
}

await main();
