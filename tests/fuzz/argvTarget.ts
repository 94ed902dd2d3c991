import fc from "fast-check";
import { parseAnalyzeArgs } from "@server/tools/cli/analyzeArgs";
import { parseReduceArgs } from "@server/tools/cli/args";
import { CliExit } from "@server/tools/cli/command";
import { parseImplementArgs } from "@server/tools/cli/implementArgs";
import { truncated, type FuzzTarget } from "./harness";

/** The three CLIs' option parsers on random argv: a command, help, or a usage error (exit 2) with a message. */
const OPTIONS = ["--json", "--input", "--output", "--break", "--pade", "--block", "--ts", "--method", "--prewarp", "--form", "--help", "-h", "--", "-", "--bogus", "-x"];
const VALUES = ["d.json", "r", "y", "w1", "3", "0", "-1", "11", "2.5", "0.01", "1e-3", "NaN", "Infinity", " ", "", "tustin", "prewarp", "zoh", "matched", "minimal", "observable"];

const tokenArb = fc.oneof(
  { arbitrary: fc.constantFrom(...OPTIONS), weight: 4 },
  { arbitrary: fc.constantFrom(...VALUES), weight: 4 },
  fc.tuple(fc.constantFrom(...OPTIONS), fc.constantFrom(...VALUES)).map(([o, v]) => `${o}=${v}`),
  fc.string({ unit: "binary", maxLength: 12 }),
);

function exitFault(e: unknown): string | null {
  if (!(e instanceof CliExit)) throw e;
  return e.code === 2 && e.lines.length > 0 && e.lines[0].trim() !== "" ? null : `CliExit ${e.code} without a usage message`;
}

const tryParse = (parse: () => unknown, valid: (v: unknown) => boolean): string | null => {
  try {
    return valid(parse()) ? null : "returned an invalid command";
  } catch (e) {
    return exitFault(e);
  }
};

export const argvTarget: FuzzTarget<string[]> = {
  name: "CLI argument parsers",
  arbitrary: fc.array(tokenArb, { maxLength: 10 }),
  check(argv) {
    const reduce = parseReduceArgs(argv);
    if (reduce.kind === "usage-error" && reduce.message.trim() === "") return "reduce: usage error without a message";
    return (
      tryParse(() => parseAnalyzeArgs(argv), (v) => v === "help" || (typeof v === "object" && v !== null && "file" in v)) ??
      tryParse(
        () => parseImplementArgs(argv),
        (v) => v === "help" || (typeof v === "object" && v !== null && "selection" in v && (!("discretise" in v) || !v.discretise || (v.discretise as { ts: number }).ts > 0)),
      )
    );
  },
  show: (argv) => truncated(JSON.stringify(argv)),
};
