import { z } from "zod";
import { problemSchema } from "@shared/diagram/problems";

/**
 * What `analyze --json` prints — one contract for the CLI, teams' CI and the published JSON Schema.
 * null marks a quantity that does not exist (no overshoot, infinite margin, unstable system); the reason is
 * in `notes`. Infinite steady-state values are the strings "Infinity" / "-Infinity", never null.
 * Example: analysisResultSchema.parse(JSON.parse(stdout)).margins.phaseMarginDeg.
 */
const maybe = z.number().nullable();
const pair = z.tuple([z.number(), z.number()]).describe("[re, im]");
const verdict = z.enum(["stable", "marginal", "unstable"]);

const quantity = z.object({
  value: z.union([z.number(), z.literal("Infinity"), z.literal("-Infinity"), z.null()]),
  exact: z.string().nullable().describe('Exact value when finite, e.g. "1/3".'),
  note: z.string(),
});
const threeErrors = z.object({ step: quantity, ramp: quantity, parabola: quantity });

const endpoint = z.object({
  value: z.number(),
  text: z.string().describe('Exact ("30", "sqrt(3)") or 6 significant digits.'),
  exact: z.boolean(),
  polynomial: z.string().nullable().describe("Polynomial in the parameter the endpoint is a root of, when not exact."),
});

export const rootDetailSchema = z.object({
  re: z.number(),
  im: z.number(),
  multiplicity: z.number().int(),
  factor: z.string(),
  exact: z.string().nullable(),
  damping: maybe,
  naturalFrequency: maybe,
});

const response = z.object({ formula: z.string(), latex: z.string(), exact: z.boolean() });

export const analysisResultSchema = z.object({
  input: z.string(),
  output: z.string(),
  values: z.record(z.string(), z.number()).describe("Parameter values the analysis used."),
  transfer: z.object({ numerator: z.string(), denominator: z.string(), latex: z.string() }),
  poles: z.array(pair).describe("Repeated by multiplicity."),
  zeros: z.array(pair),
  poleDetails: z.array(rootDetailSchema),
  dominantPoles: z.array(pair),
  stable: verdict,
  stabilityReason: z.string(),
  characteristic: z.object({ polynomial: z.string(), stable: verdict.nullable(), sameVerdict: z.boolean().nullable() }),
  hiddenModes: z.array(z.object({ factor: z.string(), roots: z.array(pair), unstable: z.boolean(), source: z.enum(["reduction", "values"]) })),
  dcGain: maybe,
  step: z.object({ riseTime: maybe, peakTime: maybe, overshootPercent: maybe, settlingTime: maybe, finalValue: maybe }),
  margins: z.object({ gainMarginDb: maybe, phaseMarginDeg: maybe, gainCrossover: maybe, phaseCrossover: maybe }),
  routh: z.object({
    polynomial: z.string(),
    rows: z.array(z.object({ power: z.number().int(), entries: z.array(z.string()) })),
    firstColumn: z.array(z.string()),
    special: z.array(z.object({ power: z.number().int(), kind: z.enum(["zero-first-element", "zero-row"]), explanation: z.string() })),
    signChanges: z.number().int().nullable(),
    conclusion: z.string(),
    stableSets: z.array(
      z.object({
        parameter: z.string(),
        text: z.string(),
        intervals: z.array(z.object({ lower: endpoint.nullable(), upper: endpoint.nullable(), lowerIncluded: z.boolean(), upperIncluded: z.boolean() })),
      }),
    ),
    conditions: z.array(z.string()).nullable(),
  }),
  steadyState: z.object({
    inputRole: z
      .discriminatedUnion("kind", [
        z.object({ kind: z.literal("reference") }),
        z.object({ kind: z.literal("disturbance"), entersAt: z.array(z.string()), junction: z.string() }),
        z.object({ kind: z.literal("no-loop") }),
      ])
      .describe("Where the input enters the loop: at its comparison junction (reference) or elsewhere (disturbance)."),
    finalValue: quantity,
    initialValue: quantity,
    errors: threeErrors,
    systemType: z.number().int().nullable(),
    constants: z.object({ Kp: quantity, Kv: quantity, Ka: quantity }).nullable(),
    errorsFromConstants: threeErrors.nullable(),
  }),
  bandwidth: maybe,
  sensitivityPeak: maybe,
  delayMargin: maybe,
  nyquist: z
    .object({
      encirclements: z.number().int().nullable(),
      openLoopRhpPoles: z.number().int(),
      closedLoopRhpPoles: z.number().int().nullable(),
      verdict,
      reason: z.string(),
    })
    .nullable(),
  break: z.object({ wire: z.string(), index: z.number().int(), chosen: z.enum(["given", "default"]) }).nullable(),
  loopGain: z.object({ numerator: z.string(), denominator: z.string() }).nullable(),
  responses: z.object({ step: response, impulse: response, ramp: response }),
  deadTime: z
    .object({
      padeOrder: z.number().int().min(1).max(10).describe("Order of the Padé approximant of each e^(-sT) behind poles, Routh array, time responses and margins."),
      delays: z.array(z.object({ blocks: z.array(z.string()), seconds: z.number(), text: z.string() })),
      exactTransfer: z.object({ numerator: z.string(), denominator: z.string(), latex: z.string() }).describe("The pair's transfer with exp(-T*s) kept."),
      exactStep: z
        .object({
          method: z.literal("simulation"),
          stepSize: z.number().describe("Fixed step of the simulation, seconds."),
          riseTime: maybe,
          peakTime: maybe,
          overshootPercent: maybe,
          settlingTime: maybe,
        })
        .nullable()
        .describe("Step metrics with every dead time kept exactly, from a simulation of the delay differential equation; null when the pair's transfer has no dead time or cannot be simulated (see notes)."),
    })
    .nullable()
    .describe("Dead-time blocks of the diagram; null when it has none."),
  notes: z.array(z.string()),
  warnings: z.array(problemSchema),
});
export type AnalysisResult = z.infer<typeof analysisResultSchema>;

/**
 * The published JSON Schema of analysisResultSchema (file shared/schemas/analysis-result.schema.json).
 * Example: analysisJsonSchema().title === "Loopwright analysis result".
 */
export function analysisJsonSchema(): Record<string, unknown> {
  return {
    ...z.toJSONSchema(analysisResultSchema, { io: "output" }),
    title: "Loopwright analysis result",
    description:
      "Poles, zeros, stability verdict, Routh array, step metrics, margins, Nyquist verdict and steady state of one input/output pair, as printed by analyze --json.",
  };
}
