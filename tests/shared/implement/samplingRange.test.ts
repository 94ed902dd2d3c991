import { describe, expect, it } from "vitest";
import { checkSampling } from "@shared/implement/discretise";

// Regression cases of the hostile-input fuzzer (tests/fuzz): pre-warping with ω·Ts so small that ω/tan(ωTs/2)
// overflows to ∞ threw an AnalysisError ("Parameter c has no finite value") out of implement, which the CLI
// reported as an internal error; a sample time beyond the exact-number range did the same.
describe("sample times and pre-warp frequencies the exact substitution cannot take", () => {
  it.each([
    [{ ts: 1e-300, method: "prewarp" as const, prewarp: 8e-118 }, "bad-prewarp"],
    [{ ts: 1e-4, method: "prewarp" as const, prewarp: 3e-323 }, "bad-prewarp"],
    [{ ts: 1e-310, method: "tustin" as const }, "bad-sample-time"],
  ])("%j is refused as %s", (opts, code) => {
    expect(() => checkSampling(opts)).toThrow(expect.objectContaining({ name: "ImplementError", code }));
  });

  // common practice: ordinary choices (Ts = 10 ms, ω below π/Ts ≈ 314 rad/s) pass.
  it("Ts = 0.01 s pre-warped at 10 rad/s passes", () => {
    expect(() => checkSampling({ ts: 0.01, method: "prewarp", prewarp: 10 })).not.toThrow();
  });
});
