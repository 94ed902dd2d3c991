// Light render checks without a DOM: the views rendered to static HTML, asserting on the words a user reads.
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { analyzeAt, type Analysis } from "@shared/analysis/analyze";
import { prepared } from "../../../../support/reduced";
import { rootLocus, stepOverlay } from "@shared/analysis/sweep";
import { wholeLocus } from "@shared/analysis/wholeLocus";
import { RouthView } from "@/features/editor/components/analysis/RouthView";
import { StabilityView } from "@/features/editor/components/analysis/StabilityView";
import { SteadyStateView } from "@/features/editor/components/analysis/SteadyStateView";
import { SweepView } from "@/features/editor/components/analysis/SweepView";
import { AnalysisHelp } from "@/features/editor/components/analysis/AnalysisHelp";
import { ImplementationView } from "@/features/editor/components/analysis/ImplementationView";
import { DEFAULT_IMPLEMENT_REQUEST, implementationView } from "@shared/implement/view";
import { reduced } from "../../../../support/reduced";
import { hiddenUnstableLoop, makeDoc, unityFeedback } from "../../../../support/docBuilder";



const open = (g: string) => makeDoc([{ id: "r", type: "input" }, { id: "g", type: "transfer", expr: g }, { id: "y", type: "output" }], ["r->g", "g->y"]);

