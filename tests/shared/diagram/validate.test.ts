import { describe, expect, it } from "vitest";
import { loadDiagram, validateDiagram } from "@shared/diagram/validate";
import { problemSchema, type Problem } from "@shared/diagram/problems";
import { exampleDiagram } from "./exampleDiagram";

type Raw = ReturnType<typeof exampleDiagram>;

/** Load (must succeed) and validate a raw document. */
function check(raw: unknown) {
  const loaded = loadDiagram(raw);
  expect(loaded.problems).toEqual([]);
  const result = validateDiagram(loaded.doc!);
  // Every problem fits the published problem contract (strict: no stray keys).
  for (const p of result.problems) expect(problemSchema.strict().parse(p)).toEqual(p);
  return result;
}

const edited = (edit: (d: Raw) => void): Raw => {
  const d = exampleDiagram();
  edit(d);
  return d;
};
const block = (d: Raw, id: string) => d.blocks.find((b) => b.id === id)!;

describe("the format spec's example document", () => {
  it("loads and validates with no problems, parsing every gain and transfer", () => {
    const { problems, expressions } = check(exampleDiagram());
    expect(problems).toEqual([]);
    expect([...expressions.keys()].sort()).toEqual(["c", "h", "p"]);
  });
});

describe("validateDiagram reports each problem with its code and what it is about", () => {
  // source: the Loopwright format spec's wiring, expression, parameter and limit rules.
  const cases: [string, (d: Raw) => void, Partial<Problem>][] = [
    ["wire to a missing block", (d) => d.wires.push({ id: "wx", from: "c", to: "zz" }), { code: "wire-to-missing-block", wireId: "wx", field: "to" }],
    ["wire from a missing block", (d) => d.wires.push({ from: "zz", to: "y" }), { code: "wire-from-missing-block", wireId: "wire #6 (zz → y)", field: "from" }],
    ["port out of range on a sum", (d) => (d.wires[5].port = 2), { code: "port-out-of-range", wireId: "wire #5 (h → e)", blockId: "e", field: "port" }],
    ["port missing on a sum", (d) => delete d.wires[5].port, { code: "port-missing", wireId: "wire #5 (h → e)", blockId: "e", field: "port" }],
    ["port on a non-sum", (d) => (d.wires[1].port = 0), { code: "port-on-non-sum", wireId: "wire #1 (e → c)", blockId: "c", field: "port" }],
    ["two wires into one sum port", (d) => d.wires.push({ id: "w9", from: "r", to: "e", port: 0 }), { code: "port-occupied", wireId: "w9", blockId: "e", related: ["w1"] }],
    ["an unwired sum port", (d) => (block(d, "e").signs = ["+", "-", "+"]), { code: "unwired-port", blockId: "e", field: "signs[2]" }],
    ["an unwired block input", (d) => d.wires.splice(2, 1), { code: "unwired-port", blockId: "p" }],
    [
      "an output with an outgoing wire",
      (d) => {
        d.blocks.push({ id: "y2", type: "output" });
        d.wires.push({ id: "wo", from: "y", to: "y2" });
      },
      { code: "output-has-outgoing-wire", wireId: "wo", blockId: "y" },
    ],
    ["an input with an incoming wire", (d) => d.wires.push({ id: "wi", from: "p", to: "r" }), { code: "input-has-incoming-wire", wireId: "wi", blockId: "r" }],
    ["a second wire into a non-sum block", (d) => d.wires.push({ id: "w2c", from: "r", to: "c" }), { code: "second-incoming-wire", wireId: "w2c", blockId: "c" }],
    ["duplicate block ids", (d) => d.blocks.push({ id: "c", type: "gain", expr: "1" }), { code: "duplicate-block-id", blockId: "c", field: "id" }],
    ["duplicate wire ids", (d) => (d.wires[2].id = "w1"), { code: "duplicate-wire-id", wireId: "w1", field: "id" }],
    ["an unparseable expression", (d) => (block(d, "c").expr = "K*(s+2"), { code: "syntax", blockId: "c", field: "expr", position: 6 }],
    ["an undeclared name", (d) => (block(d, "p").expr = "1/(tauu*s^2 + s)"), { code: "unknown-name", blockId: "p", field: "expr", position: 3 }],
    ["s inside a gain", (d) => (block(d, "h").expr = "0.5*s"), { code: "s-in-gain", blockId: "h", field: "expr", position: 4 }],
    ["a negative exponent", (d) => (block(d, "p").expr = "1/(tau*s^-2 + s)"), { code: "bad-exponent", blockId: "p", position: 9 }],
    ["a fractional exponent", (d) => (block(d, "p").expr = "1/(tau*s^1.5 + s)"), { code: "bad-exponent", blockId: "p", position: 9 }],
    ["an undeclared name written like a function", (d) => (block(d, "c").expr = "f(s+2)/s"), { code: "function-call", blockId: "c", position: 0 }],
    ["division by a literal zero", (d) => (block(d, "h").expr = "1/0"), { code: "division-by-zero", blockId: "h", position: 2 }],
    ["an expression over 2,000 characters", (d) => (block(d, "c").expr = `${"s+".repeat(1000)}1`), { code: "expr-too-long", blockId: "c", position: 2000 }],
    ["an exponent over 50", (d) => (block(d, "p").expr = "1/(s+1)^51"), { code: "exponent-limit", blockId: "p", position: 8 }],
    ["no input block", (d) => (d.blocks = d.blocks.filter((b) => b.id !== "r")), { code: "no-input-block", severity: "error" }],
    ["no output block", (d) => (d.blocks = d.blocks.filter((b) => b.id !== "y")), { code: "no-output-block", severity: "error" }],
    ["parameter min above max", (d) => (d.parameters.tau = { value: 0.5, min: 3, max: 2 }), { code: "parameter-min-above-max", severity: "warning", field: "parameters.tau" }],
    ["parameter value outside its range", (d) => (d.parameters.tau = { value: 5, min: 0.1, max: 2 }), { code: "parameter-out-of-range", severity: "warning", field: "parameters.tau" }],
  ];
  it.each(cases)("%s", (_name, edit, expected) => {
    const { problems } = check(edited(edit));
    expect(problems).toContainEqual(expect.objectContaining({ severity: "error", ...expected }));
    const found = problems.find((p) => p.code === expected.code)!;
    expect(found.message.length).toBeGreaterThan(20);
  });

  it("collects every problem, not only the first", () => {
    const raw = edited((d) => {
      block(d, "c").expr = "1/2s";
      block(d, "h").expr = "s";
      d.wires.push({ id: "wx", from: "c", to: "zz" });
      d.wires[1].port = 0;
    });
    const codes = check(raw).problems.map((p) => p.code).sort();
    expect(codes).toEqual(["ambiguous-product", "port-on-non-sum", "s-in-gain", "wire-to-missing-block"]);
  });

  it("lists each error of one expression as its own problem on that block, each with its position", () => {
    const { problems } = check(edited((d) => (block(d, "c").expr = "Kq*(s+")));
    const onC = problems.filter((p) => p.blockId === "c").map((p) => [p.code, p.field, p.position]);
    expect(onC).toEqual([
      ["unknown-name", "expr", 0],
      ["syntax", "expr", 6],
    ]);
  });

  it("leaves a block whose expression fails out of `expressions` and keeps the others", () => {
    const { expressions } = check(edited((d) => (block(d, "c").expr = "K*(s+2")));
    expect([...expressions.keys()].sort()).toEqual(["h", "p"]);
  });
});

