import { describe, expect, it } from "vitest";
import { reductionResultSchema } from "@shared/reduce/result";
import { cClose, cx } from "../support/complex";
import { makeDoc } from "../support/docBuilder";
import { evalExpr } from "../support/evalExpr";
import { evalTransfer } from "../support/ours";
import { runCli, SPAWN_TIMEOUT, tempFiles } from "../support/cliRun";
import { sympyReduce } from "../support/sympy";

// The reduce command reads block expressions with the editor's syntax, implicit products included: the same loop
// written with and without `*` must reduce to the same transfer, and that transfer must be the exact closed loop.
const reduce = (...args: string[]) => runCli("reduce", ...args);
const { file } = tempFiles("loopwright-cli-implicit-");

/** A PI-like controller, a two-pole plant and a lagged sensor, each written two ways. */
const EXPRESSIONS = {
  c: { implicit: "K(s+a)/s", explicit: "K*(s+a)/s" },
  p: { implicit: "2/((s+1)(s+3))", explicit: "2/((s+1)*(s+3))" },
  h: { implicit: "10(s+1)/(0.5s^2 + 10(s+1))", explicit: "10*(s+1)/(0.5*s^2 + 10*(s+1))" },
} as const;
const PARAMETERS = { K: 3, a: 0.5 };

const loop = (written: "implicit" | "explicit") =>
  makeDoc(
    [
      { id: "r", type: "input" },
      { id: "e", type: "sum", signs: ["+", "-"] },
      { id: "c", type: "transfer", expr: EXPRESSIONS.c[written] },
      { id: "p", type: "transfer", expr: EXPRESSIONS.p[written] },
      { id: "h", type: "transfer", expr: EXPRESSIONS.h[written] },
      { id: "y", type: "output" },
    ],
    ["r->e:0", "e->c", "c->p", "p->y", "p->h", "h->e:1"],
    PARAMETERS,
    `Implicit products (${written})`,
  );

describe("reduce CLI: implicit multiplication as in the editor", { timeout: SPAWN_TIMEOUT }, () => {
  it("accepts K(s+a), (s+1)(s+3), 10(s+1) and 0.5s^2 and prints the same result as the explicit spelling", async () => {
    const implicit = await reduce(file("implicit.json", loop("implicit")), "--json");
    expect(implicit.stderr).toBe("");
    expect(implicit.code).toBe(0);
    const explicit = await reduce(file("explicit.json", loop("explicit")), "--json");
    expect(explicit.code).toBe(0);
    const [a, b] = [implicit, explicit].map((run) => reductionResultSchema.parse(JSON.parse(run.stdout)));
    expect(a.transfers).toEqual(b.transfers);
    expect(a.characteristic).toEqual(b.characteristic);
  });

  it("its closed loop is exactly sympy's for the explicit spelling, and G/(1 + G·H) at sample points (common practice)", async () => {
    const run = await reduce(file("implicit-ref.json", loop("implicit")), "--json");
    expect(run.code).toBe(0);
    const result = reductionResultSchema.parse(JSON.parse(run.stdout));
    const [t] = result.transfers;
    expect([t.input, t.output]).toEqual(["r", "y"]);

    // Debian's python3-sympy solves the explicit document's block equations on its own parser.
    const [ref] = await sympyReduce([
      {
        id: "implicit-products",
        doc: loop("explicit"),
        ours: { transfers: [{ input: t.input, output: t.output, numerator: t.numerator, denominator: t.denominator }], characteristic: result.characteristic },
      },
    ]);
    expect(ref.error).toBeUndefined();
    expect(ref.transfers[0].agrees).toBe(true);
    expect(ref.characteristicAgrees).toBe(true);

    const { c, p, h } = EXPRESSIONS;
    const closed = `(${c.explicit})*(${p.explicit})/(1 + (${c.explicit})*(${p.explicit})*(${h.explicit}))`;
    for (const s of [cx(0.4, 1.3), cx(-2.5, 0.7)]) expect(cClose(evalTransfer(t, s, PARAMETERS), evalExpr(closed, s, PARAMETERS), 1e-10)).toBe(true);
  });
});
