#!/usr/bin/python3
"""Reference reduction of Loopwright diagram documents with sympy (Debian python3-sympy).

Independent of the TypeScript engine: it writes one linear equation per block and solves the system
exactly over QQ(s, parameters). Reads one JSON request on stdin, writes one JSON answer on stdout.

  {"mode": "reduce", "jobs": [{"id", "doc", "ours"?: {"transfers": [{"input", "output", "numerator",
      "denominator", "cancelled"?: [{"factor"}]}], "characteristic"}}]}
    -> {"results": [{"id", "transfers": [{"input", "output", "numerator", "denominator",
        "agrees"?, "lowestTerms"?, "monic"?, "cancelledAgrees"?}], "characteristic", "characteristicAgrees"?, "error"?}]}
  {"mode": "bench", "doc", "input", "output", "method"?: "rref" | "linsolve"}
    -> {"seconds", "numeratorDegree", "denominatorDegree"}

Exit code 3 with a message on stderr when sympy is not installed.
"""
import json
import sys
import time

try:
    import sympy
    from sympy import QQ, Symbol, cancel, expand, fraction, gcd, together
    from sympy.parsing.sympy_parser import convert_xor, parse_expr, rationalize, standard_transformations
    from sympy.polys.matrices import DomainMatrix
except ImportError:
    sys.stderr.write("python3-sympy is missing for /usr/bin/python3: install it with apt-get install -y python3-sympy\n")
    sys.exit(3)

# `^` is power; decimals become exact rationals (0.1 -> 1/10), as the diagram format defines them.
TRANSFORMS = standard_transformations + (convert_xor, rationalize)
S = Symbol("s")


def parse(text, names):
    """Parse diagram-syntax text; `names` maps every identifier to a plain Symbol (so E, I, N stay symbols)."""
    return parse_expr(text, local_dict=names, transformations=TRANSFORMS)


def block_factor(block, names):
    kind = block["type"]
    if kind in ("gain", "transfer"):
        return parse(block["expr"], names)
    if kind == "integrator":
        return 1 / S
    return sympy.Integer(1)


def system(doc):
    """Block equations d_b*x_b - n_b*sum(sign*x_src) = 0 (rows cleared of the block's denominator)."""
    params = sorted((doc.get("parameters") or {}).keys())
    names = {p: Symbol(p) for p in params}
    names["s"] = S
    ring = QQ[tuple([S] + [names[p] for p in params])]
    field = ring.get_field()
    blocks = doc["blocks"]
    inputs = [b["id"] for b in blocks if b["type"] == "input"]
    outputs = [b["id"] for b in blocks if b["type"] == "output"]
    unknowns = [b["id"] for b in blocks if b["type"] != "input"]
    col = {bid: i for i, bid in enumerate(unknowns)}
    rhs_col = {bid: i for i, bid in enumerate(inputs)}
    n = len(unknowns)
    rows = {i: {} for i in range(n)}
    rhs = {}
    dens = []
    for block in blocks:
        if block["type"] == "input":
            continue
        num, den = fraction(cancel(together(block_factor(block, names))))
        dens.append(den)
        r = col[block["id"]]
        n_b, d_b = field.from_sympy(num), field.from_sympy(den)
        rows[r][r] = rows[r].get(r, field.zero) + d_b
        signs = block.get("signs")
        for wire in doc["wires"]:
            if wire["to"] != block["id"]:
                continue
            sign = -1 if signs and signs[wire.get("port", 0)] == "-" else 1
            coeff = n_b * sign
            src = wire["from"]
            if src in col:
                c = col[src]
                rows[r][c] = rows[r].get(c, field.zero) - coeff
            else:
                rhs.setdefault(r, {})
                k = rhs_col[src]
                rhs[r][k] = rhs[r].get(k, field.zero) + coeff
    rows = {i: {j: v for j, v in row.items() if v != field.zero} for i, row in rows.items()}
    rows = {i: row for i, row in rows.items() if row}
    return {
        "names": names, "ring": ring, "field": field, "inputs": inputs, "outputs": outputs,
        "col": col, "n": n, "rows": rows, "rhs": rhs, "dens": dens,
    }


def solve(sys_, pairs):
    """Exact transfers {(input, output): FracElement} by sparse Gauss-Jordan on [M | B]."""
    n, field = sys_["n"], sys_["field"]
    wanted_inputs = sorted({sys_["inputs"].index(i) for i, _ in pairs})
    aug = {i: dict(row) for i, row in sys_["rows"].items()}
    for r, entries in sys_["rhs"].items():
        for k, v in entries.items():
            if k in wanted_inputs:
                aug.setdefault(r, {})[n + k] = v
    mat = DomainMatrix(aug, (n, n + len(sys_["inputs"])), field)
    reduced, pivots = mat.rref()
    if list(pivots[:n]) != list(range(n)) or any(p >= n for p in pivots):
        raise ValueError("the block equations are singular (ill-posed diagram)")
    rep = reduced.rep
    result = {}
    for inp, out in pairs:
        row = rep.get(sys_["col"][out], {})
        result[(inp, out)] = row.get(n + sys_["inputs"].index(inp), field.zero)
    return result


