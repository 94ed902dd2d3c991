"""Reference time response of a diagram with dead times: a fine-step simulation of the block diagram itself
(not of its closed-loop expression). Each transfer block becomes a state-space model (scipy.signal.tf2ss); the
states are integrated with the classical fourth-order Runge-Kutta method at a fixed step h; each dead time reads
the recorded history of its input (linear between steps, zero before t = 0); sums, pickoff points and gains are
evaluated at every stage in dependency order.

stdin: {"doc": diagram document, "values": {name: number}, "input": id, "output": id, "signal": "step"|"ramp",
        "tEnd": s, "h": s, "times": [s, ...]}
stdout: {"y": [y at each of times]}
"""
import json
import sys

try:
    import numpy as np
    import sympy
    from scipy.signal import tf2ss
except ImportError as e:  # the runner names the Debian package
    print(str(e), file=sys.stderr)
    sys.exit(3)


def transfer_of(expr, values):
    s = sympy.Symbol("s")
    names = {k: sympy.Rational(str(v)) for k, v in values.items()}
    e = sympy.sympify(expr, locals={"s": s, **{k: sympy.Symbol(k) for k in values}}).subs(names)
    num, den = sympy.fraction(sympy.together(e))
    return [float(c) for c in sympy.Poly(num, s).all_coeffs()], [float(c) for c in sympy.Poly(den, s).all_coeffs()]


def main():
    job = json.load(sys.stdin)
    doc, h = job["doc"], job["h"]
    nominal = {k: (v if isinstance(v, (int, float)) else v["value"]) for k, v in doc.get("parameters", {}).items()}
    values = {**nominal, **job["values"]}
    blocks = {b["id"]: b for b in doc["blocks"]}
    into = {b: [] for b in blocks}
    for w in doc["wires"]:
        into[w["to"]].append(w)
    models, delays = {}, {}
    subs = lambda e: float(sympy.sympify(e).subs({k: sympy.Rational(str(v)) for k, v in values.items()}))
    for b in blocks.values():
        t = b["type"]
        if t in ("transfer", "integrator"):
            num, den = transfer_of(b["expr"] if t == "transfer" else "1/s", values)
            a, bb, c, d = tf2ss(num, den)
            models[b["id"]] = (a, bb[:, 0], c[0, :], float(d[0, 0]) if d.size else 0.0)
        elif t == "delay":
            delays[b["id"]] = subs(b["expr"])
    gains = {b["id"]: subs(b["expr"]) for b in blocks.values() if b["type"] == "gain"}
    steps = int(round(job["tEnd"] / h))
    # Each dead time's input at the grid points, as left and right limits: a step (and, in a loop whose gain has
    # a direct path through a delay, its echoes) jumps exactly at grid points, and RK4's last stage must see the
    # value before the jump, its first stage the value after it.
    left = {bid: np.zeros(steps + 1) for bid in delays}
    right = {bid: np.zeros(steps + 1) for bid in delays}

    def network(t, X, side):
        """Every block's output at time t with states X; side says which limit to take at a jump."""
        out = {}

        def value_in(bid):
            blk = blocks[bid]
            total = 0.0
            for w in into[bid]:
                sign = -1.0 if blk["type"] == "sum" and blk["signs"][w.get("port", 0)] == "-" else 1.0
                total += sign * output(w["from"])
            return total

        def delayed(bid):
            pos = (t - delays[bid]) / h
            i = round(pos)
            if abs(pos - i) < 1e-7:
                return 0.0 if i < 0 else (left if side == "left" else right)[bid][i]
            i = int(np.floor(pos))
            if i < -1:
                return 0.0
            f = pos - i
            return (1 - f) * (right[bid][i] if i >= 0 else 0.0) + f * left[bid][i + 1]

        def output(bid):
            if bid in out:
                return out[bid]
            blk = blocks[bid]
            kind = blk["type"]
            if kind == "input":
                on = t > 0 or (t == 0 and side == "right")
                v = ((1.0 if job["signal"] == "step" else t) if on else 0.0) if bid == job["input"] else 0.0
            elif kind in ("transfer", "integrator"):
                a, bb, c, d = models[bid]
                v = float(c @ X[bid]) + (d * value_in(bid) if d != 0 else 0.0)
            elif kind == "delay":
                v = delayed(bid)
            elif kind == "gain":
                v = gains[bid] * value_in(bid)
            else:  # sum, branch, output
                v = value_in(bid)
            out[bid] = v
            return v

        return output, value_in

    def deriv(t, X, side):
        _, value_in = network(t, X, side)
        return {bid: m[0] @ X[bid] + m[1] * value_in(bid) for bid, m in models.items()}

    X = {bid: np.zeros(m[0].shape[0]) for bid, m in models.items()}
    ys = np.zeros(steps + 1)
    for k in range(steps + 1):
        t = k * h
        for side, record in (("left", left), ("right", right)):
            output, value_in = network(t, X, side)
            for bid in delays:
                record[bid][k] = value_in(bid)
        ys[k] = network(t, X, "right")[0](job["output"])
        if k == steps:
            break
        add = lambda Y, D, f: {b: Y[b] + f * D[b] for b in Y}
        k1 = deriv(t, X, "right")
        k2 = deriv(t + h / 2, add(X, k1, h / 2), "right")
        k3 = deriv(t + h / 2, add(X, k2, h / 2), "right")
        k4 = deriv(t + h, add(X, k3, h), "left")
        X = {b: X[b] + h / 6 * (k1[b] + 2 * k2[b] + 2 * k3[b] + k4[b]) for b in X}
    print(json.dumps({"y": [float(np.interp(t, np.arange(steps + 1) * h, ys)) for t in job["times"]]}))


main()
