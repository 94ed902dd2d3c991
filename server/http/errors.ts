import type { ErrorRequestHandler, RequestHandler } from "express";
import { ConnectionError } from "sequelize";
import type { Logger } from "pino";
import type { ApiErrorBody, FieldError } from "@shared/api/errors";

/** An error the client should see as-is: status, stable code and a sentence. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: FieldError[],
    /** Extra top-level members of the body beside `error`, e.g. the winning version of a 409. */
    readonly extra?: Record<string, unknown>,
  ) {
    super(message);
  }
}

export const notFound = (what = "Not found"): HttpError => new HttpError(404, "not_found", what);
export const forbidden = (why: string): HttpError => new HttpError(403, "forbidden", why);
export const conflict = (why: string): HttpError => new HttpError(409, "conflict", why);

const body = (code: string, message: string, fields?: FieldError[]): ApiErrorBody => ({
  error: fields ? { code, message, fields } : { code, message },
});

const DB_DOWN_CODES = new Set(["ECONNREFUSED", "ECONNRESET", "ETIMEDOUT", "57P01", "57P03", "53300"]);

function isDatabaseDown(err: unknown): boolean {
  if (err instanceof ConnectionError) return true;
  const code = (err as { code?: string; original?: { code?: string } })?.code ?? (err as { original?: { code?: string } })?.original?.code;
  return typeof code === "string" && DB_DOWN_CODES.has(code);
}

export const unknownApiRoute: RequestHandler = (req, _res, next) =>
  next(new HttpError(404, "not_found", `No API route ${req.method} ${req.path}`));

export function errorHandler(log: Logger): ErrorRequestHandler {
  return (err, _req, res, _next) => {
    if (err instanceof HttpError)
      return void res.status(err.status).json({ ...body(err.code, err.message, err.fields), ...err.extra });
    // body-parser: malformed JSON or too large a body.
    const type = (err as { type?: string }).type;
    if (type === "entity.parse.failed")
      return void res.status(400).json(body("malformed_json", "The request body is not valid JSON."));
    if (type === "entity.too.large")
      return void res.status(413).json(body("too_large", "The request body is too large."));
    if (isDatabaseDown(err)) {
      log.warn({ err: (err as Error).message }, "database unavailable");
      return void res.status(503).json(body("database_unavailable", "The database is unavailable. Try again in a moment."));
    }
    log.error({ err }, "unhandled error");
    res.status(500).json(body("internal", "Something went wrong on the server."));
  };
}
