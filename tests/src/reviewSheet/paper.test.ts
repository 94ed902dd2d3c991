import { describe, expect, it } from "vitest";
import { pageRule, paperOf, sheetBox } from "@/features/reviewSheet/lib/paper";

describe("paper", () => {
  // common practice: ISO 216 A4 is 210 × 297 mm; US Letter is 8.5 × 11 in = 215.9 × 279.4 mm.
  it("sizes the sheet to each paper's printable area within 12 mm margins, with a little slack", () => {
    expect(sheetBox("A4")).toEqual({ width: "186mm", height: "271mm" });
    expect(sheetBox("Letter")).toEqual({ width: "191.9mm", height: "253.4mm" });
  });

  it("writes the @page rule for the chosen paper", () => {
    expect(pageRule("A4")).toBe("@page { size: A4; margin: 12mm }");
    expect(pageRule("Letter")).toBe("@page { size: letter; margin: 12mm }");
  });

  it("reads the paper from an address parameter, A4 when missing or unknown", () => {
    expect(paperOf("letter")).toBe("Letter");
    expect(paperOf("A4")).toBe("A4");
    expect(paperOf(null)).toBe("A4");
    expect(paperOf("tabloid")).toBe("A4");
  });
});
