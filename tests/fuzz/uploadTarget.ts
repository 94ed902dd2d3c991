import fc from "fast-check";
import { parseJsonText } from "@shared/json/jsonText";
import { uploadedDiagram } from "@server/features/diagrams/uploadedDiagram";
import { HttpError } from "@server/http/errors";
import type { Problem } from "@shared/diagram/problems";
import { mutatedDocument, validDocument } from "./docMutation";
import { problemsFault, truncated, type FuzzTarget } from "./harness";

/** The import route's file step (bytes → text → JSON → document) on random bytes, text and broken JSON. */
const textArb = fc.oneof(
  fc.jsonValue().map((v) => JSON.stringify(v)),
  mutatedDocument.map((d) => JSON.stringify(d) ?? ""),
  fc.tuple(validDocument, fc.nat()).map(([d, cut]) => {
    const text = JSON.stringify(d, null, 2);
    return text.slice(0, cut % (text.length + 1));
  }),
  fc.tuple(fc.integer({ min: 1, max: 200_000 }), fc.constantFrom("[", "{\"a\":", "[{\"b\":[")).map(([n, open]) => open.repeat(n)),
  fc.integer({ min: 1, max: 100_000 }).map((n) => `${"[".repeat(n)}${"]".repeat(n)}`),
  fc.string({ unit: "grapheme", maxLength: 200 }).map((t) => `\ufeff${t}`),
  fc.string({ unit: fc.constantFrom(..."{}[]\":,0123456789.eE-+ \n\ttruefalsn\\u"), maxLength: 200 }),
);

const bytesArb = fc.oneof(
  { arbitrary: textArb.map((t) => Buffer.from(t, "utf8")), weight: 4 },
  fc.uint8Array({ maxLength: 300 }).map((b) => Buffer.from(b)),
);

export const uploadTarget: FuzzTarget<Buffer> = {
  name: "upload (bytes → document)",
  arbitrary: bytesArb,
  check(buffer) {
    const text = buffer.toString("utf8");
    const json = parseJsonText(text);
    if (!json.ok && !(json.error.line >= 1 && json.error.column >= 1 && json.error.message.trim() !== "")) return `bad JSON location ${JSON.stringify(json.error)}`;
    try {
      const { document, title } = uploadedDiagram({ originalname: "fuzz.json", buffer });
      return document.blocks && typeof title === "string" ? null : "a document without blocks or title";
    } catch (e) {
      if (!(e instanceof HttpError)) throw e;
      if (e.status !== 422 || e.message.trim() === "") return `HttpError ${e.status} ${e.code} "${e.message}"`;
      const problems = (e.extra as { problems?: Problem[] } | undefined)?.problems;
      return e.code === "invalid_document" ? problemsFault(problems ?? [], true) : null;
    }
  },
  show: (b) => truncated(b.toString("utf8")),
};
