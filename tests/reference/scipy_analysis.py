"""Reference values for the analysis tests from Debian's python3-scipy and python3-numpy.

Reads one JSON request on stdin: {"systems": [{"id", "num", "den", "t", "w", "rootsOnly"?}]} with polynomial
coefficients in DESCENDING powers of s, and prints one JSON answer: per system the roots of num and den
(numpy.roots), the unit step and unit impulse responses at the times t (scipy.signal.step / impulse on the
transfer function, which simulate the state-space realisation exactly with matrix exponentials) and the
frequency response at w (scipy.signal.freqresp) as [re, im] pairs. Exit 3 with an install hint when scipy
or numpy is missing, so the tests fail instead of passing without a reference.
"""
import json
import sys

try:
    import numpy as np
    from scipy import signal
except ImportError:
    sys.stderr.write(
        "python3-scipy and python3-numpy are required for the reference checks: "
        "apt-get install -y python3-scipy python3-numpy\n"
    )
    sys.exit(3)


def pairs(values):
    return [[float(np.real(v)), float(np.imag(v))] for v in values]


def answer(system):
    num = np.array(system["num"], dtype=float)
    den = np.array(system["den"], dtype=float)
    t = np.array(system["t"], dtype=float)
    out = {"id": system["id"], "denRoots": pairs(np.roots(den)), "numRoots": pairs(np.roots(num))}
    if len(num) <= len(den) and not system.get("rootsOnly"):
        lti = signal.lti(num, den)
        _, y_step = signal.step(lti, T=t)
        out["step"] = [float(v) for v in y_step]
        if len(num) < len(den):
            _, y_imp = signal.impulse(lti, T=t)
            out["impulse"] = [float(v) for v in y_imp]
        _, h = signal.freqresp(lti, w=np.array(system["w"], dtype=float))
        out["freq"] = pairs(h)
    return out


def main():
    request = json.load(sys.stdin)
    print(json.dumps({"results": [answer(s) for s in request["systems"]], "scipy": __import__("scipy").__version__}))


if __name__ == "__main__":
    main()
