import { runPythonSync } from "../../support/python";

/** Debian's sympy as an outside reference. One call per batch: the script reads JSON on stdin and prints JSON. */
export const runPython = <T>(script: string, input: unknown): T => runPythonSync<T>({ code: script }, input);

/** Exact values "p/q" of expression strings at rational points, computed by sympy. */
export const SYMPY_EXACT_VALUES = `
import json, sys
from sympy import Rational, Symbol
from sympy.parsing.sympy_parser import parse_expr, standard_transformations, convert_xor, rationalize
tr = standard_transformations + (convert_xor, rationalize)
out = []
for case in json.load(sys.stdin):
    names = {n: Symbol(n) for n in case["values"]}
    e = parse_expr(case["text"], local_dict=names, transformations=tr, evaluate=True)
    v = e.subs({names[n]: Rational(p, q) for n, (p, q) in case["values"].items()})
    v = Rational(v)
    out.append(str(v.p) if v.q == 1 else f"{v.p}/{v.q}")
print(json.dumps(out))
`;
