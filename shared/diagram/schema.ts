import { z } from "zod";

/**
 * Loopwright diagram document, format version 1 — the one definition of the file format used by
 * import/export, the API and the CLI. Unknown fields are kept (`looseObject`) so later versions can
 * add some without breaking version 1 readers.
 * Example: { format: "loopwright-diagram", version: 1, blocks: [...], wires: [...] }.
 */
export const DIAGRAM_FORMAT = "loopwright-diagram";
export const DIAGRAM_VERSION = 1;

export const LIMITS = {
  exprLength: 2000,
  exponent: 50,
  blocks: 2000,
  resultDegree: 1000,
} as const;

const idSchema = z
  .string()
  .min(1, "An id must not be empty")
  .max(100, "An id must be at most 100 characters");

export const parameterNameSchema = z
  .string()
  .regex(/^[A-Za-z][A-Za-z0-9_]*$/, "A parameter name starts with a letter, then letters, digits or _")
  // A regex rather than a refine so the published JSON Schema carries the rule too.
  .regex(/^(?!s$)/, "`s` is the Laplace variable and cannot be a parameter name");

export const parameterSpecSchema = z.union([
  z.number().finite(),
  z.looseObject({
    value: z.number().finite(),
    unit: z.string().max(40).optional(),
    min: z.number().finite().optional(),
    max: z.number().finite().optional(),
    description: z.string().max(500).optional(),
  }),
]);

const blockBase = { id: idSchema, label: z.string().max(200).optional() };

export const blockSchema = z.discriminatedUnion("type", [
  z.looseObject({ ...blockBase, type: z.literal("input") }),
  z.looseObject({ ...blockBase, type: z.literal("output") }),
  z.looseObject({
    ...blockBase,
    type: z.literal("sum"),
    signs: z.array(z.enum(["+", "-"])).min(1).max(16).describe("Sign of each input port, port i ↔ signs[i]."),
  }),
  z.looseObject({
    ...blockBase,
    type: z.literal("gain"),
    expr: z.string().describe("Numbers and parameters with + - * / ^ and parentheses; no s. Example: 2*K/3."),
  }),
  z.looseObject({
    ...blockBase,
    type: z.literal("transfer"),
    expr: z.string().describe("Rational expression in s, numbers and parameters. Example: K*(s+2)/(tau*s^2 + s)."),
  }),
  z.looseObject({ ...blockBase, type: z.literal("integrator") }),
  z.looseObject({
    ...blockBase,
    type: z.literal("delay"),
    expr: z.string().describe("Dead time T in seconds (the block is e^(-sT)): a number or parameter expression, no s. Example: 0.2 or Td."),
  }),
  z.looseObject({ ...blockBase, type: z.literal("branch") }),
]);

export const wireSchema = z.looseObject({
  id: idSchema.optional(),
  from: idSchema,
  to: idSchema,
  port: z.number().int().min(0).optional().describe("Input port of the target sum (0-based); omitted for other targets."),
});

export const pointSchema = z.looseObject({ x: z.number().finite(), y: z.number().finite() });

export const diagramDocumentSchema = z.looseObject({
  format: z.literal(DIAGRAM_FORMAT),
  version: z.literal(DIAGRAM_VERSION),
  title: z.string().max(200).optional(),
  notes: z.string().max(20000).optional(),
  parameters: z.record(parameterNameSchema, parameterSpecSchema).optional().default({}),
  blocks: z.array(blockSchema),
  wires: z.array(wireSchema),
  layout: z.record(z.string(), pointSchema).optional(),
});

export type DiagramDocument = z.infer<typeof diagramDocumentSchema>;
export type Block = z.infer<typeof blockSchema>;
export type BlockType = Block["type"];
export type Wire = z.infer<typeof wireSchema>;
export type ParameterSpec = z.infer<typeof parameterSpecSchema>;

/** Nominal value of a parameter spec. Example: parameterValue({ value: 0.5 }) === 0.5. */
export const parameterValue = (spec: ParameterSpec): number => (typeof spec === "number" ? spec : spec.value);

/** How messages name a wire: its id, else `wire #i (from → to)`. */
export const wireLabel = (wire: Wire, index: number): string =>
  wire.id ?? `wire #${index} (${wire.from} → ${wire.to})`;