describe("reachability warnings", () => {
  // source: common practice — a block off every input→output path cannot change any transfer function.
  it("warns about a loop that no input reaches and that reaches no output, with no errors", () => {
    const raw = edited((d) => {
      d.blocks.push({ id: "g1", type: "gain", expr: "2" }, { id: "g2", type: "integrator" });
      d.wires.push({ from: "g1", to: "g2" }, { from: "g2", to: "g1" });
    });
    const { problems } = check(raw);
    expect(problems.every((p) => p.severity === "warning")).toBe(true);
    expect(problems.map((p) => `${p.code}:${p.blockId}`).sort()).toEqual([
      "does-not-reach-output:g1",
      "does-not-reach-output:g2",
      "unreachable-from-input:g1",
      "unreachable-from-input:g2",
    ]);
  });

  it("warns about a pickoff branch that leads nowhere", () => {
    const raw = edited((d) => {
      d.blocks.push({ id: "b", type: "branch" });
      d.wires.push({ from: "p", to: "b" });
    });
    expect(check(raw).problems).toEqual([expect.objectContaining({ severity: "warning", code: "does-not-reach-output", blockId: "b" })]);
  });
});

describe("problems name a pickoff point as the rail does", () => {
  it("an unfed pickoff point and a second wire into one say 'pickoff point', never its type key", () => {
    const unfed = check(edited((d) => {
      d.blocks.push({ id: "b", type: "branch" });
      d.wires.push({ from: "b", to: "y2" });
      d.blocks.push({ id: "y2", type: "output" });
    })).problems.find((p) => p.code === "unwired-port");
    expect(unfed).toMatchObject({ blockId: "b", message: 'Pickoff point "b" has no incoming wire: connect its input' });
    const twice = check(edited((d) => {
      d.blocks.push({ id: "b", type: "branch" });
      d.wires.push({ id: "wb1", from: "p", to: "b" }, { id: "wb2", from: "r", to: "b" });
    })).problems.find((p) => p.code === "second-incoming-wire");
    expect(twice?.message).toContain('is a second wire into pickoff point "b"');
    for (const p of [unfed, twice]) expect(p?.message).not.toMatch(/branch/);
  });
});

