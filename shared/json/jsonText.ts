/**
 * JSON.parse with a location for syntax errors: Node 20's messages do not always carry a position,
 * and users need a line and column. On failure a small scanner walks the text to the first error.
 */
export interface JsonLocation {
  line: number; // 1-based
  column: number; // 1-based, in UTF-16 code units
  message: string;
}

export type JsonParse = { ok: true; value: unknown } | { ok: false; error: JsonLocation };

class ScanError extends Error {
  constructor(
    readonly offset: number,
    message: string,
  ) {
    super(message);
  }
}

const NUMBER = /-?(?:0|[1-9]\d*)(?:\.\d+)?(?:[eE][+-]?\d+)?/y;

/** Offset and reason of the first syntax error in `text` (null when the text is valid JSON). */
function firstError(text: string): ScanError | null {
  let i = 0;
  const show = (at: number) => (at >= text.length ? "the end of the file" : JSON.stringify(text[at]));
  const fail = (what: string): never => {
    throw new ScanError(i, `expected ${what}, found ${show(i)}`);
  };
  const ws = () => {
    while (i < text.length && " \t\n\r".includes(text[i])) i++;
  };
  const literal = (word: string) => {
    for (const ch of word) {
      if (text[i] !== ch) fail(`"${word}"`);
      i++;
    }
  };
  const string = () => {
    i++; // opening quote
    for (;;) {
      if (i >= text.length) fail('a closing "');
      const ch = text[i];
      if (ch === '"') return void i++;
      if (ch < " ") throw new ScanError(i, "control character inside a string (write it as an escape, e.g. \\n)");
      if (ch === "\\") {
        const esc = text[i + 1];
        if (esc === "u") {
          if (!/^[0-9a-fA-F]{4}$/.test(text.slice(i + 2, i + 6))) throw new ScanError(i, "bad \\u escape: need 4 hex digits");
          i += 6;
        } else if (esc !== undefined && '"\\/bfnrt'.includes(esc)) i += 2;
        else throw new ScanError(i, `bad escape "\\${esc ?? ""}" in a string`);
      } else i++;
    }
  };
  const value = (): void => {
    ws();
    const ch = text[i];
    if (ch === "{") {
      i++;
      ws();
      if (text[i] === "}") return void i++;
      for (;;) {
        ws();
        if (text[i] !== '"') fail("a property name in double quotes");
        string();
        ws();
        if (text[i] !== ":") fail('":"');
        i++;
        value();
        ws();
        if (text[i] === ",") i++;
        else if (text[i] === "}") return void i++;
        else fail('"," or "}"');
      }
    }
    if (ch === "[") {
      i++;
      ws();
      if (text[i] === "]") return void i++;
      for (;;) {
        value();
        ws();
        if (text[i] === ",") i++;
        else if (text[i] === "]") return void i++;
        else fail('"," or "]"');
      }
    }
    if (ch === '"') return string();
    if (ch === "t") return literal("true");
    if (ch === "f") return literal("false");
    if (ch === "n") return literal("null");
    NUMBER.lastIndex = i;
    if (ch !== undefined && /[-\d]/.test(ch) && NUMBER.test(text)) return void (i = NUMBER.lastIndex);
    fail("a value");
  };
  try {
    value();
    ws();
    if (i < text.length) fail("the end of the file after the JSON value");
    return null;
  } catch (e) {
    if (e instanceof ScanError) return e;
    if (e instanceof RangeError) return new ScanError(i, "the JSON nests too deeply"); // call stack exhausted
    throw e;
  }
}

function lineColumn(text: string, offset: number): { line: number; column: number } {
  const before = text.slice(0, offset);
  const line = before.split("\n").length;
  return { line, column: offset - before.lastIndexOf("\n") };
}

/** Parse JSON text (a leading byte-order mark is ignored). Example: parseJsonText("{") → line 1, column 2. */
export function parseJsonText(raw: string): JsonParse {
  const text = raw.charCodeAt(0) === 0xfeff ? raw.slice(1) : raw;
  try {
    return { ok: true, value: JSON.parse(text) };
  } catch (e) {
    const found = firstError(text);
    const at = found ? lineColumn(text, found.offset) : { line: 1, column: 1 };
    return { ok: false, error: { ...at, message: found ? found.message : (e as Error).message } };
  }
}
