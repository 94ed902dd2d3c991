import { z } from "zod";
import { DISCRETISATION_METHODS } from "@shared/implement/discretise";
import { REALISATION_FORMS } from "@shared/implement/realise";

/**
 * What `implement --json` prints — one contract for the CLI, teams' CI and the published JSON Schema. Coefficient
 * lists are in DESCENDING powers of s or of z (constant last), the denominator's first coefficient 1.
 * Example: implementResultSchema.parse(JSON.parse(stdout)).discrete?.numerator.
 */
const coefficients = z.array(z.number()).min(1).describe("Coefficients in descending powers, the constant term last.");
const matrix = z.array(z.array(z.number())).describe("Rows of the matrix; an order-0 system has A = [], B = [], C = [[]].");

export const implementResultSchema = z.object({
  continuous: z
    .object({ numerator: coefficients, denominator: coefficients })
    .describe("The block's or pair's transfer in s at the nominal parameter values, lowest terms, monic denominator."),
  discrete: z
    .object({
      ts: z.number().positive().describe("Sample time in seconds."),
      method: z.enum(DISCRETISATION_METHODS),
      numerator: coefficients,
      denominator: coefficients,
    })
    .nullable()
    .describe("The discrete equivalent in z (null without --ts); dividing both by the highest power of z gives H(z^-1)."),
  stateSpace: z
    .object({
      form: z.enum(REALISATION_FORMS),
      A: matrix,
      B: matrix,
      C: matrix,
      D: matrix,
    })
    .describe("dx/dt = A x + B u, y = C x + D u, realising the continuous transfer."),
});
export type ImplementResult = z.infer<typeof implementResultSchema>;

/** The published JSON Schema of implement --json. Example: implementJsonSchema().title === "Loopwright implementation result". */
export function implementJsonSchema(): Record<string, unknown> {
  return {
    ...z.toJSONSchema(implementResultSchema, { io: "output" }),
    title: "Loopwright implementation result",
    description:
      "A block's or an input/output pair's transfer function, its discrete equivalent at a sample time and a state-space realisation, as printed by implement --json.",
  };
}
