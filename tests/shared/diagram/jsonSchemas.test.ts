import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { publishedJsonSchemas } from "@shared/diagram/jsonSchemas";
import { reductionResultSchema } from "@shared/reduce/result";

const schemaFile = (name: string) => fileURLToPath(new URL(`../../../shared/schemas/${name}`, import.meta.url));

describe("published JSON Schemas", () => {
  it("the committed files equal freshly generated ones (run npx tsx server/tools/genSchemas.ts)", () => {
    const fresh = publishedJsonSchemas();
    expect(Object.keys(fresh).sort()).toEqual([
      "analysis-result.schema.json",
      "implement-result.schema.json",
      "loopwright-diagram.v1.schema.json",
      "reduction-result.schema.json",
    ]);
    for (const [name, schema] of Object.entries(fresh)) {
      expect(JSON.parse(readFileSync(schemaFile(name), "utf8")), name).toEqual(schema);
    }
  });

  // source: JSON Schema 2020-12 (common practice: required lists, const, additionalProperties).
  it("describes the diagram document as a reader accepts it", () => {
    const schema = publishedJsonSchemas()["loopwright-diagram.v1.schema.json"] as {
      $schema: string;
      required: string[];
      properties: Record<string, { const?: unknown; items?: { oneOf?: unknown[] } }>;
      additionalProperties: unknown;
    };
    expect(schema.$schema).toContain("2020-12");
    expect(schema.required.sort()).toEqual(["blocks", "format", "version", "wires"]);
    expect(schema.properties.format.const).toBe("loopwright-diagram");
    expect(schema.properties.version.const).toBe(1);
    expect(schema.properties.blocks.items?.oneOf).toHaveLength(8); // input, output, sum, gain, transfer, integrator, dead time, pickoff point
    expect(schema.additionalProperties).toEqual({}); // unknown fields are allowed
  });

  it("describes the reduction result with steps, warnings and cancellations", () => {
    const schema = publishedJsonSchemas()["reduction-result.schema.json"] as {
      required: string[];
      properties: { transfers: { items: { required: string[] } }; steps: { items: { required: string[] } } };
    };
    expect(schema.required.sort()).toEqual(["characteristic", "characteristicLatex", "steps", "transfers", "warnings"]);
    expect(schema.properties.transfers.items.required).toContain("cancelled");
    expect(schema.properties.steps.items.required).toEqual(
      expect.arrayContaining(["index", "rule", "description", "consumedBlocks", "consumedWires", "produced", "expr", "latex"]),
    );
  });

  it("describes the implementation result: continuous, discrete (or null) and state space, exactly those fields", () => {
    const schema = publishedJsonSchemas()["implement-result.schema.json"] as {
      required: string[];
      additionalProperties: unknown;
      properties: {
        discrete: { anyOf: { type: string; required?: string[]; properties?: { method: { enum: string[] } } }[] };
        stateSpace: { required: string[]; properties: { form: { enum: string[] } } };
      };
    };
    expect(schema.required.sort()).toEqual(["continuous", "discrete", "stateSpace"]);
    expect(schema.additionalProperties).toBe(false);
    const discrete = schema.properties.discrete.anyOf.find((s) => s.type === "object");
    expect(discrete?.required?.sort()).toEqual(["denominator", "method", "numerator", "ts"]);
    expect(discrete?.properties?.method.enum).toEqual(["tustin", "prewarp", "zoh", "matched"]);
    expect(schema.properties.discrete.anyOf.some((s) => s.type === "null")).toBe(true);
    expect(schema.properties.stateSpace.required.sort()).toEqual(["A", "B", "C", "D", "form"]);
    expect(schema.properties.stateSpace.properties.form.enum).toEqual(["controllable", "observable", "minimal"]);
  });
});

describe("reductionResultSchema", () => {
  // source: the result contract in shared/reduce/result.ts (field names kept for the reducer).
  const result = {
    transfers: [
      {
        input: "r",
        output: "y",
        numerator: "8*s + 16",
        denominator: "s^3 + 2*s^2 + 10*s + 16",
        latex: "\\frac{8s+16}{s^3+2s^2+10s+16}",
        cancelled: [{ factor: "s - 1", roots: [[1, 0]], unstable: true }],
      },
    ],
    characteristic: "s^3 + 2*s^2 + 10*s + 16",
    characteristicLatex: "s^3+2s^2+10s+16",
    steps: [
      {
        index: 0,
        rule: "series",
        description: "Series: c then p become eq1",
        consumedBlocks: ["c", "p"],
        consumedWires: ["wire #2 (c → p)"],
        produced: "eq1",
        expr: "K*(s+2)/(tau*s^3 + s^2)",
        latex: "",
      },
    ],
    warnings: [{ severity: "warning", code: "does-not-reach-output", message: "Block \"b\" reaches no output", blockId: "b" }],
  };

  it("accepts a well-formed result and refuses an unknown rule or a malformed root", () => {
    expect(reductionResultSchema.parse(result)).toEqual(result);
    const badRule = structuredClone(result);
    (badRule.steps[0] as { rule: string }).rule = "magic";
    expect(reductionResultSchema.safeParse(badRule).success).toBe(false);
    const badRoot = structuredClone(result);
    (badRoot.transfers[0].cancelled[0] as { roots: unknown }).roots = [[1]];
    expect(reductionResultSchema.safeParse(badRoot).success).toBe(false);
  });
});