/** Visible text: tags dropped, entities decoded, KaTeX's hidden MathML annotations left in (they are text too). */
const text = (html: string) =>
  html.replace(/<[^>]+>/g, " ").replace(/&lt;/g, "<").replace(/&gt;/g, ">").replace(/&#x27;|&apos;/g, "'").replace(/&quot;/g, '"').replace(/&amp;/g, "&").replace(/\s+/g, " ");

const headings = (html: string) => [...html.matchAll(/<h3[^>]*>([^<]*)<\/h3>/g)].map((m) => m[1]);

const nise = prepared(unityFeedback("K/(s*(s + 7)*(s + 11))", { K: { value: 100, min: 10, max: 3000 } }));
const niseAt100: Analysis = analyzeAt(nise);

describe("StabilityView", () => {
  it("K/(s(s+7)(s+11)) at K = 100: 'Stable', three poles, unit DC gain (from memory: Nise, Control Systems Engineering, Example 6.9)", () => {
    const html = renderToStaticMarkup(<StabilityView analysis={niseAt100} />);
    expect(headings(html)).toEqual(["Stable"]);
    expect(html).toContain('role="img" aria-label="Pole-zero map of T(s) in the s-plane"');
    expect(html).toContain("<caption");
    expect(html).toMatch(/<th scope="col"[^>]*>Multiplicity<\/th>/);
    expect(text(html)).toContain("T(0) = 1");
    expect(text(html)).toContain("T(s) has no finite zeros.");
    // three real poles or one real pole and a pair: 3 poles in all, drawn as 3 × markers
    expect(html.match(/<title>pole at/g)).toHaveLength(3);
  });

  it("an unstable pole cancelled by a zero: the alert names the hidden mode and the diagram verdict (common practice: unstable pole-zero cancellation)", () => {
    const doc = hiddenUnstableLoop();
    const html = renderToStaticMarkup(<StabilityView analysis={analyzeAt(prepared(doc))} />);
    expect(headings(html)).toEqual(["Stable"]);
    expect(html).toMatch(/<li role="alert"[^>]*>.*Unstable hidden mode/);
    expect(text(html)).toContain("The diagram is unstable, although T(s) is stable.");
  });

  it("1/(s² + 4): 'Marginally stable' with the pair ±2j (from memory: Ogata, Modern Control Engineering, undamped oscillator)", () => {
    const html = renderToStaticMarkup(<StabilityView analysis={analyzeAt(prepared(open("1/(s^2 + 4)")))} />);
    expect(headings(html)).toEqual(["Marginally stable"]);
    expect(text(html)).toContain("±2j");
  });
});

describe("RouthView", () => {
  it("states the stable range 0 < K < 1386 (from memory: Nise, Control Systems Engineering, Example 6.9)", () => {
    const html = renderToStaticMarkup(<RouthView analysis={niseAt100} />);
    expect(text(html)).toContain("0 < K < 1386");
    expect(html).toMatch(/<th scope="row"[^>]*>s<sup>3<\/sup><\/th>/);
    expect(html).toContain("First column");
    expect(html).not.toContain("sign change</span>");
  });

  it("s⁵ + 2s⁴ + 2s³ + 4s² + 11s + 10: ε row explained, two sign changes marked (from memory: Nise, Control Systems Engineering, Example 6.2)", () => {
    const html = renderToStaticMarkup(<RouthView analysis={analyzeAt(prepared(open("1/(s^5 + 2*s^4 + 2*s^3 + 4*s^2 + 11*s + 10)")))} />);
    expect(html.match(/sign change<\/span>/g)).toHaveLength(2);
    expect(text(html)).toContain("replaced by a small ε > 0");
    // the diagram option exists and is enabled for a diagram with a characteristic polynomial
    expect(html).not.toMatch(/<input[^>]*disabled/);
  });
});

describe("SteadyStateView", () => {
  it("type 1 loop at K = 100: Kv = 100/77, ramp error 77/100, step error 0, parabola error ∞ (from memory: Nise, Control Systems Engineering, Ch. 7 type-1 errors)", () => {
    const t = text(renderToStaticMarkup(<SteadyStateView analysis={niseAt100} />));
    expect(t).toContain("System type: 1");
    expect(t).toContain("100/77 ≈ 1.299");
    expect(t).toContain("77/100 ≈ 0.77");
    expect(t).toMatch(/Unit parabola r\(t\) = t²\/2 ∞/);
  });

  it("a parameter named Kp = 6 beside the error constants: the rows are named in words with word subscripts, never Kp/Kv/Ka (common practice: type-1 loop, infinite position constant)", () => {
    const withKp = analyzeAt(prepared(unityFeedback("Kp/(s*(s + 2))", { Kp: 6 })));
    const html = renderToStaticMarkup(<SteadyStateView analysis={withKp} />);
    const rowHeads = [...html.matchAll(/<th scope="row"[^>]*>(.*?)<\/th>/g)].map((m) => text(m[1]));
    const constants = rowHeads.filter((h) => h.includes("error constant"));
    expect(constants.map((h) => h.split(" K")[0])).toEqual(["Position error constant", "Velocity error constant", "Acceleration error constant"]);
    for (const [h, sub] of constants.map((h, i) => [h, ["pos", "vel", "acc"][i]] as const)) {
      expect(h).toContain(`K_{\\mathrm{${sub}}}`);
      expect(h).not.toMatch(/\bK[pva]\b/);
    }
    // Kv = lim s·L(s) = 6/2 = 3; the position constant is infinite for a type-1 loop.
    expect(text(html)).toContain("The velocity error constant K_vel = lim s→0 s·L(s).");
    expect(text(html)).toContain("The position error constant K_pos is infinite (type 1 loop).");
  });

  it("an unstable pair without a loop: no final value (FVT refused) and no constants (common practice: final value theorem conditions)", () => {
    const t = text(renderToStaticMarkup(<SteadyStateView analysis={analyzeAt(prepared(open("1/(s - 1)")))} />));
    expect(t).toContain("the final value theorem does not apply");
    expect(t).toContain("There is no loop gain for this pair");
    expect(t).not.toMatch(/Final value of the step response\s+</);
  });
});

describe("AnalysisHelp", () => {
  it("the Definitions name the three error constants in words and say why their symbols carry word subscripts", () => {
    const t = text(renderToStaticMarkup(<AnalysisHelp />));
    for (const name of ["position error constant", "velocity error constant", "acceleration error constant"]) expect(t).toContain(`the ${name}`);
    expect(t).toContain("so that none is read as a parameter of the diagram");
    expect(t).toContain("K_{\\mathrm{acc}} = \\lim_{s\\to 0} s^2 L(s)");
  });

  it("the Definitions say what each discretisation method is and what the minimal realisation means", () => {
    const t = text(renderToStaticMarkup(<AnalysisHelp />));
    for (const words of ["Tustin (bilinear): s = (2/Ts)·(z − 1)/(z + 1)", "Zero-order hold", "Matched pole-zero", "z = e^(s·Ts)", "Nyquist frequency π/Ts"]) expect(t).toContain(words);
    expect(t).toContain("Minimal : a realisation of the least possible order n");
    expect(t).toContain("balanced realisation");
  });
});

describe("ImplementationView", () => {
  const loop = unityFeedback("2*(s + 1)/(s*(s + 3))");
  const render = (block: string | null, ts: number) => {
    const request = { ...DEFAULT_IMPLEMENT_REQUEST, block, ts };
    const view = implementationView(reduced(loop), request, { input: "r", output: "y", bandwidth: 2, values: {} });
    return text(renderToStaticMarkup(<ImplementationView view={view} request={request} pair="r → y" onRequest={() => {}} />));
  };

  it("shows H(z⁻¹), the coefficients to 17 digits, the listings with copy buttons and the matrices with downloads", () => {
    // By hand with s = 200(z − 1)/(z + 1): G = 2(s + 1)/(s(s + 3)) → 2(201z − 199)(z + 1)/(200(z − 1)(203z − 197)),
    // so b0 = 402/40600 and a1 = −(200·197 + 200·203)/40600 = −80000/40600.
    const t = render("g", 0.01);
    expect(t).toContain("Discrete equivalent: Tustin (bilinear), Ts = 0.01 s");
    const row = /power of z⁻¹ numerator b denominator a 0 (\S+) 1\.0000000000000000 1 \S+ (\S+)/.exec(t);
    expect(Math.abs(Number(row?.[1]) - 402 / 40600)).toBeLessThan(1e-18);
    expect(Math.abs(Number(row?.[2]) + 80000 / 40600)).toBeLessThan(1e-15);
    for (const words of ["Copy difference equation", "Copy C code", "double g_step(double u)", "Download matrices (CSV)", "Download matrices (JSON)", "The controllable canonical form, order 2."]) expect(t).toContain(words);
    expect(t).toContain("2π/Ts is 314 times the closed-loop bandwidth 2 rad/s of r → y");
  });

  it("warns about a long Ts against the bandwidth, and refuses what cannot be done in words", () => {
    expect(render("g", 1)).toContain("Ts = 1 s is too large for the loop");
    expect(render("e", 0.01)).toContain('The summing junction "e" has no transfer of its own to implement');
  });
});

describe("SweepView", () => {
  it("asks for a parameter when there is none", () => {
    expect(text(renderToStaticMarkup(<SweepView sweep={null} analysis={niseAt100} negative={false} onNegative={() => {}} />))).toContain("No parameters to sweep: add one in the parameter table.");
  });

  it("draws three locus branches and one legend entry per overlay value (a third-order loop has three branches: common practice)", () => {
    const range: [number, number] = [10, 3000];
    const values = [10, 100, 1000, 3000];
    const sweep = { parameter: "K", range, locus: rootLocus(nise, "K", range, 60), negativeLocus: null, geometry: null, locusNote: null, overlay: stepOverlay(nise, "K", values, 5), current: 100 };
    const html = renderToStaticMarkup(<SweepView sweep={sweep} analysis={niseAt100} negative={false} onNegative={() => {}} />);
    expect(html.match(/<path d="M[^"]*" fill="none"/g)).toHaveLength(3);
    expect(text(html)).toMatch(/K = 10 .*K = 100 .*K = 1000 .*K = 3000 /);
    expect(html.match(/<th scope="row"[^>]*>\d<\/th>/g)).toHaveLength(3);
  });

  it("lists the landmarks of K/(s(s+1)(s+2)): centroid −1, ±60° and 180°, crossing ±√2 j at K = 6 (from memory: the textbook example)", () => {
    const p = prepared(unityFeedback("K/(s*(s+1)*(s+2))", { K: { value: 1, min: 0.5, max: 3 } }));
    const range: [number, number] = [0.5, 3];
    const whole = wholeLocus(p, "K", range, { n: 40, base: p.nominal });
    const sweep = { parameter: "K", range, locus: whole.positive, negativeLocus: whole.negative, geometry: whole.geometry, locusNote: whole.note, overlay: stepOverlay(p, "K", [0.5, 3], 5), current: 1 };
    const t = text(renderToStaticMarkup(<SweepView sweep={sweep} analysis={analyzeAt(p)} negative={false} onNegative={() => {}} />));
    expect(t).toContain("Include negative gains");
    expect(t).toContain("Locus landmarks");
    expect(t).toContain("Centroid of the asymptotes s = −1");
    expect(t).toContain("Asymptote angles −60°, 60°, 180° K > 0");
    expect(t).toContain("Imaginary-axis crossing ω = ±√2 ≈ 1.414 K = 6");
    expect(t).toContain("Breakaway point s = −1 + √3/3 ≈ −0.4226");
    // Negative gains are left out until asked for.
    expect(t).not.toContain("K < 0");
  });
});
