import { compile, complex, type EvalFunction } from "mathjs";
import type { Complex } from "./complex";

/**
 * Numeric evaluation of diagram-syntax text with mathjs — independent of our parser and algebra.
 * Parameters are passed by name; `s` is complex. mathjs looks names up in the scope before its own
 * constants, so a parameter called `e` or `i` stays a parameter.
 */
export type ParamValues = Record<string, number>;

const cache = new Map<string, EvalFunction>();

export function evalExpr(text: string, s: Complex, params: ParamValues): Complex {
  let fn = cache.get(text);
  if (!fn) {
    if (cache.size > 5000) cache.clear(); // result strings are many and long: keep memory flat
    fn = compile(text);
    cache.set(text, fn);
  }
  const value: unknown = fn.evaluate({ ...params, s: complex(s.re, s.im) });
  if (typeof value === "number") return { re: value, im: 0 };
  if (value && typeof value === "object" && "re" in value && "im" in value) {
    return { re: Number(value.re), im: Number(value.im) };
  }
  throw new TypeError(`mathjs evaluated "${text}" to a non-number`);
}