describe("limits", () => {
  /** r → n transfer blocks in series → y. */
  const chain = (n: number, expr: string) => ({
    format: "loopwright-diagram",
    version: 1,
    blocks: [{ id: "r", type: "input" }, ...Array.from({ length: n }, (_, i) => ({ id: `g${i}`, type: "transfer", expr })), { id: "y", type: "output" }],
    wires: Array.from({ length: n + 1 }, (_, i) => ({ from: i === 0 ? "r" : `g${i - 1}`, to: i === n ? "y" : `g${i}` })),
  });

  // source: the format spec — degree bound = sum over blocks of max(deg num, deg den) as written.
  it("refuses a diagram whose degree bound exceeds 1,000 and accepts exactly 1,000", () => {
    expect(check(chain(21, "1/(s+1)^50")).problems).toEqual([expect.objectContaining({ code: "degree-limit", severity: "error" })]);
    expect(check(chain(20, "1/(s+1)^50")).problems).toEqual([]);
  });

  it("counts an integrator as degree 1", () => {
    const raw = chain(20, "1/(s+1)^50");
    raw.blocks.splice(1, 0, { id: "i", type: "integrator" });
    raw.wires[0] = { from: "r", to: "i" };
    raw.wires.push({ from: "i", to: "g0" });
    expect(check(raw).problems.map((p) => p.code)).toEqual(["degree-limit"]);
  });

  it("refuses more than 2,000 blocks and accepts exactly 2,000", () => {
    expect(check(chain(1999, "1")).problems).toEqual([expect.objectContaining({ code: "too-many-blocks", severity: "error" })]);
    expect(check(chain(1998, "1")).problems).toEqual([]);
  });
});

