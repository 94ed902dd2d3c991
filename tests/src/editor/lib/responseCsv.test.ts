import { describe, expect, it } from "vitest";
import { runPythonSync } from "../../../support/python";
import { sampleResponse } from "@shared/analysis/stepMetrics";
import { timeResponse } from "@shared/analysis/timeResponse";
import { upInts } from "@shared/analysis/upoly";
import { responseCsv, responseCsvName } from "@/features/editor/lib/responseCsv";

/** Runs a script with Debian's Python (`/usr/bin/python3`, which has scipy) on a JSON input; returns its JSON output. */
function python<T>(script: string, input: unknown): T {
  return runPythonSync<T>({ code: script }, input);
}

/** Python's csv reader on the text: header, row widths and whether every field parses back to the exact double. */
const READ_BACK = `
import csv, io, json, sys
data = json.load(sys.stdin)
rows = list(csv.reader(io.StringIO(data["csv"], newline="")))
body = rows[1:]
print(json.dumps({
  "header": rows[0],
  "widths": sorted(set(len(r) for r in body)),
  "exact": [float(r[0]) == s[0] and float(r[1]) == s[1] for r, s in zip(body, data["samples"])],
  "rows": len(body),
}))
`;

describe("response CSV", () => {
  it("has a t,y header and one row per sample that Python's csv module reads back to the same doubles", () => {
    // common practice: RFC 4180 §2 — a header line, fields split by commas, one record a line.
    const samples: [number, number][] = [[0, 0], [0.1 + 0.2, 1 / 3], [1e-20, -3.5e300], [123456789.123, -0], [2 ** -1074, 1 - 2 ** -53]];
    const csv = responseCsv(samples);
    const read = python<{ header: string[]; widths: number[]; exact: boolean[]; rows: number }>(READ_BACK, { csv, samples });
    expect(read.header).toEqual(["t", "y"]);
    expect(read.rows).toBe(samples.length);
    expect(read.widths).toEqual([2]);
    expect(read.exact).toEqual(samples.map(() => true));
    expect(csv.endsWith("\n")).toBe(true);
  });

  it("carries the plotted step response of a lightly damped pair as scipy.signal.step computes it", () => {
    // T = 4/(s^2 + 0.8 s + 4): ζ = 0.2, ωn = 2. Reference: scipy.signal.step (Debian python3-scipy) on the CSV's own times.
    const step = timeResponse(upInts([20]), upInts([20, 4, 5]), "step");
    const csv = responseCsv(sampleResponse(step, 15, 400));
    const worst = python<number>(
      `
import csv, io, json, sys
from scipy import signal
rows = list(csv.reader(io.StringIO(json.load(sys.stdin), newline="")))[1:]
t = [float(a) for a, _ in rows]
y = [float(b) for _, b in rows]
_, ref = signal.step(([20.0], [5.0, 4.0, 20.0]), T=t)
print(json.dumps(max(abs(a - b) for a, b in zip(y, ref))))
`,
      csv,
    );
    expect(csv.split("\n").length - 2).toBe(401);
    expect(worst).toBeLessThan(1e-9);
  });

  it("carries the impulse response of a repeated pole as the Laplace table gives it", () => {
    // Abramowitz & Stegun §29.3: 1/(s + a)^2 ↔ t·e^{−at}; here a = 3, checked in Python's math on the CSV rows.
    const impulse = timeResponse(upInts([1]), upInts([9, 6, 1]), "impulse");
    const csv = responseCsv(sampleResponse(impulse, 4, 200));
    const worst = python<number>(
      `
import csv, io, json, math, sys
rows = list(csv.reader(io.StringIO(json.load(sys.stdin), newline="")))[1:]
print(json.dumps(max(abs(float(y) - float(t) * math.exp(-3 * float(t))) for t, y in rows)))
`,
      csv,
    );
    expect(worst).toBeLessThan(1e-14);
  });

  it("names the file after the input and the pair, in portable characters only", () => {
    // common practice: the POSIX portable filename character set (IEEE Std 1003.1, §3.282).
    expect(responseCsvName("step", "r", "y")).toBe("step-response-r-to-y.csv");
    expect(responseCsvName("ramp", "set point", "y/out")).toBe("ramp-response-set_point-to-y_out.csv");
    const odd = responseCsvName("impulse", "Sollwert→Ü", "a\\b:c*d?\"e<f>|");
    expect(odd).toMatch(/^[A-Za-z0-9._-]+$/);
    expect(odd.startsWith("impulse-response-Sollwert_-to-a_b_c_d_e_f_")).toBe(true);
  });
});
