import { describe, expect, it } from "vitest";
import { capital, counted, plural, withArticle } from "@shared/text/words";

// English number agreement and articles (common practice).
describe("plural and counted", () => {
  it.each([
    [0, "pole", undefined, "0 poles"],
    [1, "pole", undefined, "1 pole"],
    [2, "pole", undefined, "2 poles"],
    [1, "branch", "branches", "1 branch"],
    [3, "branch", "branches", "3 branches"],
    [1, "sign change", undefined, "1 sign change"],
    [12, "sign change", undefined, "12 sign changes"],
  ])("counted(%i, %s, %s) is %s", (n, one, many, expected) => {
    expect(counted(n, one, many)).toBe(expected);
  });

  it("plural gives the word alone, with an irregular plural when given", () => {
    expect(plural(1, "it", "them")).toBe("it");
    expect(plural(2, "it", "them")).toBe("them");
    expect(plural(5, "root")).toBe("roots");
  });
});

describe("withArticle and capital", () => {
  it.each([
    ["input", "an input"],
    ["output", "an output"],
    ["integrator", "an integrator"],
    ["pickoff point", "a pickoff point"],
    ["summing junction", "a summing junction"],
    ["gain", "a gain"],
  ])("withArticle(%s) is %s", (noun, expected) => {
    expect(withArticle(noun)).toBe(expected);
  });

  it("capital upper-cases the first letter only, and leaves an empty text empty", () => {
    expect(capital("pickoff point p1")).toBe("Pickoff point p1");
    expect(capital("")).toBe("");
  });
});
