import type { RequestHandler } from "express";
import multer from "multer";
import { HttpError } from "@server/http/errors";

const MB = 1024 * 1024;

/**
 * One uploaded file in memory from the multipart field `field`, at most `maxBytes`: a larger file is a 413, a second file
 * or another field's file a 422; `req.file` holds it afterwards (undefined when none was sent).
 */
export function singleFileUpload(field: string, maxBytes: number): RequestHandler {
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: 1 } }).single(field);
  const limit = `${maxBytes / MB} MB`;
  return (req, res, next) =>
    upload(req, res, (err: unknown) => {
      if (err instanceof multer.MulterError) {
        if (err.code === "LIMIT_FILE_SIZE") return next(new HttpError(413, "too_large", `The file is larger than the ${limit} limit.`));
        return next(new HttpError(422, "bad_upload", `Send one file in the form field "${field}" (${err.message}).`));
      }
      next(err);
    });
}
