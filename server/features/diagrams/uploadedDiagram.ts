import { parseJsonText } from "@shared/json/jsonText";
import type { DiagramDocument } from "@shared/diagram/schema";
import { validDiagramOf } from "@server/features/versions/document";
import { HttpError } from "@server/http/errors";
import { singleFileUpload } from "@server/http/upload";

const MAX_IMPORT_BYTES = 1024 * 1024;

/** The multipart reader of every diagram-file import: one file in the field `file`, at most 1 MB (413 above). */
export const diagramFileUpload = () => singleFileUpload("file", MAX_IMPORT_BYTES);

export interface UploadedFile {
  originalname: string;
  buffer: Buffer;
}

const utf8 = new TextDecoder("utf-8", { fatal: true });

function textOf(file: UploadedFile): string {
  try {
    return utf8.decode(file.buffer);
  } catch {
    throw new HttpError(422, "invalid_json", `${file.originalname} is not UTF-8 text, so it cannot be a JSON diagram file.`);
  }
}

/**
 * An uploaded .json file read as a diagram (a new one, or a new version of one): its document (422 `file_missing`,
 * `invalid_json` with line and column, or `invalid_document` with the problems) and its title, the document's own
 * or else the file's name.
 */
export function uploadedDiagram(file: UploadedFile | undefined): { document: DiagramDocument; title: string; fileName: string } {
  if (!file) throw new HttpError(422, "file_missing", 'Send the file in the form field "file".');
  const parsed = parseJsonText(textOf(file));
  if (!parsed.ok) {
    const { line, column, message } = parsed.error;
    throw new HttpError(422, "invalid_json", `${file.originalname} is not valid JSON at line ${line}, column ${column}: ${message}.`);
  }
  const document = validDiagramOf(parsed.value);
  return { document, title: document.title?.trim() || file.originalname.replace(/\.json$/i, ""), fileName: file.originalname };
}