describe("loadDiagram", () => {
  // source: the Loopwright format spec (format/version header, field rules, readers keep unknown fields).
  it("reports a wrong format or version on its own, with the version sentence of the spec", () => {
    expect(loadDiagram({ ...exampleDiagram(), version: 2 }).problems).toEqual([
      expect.objectContaining({ code: "unsupported-version", field: "version", message: "unsupported version 2: this Loopwright reads version 1" }),
    ]);
    expect(loadDiagram({ ...exampleDiagram(), format: "other" }).problems).toEqual([expect.objectContaining({ code: "wrong-format", field: "format" })]);
    const { format: _dropped, ...noFormat } = exampleDiagram();
    expect(loadDiagram(noFormat).problems).toEqual([expect.objectContaining({ code: "wrong-format" })]);
    for (const raw of [null, [], "text", 3]) expect(loadDiagram(raw).problems).toEqual([expect.objectContaining({ code: "not-a-document" })]);
  });

  const cases: [string, (d: Raw) => void, Partial<Problem>][] = [
    ["a bad sign names the block id and the field", (d) => (block(d, "e").signs = ["+", "*"]), { code: "invalid-field", blockId: "e", field: "signs[1]" }],
    ["a block without id is named by its index", (d) => delete d.blocks[2].id, { code: "missing-field", blockId: "blocks[2]", field: "id" }],
    ["an unknown block type", (d) => (block(d, "h").type = "amplifier"), { code: "unknown-block-type", blockId: "h", field: "type" }],
    ["a block without type", (d) => delete block(d, "h").type, { code: "missing-field", blockId: "h", field: "type" }],
    ["a wire without id is named by its label", (d) => delete d.wires[1].to, { code: "missing-field", wireId: "wire #1 (e → ?)", field: "to" }],
    ["a negative port names the wire id", (d) => (d.wires[0].port = -1), { code: "invalid-field", wireId: "w1", field: "port" }],
    ["a parameter called s", (d) => (d.parameters.s = 1), { code: "invalid-field", field: "parameters.s" }],
    ["a parameter name with a space", (d) => (d.parameters["my gain"] = 1), { code: "invalid-field", field: "parameters.my gain" }],
    ["a parameter spec without a number value", (d) => (d.parameters.K = { value: "4" }), { code: "invalid-field", field: "parameters.K" }],
    ["a non-number layout coordinate", (d) => (d.layout = { r: { x: "0", y: 0 } }), { code: "invalid-field", field: "layout.r.x" }],
    ["an expression that is not text", (d) => (block(d, "c").expr = 5), { code: "invalid-field", blockId: "c", field: "expr" }],
  ];
  it.each(cases)("%s", (_name, edit, expected) => {
    const { doc, problems } = loadDiagram(edited(edit));
    expect(doc).toBeUndefined();
    expect(problems).toContainEqual(expect.objectContaining({ severity: "error", ...expected }));
  });

  it("reports every schema problem at once", () => {
    const raw = edited((d) => {
      block(d, "e").signs = ["*"];
      delete d.wires[1].to;
      d.parameters.s = 1;
    });
    expect(loadDiagram(raw).problems.map((p) => p.field).sort()).toEqual(["parameters.s", "signs[0]", "to"]);
  });

  it("keeps unknown fields everywhere", () => {
    const raw = edited((d) => {
      d.theme = { grid: true };
      block(d, "c").color = "teal";
      d.wires[0].bend = [1, 2];
      d.parameters.tau = { value: 0.5, source: "bench test" };
      d.layout = { r: { x: 0, y: 0, pinned: true } };
    });
    const doc = loadDiagram(raw).doc as Record<string, unknown> & { blocks: object[]; wires: object[]; parameters: object; layout: object };
    expect(doc.theme).toEqual({ grid: true });
    expect(doc.blocks[2]).toMatchObject({ id: "c", color: "teal" });
    expect(doc.wires[0]).toMatchObject({ bend: [1, 2] });
    expect(doc.parameters).toMatchObject({ tau: { source: "bench test" } });
    expect(doc.layout).toEqual({ r: { x: 0, y: 0, pinned: true } });
  });

  it("fills in missing parameters as empty", () => {
    const { parameters: _p, ...raw } = exampleDiagram();
    raw.blocks = raw.blocks.filter((b) => b.type !== "transfer" && b.type !== "gain");
    expect(loadDiagram(raw).doc?.parameters).toEqual({});
  });
});
