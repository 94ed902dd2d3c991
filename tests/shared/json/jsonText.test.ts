import { describe, expect, it } from "vitest";
import { parseJsonText } from "@shared/json/jsonText";

// Where the first syntax error is, by the JSON grammar of RFC 8259 (outside reference for what is and
// is not JSON); valid texts must parse exactly as JSON.parse does.
describe("parseJsonText locates the first syntax error (RFC 8259 grammar)", () => {
  const cases: [string, string, number, number, string][] = [
    ["empty text", "", 1, 1, "expected a value"],
    ["trailing comma in an object", '{"a": 1,}', 1, 9, "property name"],
    ["missing value in an array", '{\n  "blocks": [,]\n}', 2, 14, "expected a value"],
    ["single quotes", "{'a': 1}", 1, 2, "property name"],
    ["missing colon", '{"a" 1}', 1, 6, '":"'],
    ["unterminated string", '{"a": "x', 1, 9, 'closing "'],
    ["raw newline in a string", '["a\nb"]', 1, 4, "control character"],
    ["bad escape", '["\\x"]', 1, 3, "bad escape"],
    ["bad unicode escape", '["\\u12G4"]', 1, 3, "\\u escape"],
    ["leading zero", "[01]", 1, 3, '"," or "]"'],
    ["NaN is not JSON", '{"v": NaN}', 1, 7, "expected a value"],
    ["text after the value", '{"a": 1} x', 1, 10, "end of the file"],
    ["truncated literal", "[tru]", 1, 5, '"true"'],
    ["missing closing bracket", '{"a": [1, 2}', 1, 12, '"," or "]"'],
    ["CRLF line ends count as lines", '{\r\n"a": 1,\r\n}', 3, 1, "property name"],
  ];
  for (const [name, text, line, column, fragment] of cases) {
    it(name, () => {
      const r = parseJsonText(text);
      expect(r.ok).toBe(false);
      if (r.ok) return;
      expect([r.error.line, r.error.column]).toEqual([line, column]);
      expect(r.error.message).toContain(fragment);
    });
  }

  it("valid JSON parses as JSON.parse does, a leading byte-order mark ignored", () => {
    const text = '{"a": [1, -2.5e3, true, null, "x\\u00e9\\n"], "b": {}}';
    expect(parseJsonText(text)).toEqual({ ok: true, value: JSON.parse(text) });
    expect(parseJsonText(`\uFEFF${text}`)).toEqual({ ok: true, value: JSON.parse(text) });
  });

  it("deep nesting is reported, not a crash", () => {
    const r = parseJsonText("[".repeat(200_000));
    expect(r.ok).toBe(false);
  });
});
