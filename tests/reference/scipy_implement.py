"""Reference values for the implementation tests from Debian's python3-scipy and python3-numpy.

Reads one JSON request on stdin: {"cases": [{"id", "num", "den", "ts", "prewarp", "realisations", "w"}]} with
coefficients in DESCENDING powers of s, and prints one JSON answer per case:
- "tustin": scipy.signal.cont2discrete((num, den), ts, method="bilinear") (an improper transfer, which
  cont2discrete refuses: scipy.signal.bilinear(num, den, fs=1/ts));
- "prewarp": scipy.signal.bilinear(num, den, fs) with fs = w / (2 tan(w ts / 2)), the pre-warped substitution
  s = (w / tan(w ts / 2)) (z - 1)/(z + 1) written as scipy's s = 2 fs (z - 1)/(z + 1);
- "zoh": scipy.signal.cont2discrete((num, den), ts, method="zoh") (proper transfers only);
- "tf2ss": scipy.signal.tf2ss(num, den) (proper only);
- "ss2tf": scipy.signal.ss2tf of each given realisation {A, B, C, D};
- "gramians": scipy.linalg.solve_continuous_lyapunov for the controllability and observability Gramians of
  each given realisation named "minimal" when it is stable;
- "freqz": scipy.signal.freqz of each given discrete transfer {numerator, denominator (powers of z^-1), w}
  at the normalised frequencies w*ts;
- "precise": the same substitutions in exact rational arithmetic (sympy: Tustin with c = 2/ts, pre-warped
  with c the given double as a rational) and the zero-order hold in 50-digit arithmetic (mpmath.expm of the
  augmented controllable canonical form, sympy charpoly), from the exact coefficients "numExact"/"denExact"
  (strings "p/q", descending) and "tsExact", for checking our results to the last bits.
Each discrete transfer is returned as {"num", "den"} in descending powers of z, den[0] = 1. Exit 3 with an
install hint when scipy or numpy is missing, so the tests fail instead of passing without a reference.
"""
import json
import math
import sys

try:
    import mpmath as mp
    import numpy as np
    import sympy as sp
    from scipy import linalg, signal
except ImportError:
    sys.stderr.write(
        "python3-scipy, python3-numpy and python3-sympy are required for the reference checks: "
        "apt-get install -y python3-scipy python3-numpy python3-sympy\n"
    )
    sys.exit(3)

Z = sp.Symbol("z")


def exact_bilinear(num, den, c):
    """num(c (z-1)/(z+1)) (z+1)^n over the same for den, monic, as floats (descending)."""
    n = max(len(num), len(den)) - 1

    def mapped(p):
        deg = len(p) - 1
        return sp.expand(sum(a * c ** (deg - i) * (Z - 1) ** (deg - i) * (Z + 1) ** (n - deg + i) for i, a in enumerate(p)))

    nz, dz = sp.Poly(mapped(num), Z), sp.Poly(mapped(den), Z)
    lead = dz.LC()
    return {"num": [float(x / lead) for x in nz.all_coeffs()], "den": [float(x / lead) for x in dz.all_coeffs()]}


def precise_zoh(num, den, ts):
    """ZOH in 50 digits: controllable canonical form (den monic), expm of [[A, B], [0, 0]] ts, ss to tf."""
    mp.mp.dps = 50
    n = len(den) - 1
    num = [sp.Integer(0)] * (n + 1 - len(num)) + num
    d = num[0]
    c = [num[i] - d * den[i] for i in range(1, n + 1)]
    m = mp.zeros(n + 1, n + 1)
    for j in range(n):
        m[0, j] = -mp.mpf(den[j + 1].p) / den[j + 1].q * mp.mpf(ts.p) / ts.q
    for i in range(1, n):
        m[i, i - 1] = mp.mpf(ts.p) / ts.q
    m[0, n] = mp.mpf(ts.p) / ts.q
    e = mp.expm(m)
    phi = sp.Matrix(n, n, lambda i, j: sp.Float(e[i, j], 50))
    gamma = sp.Matrix(n, 1, lambda i, j: sp.Float(e[i, n], 50))
    cm = sp.Matrix(1, n, lambda i, j: sp.Float(sp.N(c[j], 50), 50))
    dc = phi.charpoly(Z).all_coeffs()
    nc = [a - b + d * b for a, b in zip((phi - gamma * cm).charpoly(Z).all_coeffs(), dc)]
    return {"num": trimmed([float(x) for x in nc]), "den": [float(x) for x in dc]}


