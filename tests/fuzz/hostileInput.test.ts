import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { runCase } from "./harness";
import { FUZZ_SEED, FUZZ_TARGETS } from "./targets";

// Hostile input (common practice for parsers and services facing untrusted input: every input gets a value or a
// clear error, never an uncaught exception). Fixed seed; `npm run fuzz` runs twenty times more and reports timings.
describe("hostile input", () => {
  it("runs at least 5,000 cases in all", () => {
    expect(FUZZ_TARGETS.reduce((n, t) => n + t.quick, 0)).toBeGreaterThanOrEqual(5000);
  });

  it.each(FUZZ_TARGETS.map((t) => [t.target.name, t] as const))("%s answers every input with a value or a clear error", (_, { target, quick }) => {
    let cases = 0;
    fc.assert(
      fc.property(target.arbitrary, (input) => {
        cases += 1;
        const { failure } = runCase(target, input);
        if (failure) throw new Error(`${failure}\n  input: ${target.show(input)}`);
      }),
      { numRuns: quick, seed: FUZZ_SEED },
    );
    expect(cases).toBeGreaterThanOrEqual(quick);
  }, 600_000);
});
