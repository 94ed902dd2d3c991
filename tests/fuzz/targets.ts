import { argvTarget } from "./argvTarget";
import { exprTarget } from "./exprTarget";
import type { FuzzTarget } from "./harness";
import { pipelineTarget } from "./pipelineTarget";
import { uploadTarget } from "./uploadTarget";
import { validatorTarget } from "./validatorTarget";

/** Every fuzz target with its case count in `npm test` (≥ 5,000 in all) and in `npm run fuzz` (≥ 100,000). */
export const FUZZ_TARGETS: { target: FuzzTarget<never>; quick: number; long: number }[] = [
  { target: exprTarget as FuzzTarget<never>, quick: 2000, long: 40_000 },
  { target: validatorTarget as FuzzTarget<never>, quick: 1200, long: 25_000 },
  { target: uploadTarget as FuzzTarget<never>, quick: 600, long: 12_000 },
  { target: argvTarget as FuzzTarget<never>, quick: 1000, long: 20_000 },
  { target: pipelineTarget as FuzzTarget<never>, quick: 600, long: 10_000 },
];

/** The seed of both runs: a failure found once is found again. */
export const FUZZ_SEED = 20_250_515;
