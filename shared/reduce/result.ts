import { z } from "zod";
import { problemSchema } from "@shared/diagram/problems";

/**
 * The reducer's printed output — the contract shared by the CLI (`--json`), the server's stored
 * `result` column and the editor's results panel. Polynomials are written in the diagram expression
 * syntax: expanded, descending powers of s, exact coefficients (integers or p/q, never decimals).
 * Example: reductionResultSchema.parse(JSON.parse(cliJson)) checks a stored result and types it as ReductionResult.
 */
export const cancellationSchema = z.object({
  factor: z.string().describe('The cancelled common factor, e.g. "s - 1".'),
  roots: z
    .array(z.tuple([z.number(), z.number()]))
    .describe("Its roots at the nominal parameter values, as [re, im] pairs."),
  unstable: z.boolean().describe("True when a root has non-negative real part: a hidden unstable mode."),
});
export type Cancellation = z.infer<typeof cancellationSchema>;

export const transferResultSchema = z.object({
  input: z.string().describe("Input block id."),
  output: z.string().describe("Output block id."),
  numerator: z.string(),
  denominator: z.string(),
  latex: z.string(),
  cancelled: z.array(cancellationSchema),
});
export type TransferResult = z.infer<typeof transferResultSchema>;

export const reductionRuleSchema = z.enum([
  "series",
  "parallel",
  "feedback",
  "move-sum",
  "move-pickoff",
  "eliminate-node",
]);
export type ReductionRule = z.infer<typeof reductionRuleSchema>;

export const reductionStepSchema = z.object({
  index: z.number().int(),
  rule: reductionRuleSchema,
  description: z.string().describe('One sentence a reviewer can read, e.g. "Series: c then p become c·p".'),
  consumedBlocks: z.array(z.string()),
  consumedWires: z.array(z.string()),
  produced: z.string().describe('Id of the equivalent block the step produced (new ids are prefixed "eq").'),
  expr: z.string(),
  latex: z.string(),
  input: z.string().optional().describe("Input block of the pair the step belongs to, when the trace is per pair."),
  output: z.string().optional().describe("Output block of the pair the step belongs to, when the trace is per pair."),
});
export type ReductionStep = z.infer<typeof reductionStepSchema>;

export const reductionResultSchema = z.object({
  transfers: z.array(transferResultSchema),
  characteristic: z
    .string()
    .describe("Δ(s) times every block denominator, nothing cancelled: the modes of the whole interconnection."),
  characteristicLatex: z.string(),
  steps: z.array(reductionStepSchema),
  warnings: z.array(problemSchema),
});
export type ReductionResult = z.infer<typeof reductionResultSchema>;
