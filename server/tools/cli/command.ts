import { readFileSync, statSync } from "node:fs";
import { parseJsonText } from "@shared/json/jsonText";

/**
 * What every Loopwright command-line tool shares: its exit contract (0 success, 1 bad file content,
 * 2 bad command line, 3 internal error; never a stack trace) and reading a diagram file.
 */
const MAX_FILE_BYTES = 16 * 1024 * 1024;

/** A failure carrying the exit code and the lines for stderr. */
export class CliExit extends Error {
  constructor(
    readonly code: number,
    readonly lines: string[],
  ) {
    super(lines.join("\n"));
  }
}

export const usageError = (command: string, usage: string, message: string): CliExit =>
  new CliExit(2, [`${command}: ${message}`, usage]);

/**
 * Takes `--NAME VALUE` / `--NAME=VALUE` out of argv (not after "--"); the rest goes on to the next parser.
 * A missing value or a repeated option is a usage error. Example: takeOption(["f.json", "--ts", "0.1"], "ts", …).value === "0.1".
 */
export function takeOption(argv: readonly string[], name: string, hint: string, usageError: (message: string) => CliExit): { rest: string[]; value?: string } {
  const rest: string[] = [];
  let value: string | undefined;
  const pattern = new RegExp(`^--${name}(?:=(.*))?$`);
  for (let i = 0; i < argv.length; i++) {
    const m = pattern.exec(argv[i]);
    if (!m || argv.slice(0, i).includes("--")) {
      rest.push(argv[i]);
      continue;
    }
    const given = m[1] ?? argv[++i];
    if (given === undefined || given === "" || (m[1] === undefined && given.startsWith("--"))) throw usageError(`--${name} needs ${hint}`);
    if (value !== undefined) throw usageError(`--${name} is given twice`);
    value = given;
  }
  return { rest, value };
}

/** Reads and JSON-parses a diagram file: a missing or unreadable file is a usage error, bad JSON says line and column. */
export function readJsonFile(command: string, usage: string, file: string): unknown {
  let size: number;
  try {
    const st = statSync(file);
    if (st.isDirectory()) throw usageError(command, usage, `cannot read "${file}": it is a directory`);
    size = st.size;
  } catch (e) {
    if (e instanceof CliExit) throw e;
    const code = (e as NodeJS.ErrnoException).code;
    throw usageError(command, usage, code === "ENOENT" ? `no such file "${file}"` : `cannot read "${file}" (${code ?? "error"})`);
  }
  if (size > MAX_FILE_BYTES)
    throw new CliExit(1, [`${command}: ${file}: the file is ${(size / 1048576).toFixed(1)} MB; the limit is ${MAX_FILE_BYTES / 1048576} MB`]);
  let text: string;
  try {
    text = readFileSync(file, "utf8");
  } catch (e) {
    throw usageError(command, usage, `cannot read "${file}" (${(e as NodeJS.ErrnoException).code ?? "error"})`);
  }
  const parsed = parseJsonText(text);
  if (!parsed.ok) {
    const { line, column, message } = parsed.error;
    throw new CliExit(1, [`${command}: ${file}: not valid JSON at line ${line}, column ${column}: ${message}`]);
  }
  return parsed.value;
}

/** Runs a command: prints its output, or its failure's lines with the right exit code. */
export async function runCommand(command: string, run: (argv: string[]) => string | Promise<string>): Promise<void> {
  // A reader that stops early (`| head`) is not an error of ours.
  process.stdout.on("error", (e: NodeJS.ErrnoException) => {
    if (e.code === "EPIPE") process.exit(process.exitCode ?? 0);
  });
  try {
    process.stdout.write(await run(process.argv.slice(2)));
    process.exitCode = 0;
  } catch (e) {
    if (e instanceof CliExit) {
      process.stderr.write(`${e.lines.join("\n")}\n`);
      process.exitCode = e.code;
    } else {
      const message = e instanceof Error ? e.message : String(e);
      process.stderr.write(`${command}: internal error: ${message}\nPlease report it together with the diagram file.\n`);
      process.exitCode = 3;
    }
  }
}
