import type { Problem } from "@shared/diagram/problems";
import { parseDiagram } from "@shared/diagram/parseDiagram";
import type { DiagramDocument } from "@shared/diagram/schema";
import { loadDiagram } from "@shared/diagram/validate";
import { HttpError } from "@server/http/errors";

/** The 422 `invalid_document` answer (InvalidDocumentBody): problems name the field and block. */
const invalidDocument = (problems: Problem[]): HttpError =>
  new HttpError(422, "invalid_document", "This is not a Loopwright diagram document.", undefined, { problems });

/** A saved version's document: its format must be right; diagram problems are kept as the check's result. */
export function diagramDocumentOf(raw: unknown): DiagramDocument {
  const loaded = loadDiagram(raw);
  if (loaded.doc) return loaded.doc;
  throw invalidDocument(loaded.problems);
}

/** An imported file's document: it must be a diagram without errors, since it starts a new diagram. */
export function validDiagramOf(raw: unknown): DiagramDocument {
  const parsed = parseDiagram(raw);
  if (parsed.ok) return parsed.diagram.doc;
  throw invalidDocument(parsed.problems);
}

// Characters that file systems refuse or that would break the header; runs of them become one dash.
const UNSAFE_IN_FILE_NAME = /[\u0000-\u001f\u007f/\\:*?"<>|]+/g;

/** The download name of version n: "Nip load / draft", 3 → "Nip load - draft-v3.json". */
export function documentFileName(title: string, number: number): string {
  const safe = title.replace(UNSAFE_IN_FILE_NAME, "-").replace(/\s+/g, " ").trim().slice(0, 100).replace(/^\.+/, "");
  return `${safe || "diagram"}-v${number}.json`;
}
