/**
 * Command line of `reduce`: FILE [--json] [--timing] [--input ID] [--output ID] [--help] (`analyze` shares it
 * without --timing). Usage mistakes are returned (not thrown) so the caller prints them with the usage line and exits 2.
 */
export const USAGE = "usage: reduce FILE.json [--json] [--timing] [--input ID] [--output ID]   (reduce --help for details)";

export interface ReduceArgs {
  file: string;
  json: boolean;
  /** Report how long the reduction and the whole command took. */
  timing: boolean;
  input?: string;
  output?: string;
}

export type ParsedArgs = { kind: "help" } | { kind: "run"; args: ReduceArgs } | { kind: "usage-error"; message: string };

export function parseReduceArgs(argv: readonly string[], opts: { timing?: boolean } = {}): ParsedArgs {
  const files: string[] = [];
  const picked: { input?: string; output?: string } = {};
  let json = false;
  let timing = false;
  let optionsEnded = false;
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i];
    if (optionsEnded || !arg.startsWith("-") || arg === "-") {
      files.push(arg);
      continue;
    }
    if (arg === "--") {
      optionsEnded = true;
    } else if (arg === "--help" || arg === "-h") {
      return { kind: "help" };
    } else if (arg === "--json") {
      json = true;
    } else if (arg === "--timing" && opts.timing) {
      timing = true;
    } else {
      const m = /^--(input|output)(?:=(.*))?$/.exec(arg);
      if (!m) return { kind: "usage-error", message: `unknown option "${arg}"` };
      const name = m[1] as "input" | "output";
      const value = m[2] ?? argv[++i];
      if (value === undefined || value === "" || (m[2] === undefined && value.startsWith("--"))) {
        return { kind: "usage-error", message: `--${name} needs a block id, e.g. --${name} ${name === "input" ? "r" : "y"}` };
      }
      if (picked[name] !== undefined) return { kind: "usage-error", message: `--${name} is given twice` };
      picked[name] = value;
    }
  }
  if (files.length === 0) return { kind: "usage-error", message: "no diagram file given" };
  if (files.length > 1) return { kind: "usage-error", message: `one diagram file at a time, got ${files.length}: ${files.join(", ")}` };
  return { kind: "run", args: { file: files[0], json, timing, ...picked } };
}

export const HELP = `reduce — closed-loop transfer functions of a Loopwright diagram, with every reduction step

${USAGE}

  FILE.json     a Loopwright diagram document (format "loopwright-diagram", version 1)
  --json        print the result as one JSON object: { transfers, characteristic, characteristicLatex,
                steps, warnings } (transfers: input, output, numerator, denominator, latex, cancelled)
  --timing      also report how long it took: with --json the object gets "timing": { "reduceMs", "totalMs" }
                (reduceMs: from the read document to the exact result, printing excluded; totalMs: the whole
                command, from the process start to the output ready), otherwise a last line says the same
  --input ID    only the transfers from this input block (and their steps)
  --output ID   only the transfers to this output block (and their steps)
  -h, --help    this text

Without --json a readable report is printed: each input → output pair, the steps, the warnings.

Exit status:
  0  reduced; the result is on stdout (warnings included)
  1  the file's content is wrong: not JSON (line and column given), not a valid diagram document,
     unsupported version, over a limit, or an invalid or ill-posed diagram; the problems are on stderr
  2  the command line is wrong: unknown option, missing or unreadable file, unknown --input/--output id
  3  internal error in the reducer (please report it with the diagram file)
`;
