import { describe, expect, it } from "vitest";
import { parseReduceArgs } from "@server/tools/cli/args";

// The documented command line of `reduce` (common practice for POSIX-style tools: `--` ends options,
// `--name=value` and `--name value` are the same).
describe("parseReduceArgs", () => {
  it.each([
    [["d.json"], { file: "d.json", json: false, timing: false }],
    [["--json", "d.json"], { file: "d.json", json: true, timing: false }],
    [["d.json", "--input", "r", "--output=y"], { file: "d.json", json: false, timing: false, input: "r", output: "y" }],
    [["--", "--odd-name.json"], { file: "--odd-name.json", json: false, timing: false }],
    [["d.json", "--timing", "--json"], { file: "d.json", json: true, timing: true }],
  ])("%j runs", (argv, args) => {
    expect(parseReduceArgs(argv, { timing: true })).toEqual({ kind: "run", args });
  });

  it("--timing is an option of reduce only: analyze, which shares the parser, refuses it", () => {
    const r = parseReduceArgs(["d.json", "--timing"]);
    expect(r.kind).toBe("usage-error");
    if (r.kind === "usage-error") expect(r.message).toContain('unknown option "--timing"');
  });

  it("--help and -h print the help; an unknown option before them is still an error", () => {
    expect(parseReduceArgs(["d.json", "--bogus", "--help"]).kind).toBe("usage-error");
    expect(parseReduceArgs(["-h"])).toEqual({ kind: "help" });
    expect(parseReduceArgs(["d.json", "--help"])).toEqual({ kind: "help" });
  });

  it.each([
    [[], "no diagram file"],
    [["a.json", "b.json"], "one diagram file at a time"],
    [["d.json", "--verbose"], 'unknown option "--verbose"'],
    [["d.json", "--input"], "--input needs a block id"],
    [["d.json", "--output", "--json"], "--output needs a block id"],
    [["d.json", "--input="], "--input needs a block id"],
    [["d.json", "--input", "r", "--input", "d"], "--input is given twice"],
  ])("%j is a usage error", (argv, message) => {
    const r = parseReduceArgs(argv);
    expect(r.kind).toBe("usage-error");
    if (r.kind === "usage-error") expect(r.message).toContain(message);
  });
});
