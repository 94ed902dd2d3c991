import type { RequestHandler } from "express";
import type { Logger } from "pino";

/**
 * Paths whose segment after the prefix is a capability token (share links, invitations): logged as "[token]", so a
 * log leaks no working link.
 */
const TOKEN_PATHS = /^(\/s\/|\/api\/shared\/|\/invite\/|\/api\/invitations\/)[^/]+/;

/** The path as logged: no query string, and tokens redacted. Example: "/api/invitations/abc/accept" → "/api/invitations/[token]/accept". */
export const loggedPath = (url: string): string => url.split("?")[0].replace(TOKEN_PATHS, "$1[token]");

/** One structured log line per request: method, path, status, duration. */
export function requestLog(log: Logger): RequestHandler {
  return (req, res, next) => {
    const start = process.hrtime.bigint();
    res.on("finish", () => {
      const ms = Number(process.hrtime.bigint() - start) / 1e6;
      log.info({ method: req.method, path: loggedPath(req.originalUrl), status: res.statusCode, ms: Math.round(ms * 10) / 10 }, "request");
    });
    next();
  };
}
