import { PADE_MAX, PADE_MIN } from "@shared/analysis/pade";
import { parseReduceArgs, type ReduceArgs } from "@server/tools/cli/args";
import { takeOption as cliTakeOption, usageError as cliUsageError } from "@server/tools/cli/command";

/**
 * Command line of `analyze`: the reduce options plus --break WIRE and --pade N. Usage mistakes are thrown as
 * CliExit(2) with the usage line. Example: parseAnalyzeArgs(["d.json", "--pade", "5"]).padeOrder === 5.
 */
export const ANALYZE_USAGE = "usage: analyze FILE.json [--json] [--input ID] [--output ID] [--break WIRE] [--pade N]   (analyze --help for details)";

export type AnalyzeArgs = ReduceArgs & { break?: string; padeOrder?: number };

const usageError = (message: string) => cliUsageError("analyze", ANALYZE_USAGE, message);
const takeOption = (argv: readonly string[], name: string, hint: string) => cliTakeOption(argv, name, hint, usageError);

/** `--pade N`: an integer from 1 to 10. */
function padeOrderOf(text: string | undefined): number | undefined {
  if (text === undefined) return undefined;
  const n = Number(text);
  if (!Number.isInteger(n) || n < PADE_MIN || n > PADE_MAX) throw usageError(`--pade must be an integer from ${PADE_MIN} to ${PADE_MAX}, not "${text}"`);
  return n;
}

export function parseAnalyzeArgs(argv: readonly string[]): AnalyzeArgs | "help" {
  const brk = takeOption(argv, "break", "a wire id or index, e.g. --break w6");
  const pade = takeOption(brk.rest, "pade", `an order from ${PADE_MIN} to ${PADE_MAX}, e.g. --pade 5`);
  const padeOrder = padeOrderOf(pade.value);
  const parsed = parseReduceArgs(pade.rest);
  if (parsed.kind === "help") return "help";
  if (parsed.kind === "usage-error") throw usageError(parsed.message);
  return { ...parsed.args, break: brk.value, padeOrder };
}
