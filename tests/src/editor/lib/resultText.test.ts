import { describe, expect, it } from "vitest";
import { reduceDocument } from "@shared/reduce/reduceDiagram";
import { resultLatex, resultPlainText, transferText } from "@/features/editor/lib/resultText";
import { sympyEqual, unityLoop } from "../support";

describe("result as text", () => {
  it("writes numerator/denominator with just the parentheses the syntax needs (checked with sympy)", () => {
    const cases = [
      { numerator: "K", denominator: "s^2 + 2*s + K" },
      { numerator: "2*K", denominator: "s^2 + 2*s + 2*K" },
      { numerator: "K*s + 2*K", denominator: "s^3" },
      { numerator: "-K", denominator: "2*s" },
      { numerator: "1/2*K", denominator: "s - 1/3" },
    ];
    const texts = cases.map(transferText);
    expect(texts.slice(0, 3)).toEqual(["K/(s^2 + 2*s + K)", "2*K/(s^2 + 2*s + 2*K)", "(K*s + 2*K)/s^3"]);
    // sympy reads our text and the explicit (num)/(den) as the same rational function.
    expect(sympyEqual(cases.map((c, i) => [texts[i], `(${c.numerator})/(${c.denominator})`]))).toEqual(cases.map(() => true));
    expect(transferText({ numerator: "s + 1", denominator: "1" })).toBe("s + 1");
  });

  it("copies the closed loop of unity feedback as text and as an aligned LaTeX block", () => {
    const r = reduceDocument(unityLoop());
    if (!r.ok) throw new Error("the reducer refused the loop");
    const t = r.result.transfers[0];
    // from memory: Ogata, Modern Control Engineering — G/(1+G) with G = K/(s(s+2)).
    expect(resultPlainText(t, r.result.characteristic)).toBe("T_y_r(s) = K/(s^2 + 2*s + K)\nCharacteristic polynomial: s^2 + 2*s + K");
    expect(resultLatex(t, r.result.characteristicLatex)).toContain("&= \\frac{K}{s^{2} + 2\\,s + K}");
  });
});