def precise(case):
    num = [sp.Rational(x) for x in case["numExact"]]
    den = [sp.Rational(x) for x in case["denExact"]]
    ts = sp.Rational(case["tsExact"])
    out = {"tustin": exact_bilinear(num, den, 2 / ts)}
    if case.get("prewarpC") is not None:
        out["prewarp"] = exact_bilinear(num, den, sp.Rational(repr(case["prewarpC"])))
    if len(num) <= len(den) and len(den) > 1:
        out["zoh"] = precise_zoh(num, den, ts)
    return out


def trimmed(c):
    c = np.atleast_1d(np.asarray(c, dtype=float).squeeze())
    nz = np.nonzero(c)[0]
    return [float(x) for x in (c[nz[0]:] if len(nz) else [0.0])]


def normalised(num, den):
    num = np.atleast_1d(np.asarray(num, dtype=float).squeeze())
    den = np.atleast_1d(np.asarray(den, dtype=float).squeeze())
    return {"num": trimmed(num / den[0]), "den": trimmed(den / den[0])}


def matrices(ss):
    return [np.array(ss[k], dtype=float).reshape(shape) for k, shape in
            (("A", (len(ss["A"]), len(ss["A"]))), ("B", (len(ss["A"]), 1)), ("C", (1, len(ss["A"]))), ("D", (1, 1)))]


def answer(case):
    num, den, ts = case["num"], case["den"], case["ts"]
    proper = len(num) <= len(den)
    out = {"id": case["id"]}
    if proper:
        b, a, _ = signal.cont2discrete((num, den), ts, method="bilinear")
    else:
        b, a = signal.bilinear(num, den, fs=1 / ts)
    out["tustin"] = normalised(b, a)
    w = case.get("prewarp")
    if w is not None:
        b, a = signal.bilinear(num, den, fs=w / (2 * math.tan(w * ts / 2)))
        out["prewarp"] = normalised(b, a)
    if proper:
        b, a, _ = signal.cont2discrete((num, den), ts, method="zoh")
        out["zoh"] = normalised(b, a)
        A, B, C, D = signal.tf2ss(num, den)
        out["tf2ss"] = {"A": A.tolist(), "B": B.tolist(), "C": C.tolist(), "D": D.tolist()}
    out["ss2tf"] = {}
    out["gramians"] = {}
    for name, ss in case.get("realisations", {}).items():
        A, B, C, D = matrices(ss)
        if A.shape[0] == 0:
            out["ss2tf"][name] = {"num": [float(D[0, 0])], "den": [1.0]}
            continue
        b, a = signal.ss2tf(A, B, C, D)
        out["ss2tf"][name] = normalised(b, a)
        if name == "minimal" and np.all(np.linalg.eigvals(A).real < 0):
            wc = linalg.solve_continuous_lyapunov(A, -B @ B.T)
            wo = linalg.solve_continuous_lyapunov(A.T, -C.T @ C)
            out["gramians"][name] = {"wc": wc.tolist(), "wo": wo.tolist()}
    out["freqz"] = {}
    for name, tf in case.get("discrete", {}).items():
        _, h = signal.freqz(tf["numerator"], tf["denominator"], worN=np.array(tf["w"], dtype=float) * ts)
        out["freqz"][name] = [[float(v.real), float(v.imag)] for v in h]
    out["precise"] = precise(case)
    return out


def main():
    request = json.load(sys.stdin)
    print(json.dumps({"results": [answer(c) for c in request["cases"]], "scipy": __import__("scipy").__version__}))


if __name__ == "__main__":
    main()
