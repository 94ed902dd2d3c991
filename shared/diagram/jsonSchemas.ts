import { z } from "zod";
import { diagramDocumentSchema } from "@shared/diagram/schema";
import { reductionResultSchema } from "@shared/reduce/result";
import { analysisJsonSchema } from "@shared/analysis/schema";
import { implementJsonSchema } from "@shared/implement/schema";

/**
 * The published JSON Schemas, generated from the zod schemas so they cannot drift: file name under
 * shared/schemas/ → schema object. The diagram schema describes what a reader accepts (io "input");
 * the result schemas describe what the reducer, the analysis and the implementation write (io "output").
 * Example: publishedJsonSchemas()["loopwright-diagram.v1.schema.json"].title === "Loopwright diagram, version 1".
 */
export function publishedJsonSchemas(): Record<string, Record<string, unknown>> {
  return {
    "loopwright-diagram.v1.schema.json": {
      ...z.toJSONSchema(diagramDocumentSchema, { io: "input" }),
      title: "Loopwright diagram, version 1",
      description:
        "A feedback loop of s-domain blocks (input, output, sum, gain, transfer, integrator, branch) joined by wires. " +
        "Readers keep fields they do not know.",
    },
    "reduction-result.schema.json": {
      ...z.toJSONSchema(reductionResultSchema, { io: "output" }),
      title: "Loopwright reduction result",
      description:
        "Closed-loop transfer functions with cancelled factors, the characteristic polynomial, every reduction step and warnings.",
    },
    "analysis-result.schema.json": analysisJsonSchema(),
    "implement-result.schema.json": implementJsonSchema(),
  };
}