def characteristic(sys_):
    """det of the cleared system = Delta times the product of block denominators."""
    ring = sys_["ring"]
    n = sys_["n"]
    dense = [[ring.zero] * n for _ in range(n)]
    for i, row in sys_["rows"].items():
        for j, v in row.items():
            dense[i][j] = ring.from_sympy(v.as_expr())
    return ring.to_sympy(DomainMatrix(dense, (n, n), ring).det()) if n else sympy.Integer(1)


def text(expr):
    return str(expr).replace("**", "^")


def reduce_job(job):
    doc = job["doc"]
    sys_ = system(doc)
    pairs = [(i, o) for i in sys_["inputs"] for o in sys_["outputs"]]
    values = solve(sys_, pairs)
    chi = characteristic(sys_)
    ours = job.get("ours")
    ours_by_pair = {(t["input"], t["output"]): t for t in ours["transfers"]} if ours else {}
    out = {"id": job["id"], "transfers": [], "characteristic": text(expand(chi))}
    names = sys_["names"]
    for inp, outp in pairs:
        value = values[(inp, outp)]
        n_ref = sys_["ring"].to_sympy(value.numer)
        d_ref = sys_["ring"].to_sympy(value.denom)
        entry = {"input": inp, "output": outp, "numerator": text(n_ref), "denominator": text(d_ref)}
        mine = ours_by_pair.get((inp, outp))
        if ours is not None:
            if mine is None:
                entry["agrees"] = False
                entry["lowestTerms"] = False
            else:
                n_o, d_o = parse(mine["numerator"], names), parse(mine["denominator"], names)
                if not (n_o.is_polynomial() and d_o.is_polynomial()):  # a closed-form formula, not N/D
                    n_o, d_o = fraction(together(n_o / d_o))
                entry["agrees"] = bool(d_o != 0 and expand(n_o * d_ref - n_ref * d_o) == 0)
                entry["lowestTerms"] = bool(n_o == 0 or not gcd(n_o, d_o).has(S))
                if d_o.free_symbols <= {S}:  # numeric denominators are printed monic
                    entry["monic"] = bool(sympy.Poly(d_o, S).LC() == 1)
                if "cancelled" in mine:  # chi = D * (product of the cancelled factors) * constant
                    hidden = sympy.Mul(*[parse(c["factor"], names) for c in mine["cancelled"]])
                    rest = cancel(parse(ours["characteristic"], names) / (d_o * hidden))
                    entry["cancelledAgrees"] = bool(rest != 0 and not rest.has(S))
        out["transfers"].append(entry)
    if ours is not None:
        ratio = cancel(parse(ours["characteristic"], names) / chi) if chi != 0 else sympy.zoo
        out["characteristicAgrees"] = bool(ratio != 0 and ratio.is_finite is not False and not ratio.has(S))
    return out


def solve_linsolve(sys_, inp, out):
    """The same equations through sympy's plain public API: linsolve, then cancel to lowest terms."""
    n = sys_["n"]
    xs = sympy.symbols(f"x0:{n}")
    k = sys_["inputs"].index(inp)
    equations = []
    for i in range(n):
        lhs = sympy.Add(*[v.as_expr() * xs[j] for j, v in sys_["rows"].get(i, {}).items()])
        rhs = sys_["rhs"].get(i, {}).get(k)
        equations.append(lhs - (rhs.as_expr() if rhs is not None else 0))
    (values,) = sympy.linsolve(equations, xs)
    return fraction(cancel(values[sys_["col"][out]]))


def bench(request):
    """Time one pair, parsing included; method "rref" (sparse DomainMatrix) or "linsolve"."""
    start = time.perf_counter()
    sys_ = system(request["doc"])
    pair = (request["input"], request["output"])
    if request.get("method") == "linsolve":
        num, den = solve_linsolve(sys_, *pair)
    else:
        value = solve(sys_, [pair])[pair]
        num, den = sys_["ring"].to_sympy(value.numer), sys_["ring"].to_sympy(value.denom)
    seconds = time.perf_counter() - start
    degree = lambda p: sympy.Poly(p, S).degree()
    return {"seconds": seconds, "numeratorDegree": degree(num), "denominatorDegree": degree(den)}


def main():
    request = json.load(sys.stdin)
    if request.get("mode") == "bench":
        answer = bench(request)
    else:
        answer = {"results": []}
        for job in request["jobs"]:
            try:
                answer["results"].append(reduce_job(job))
            except Exception as exc:  # report per job so one bad diagram does not hide the others
                answer["results"].append({"id": job["id"], "error": f"{type(exc).__name__}: {exc}"})
    json.dump(answer, sys.stdout)


if __name__ == "__main__":
    main()
