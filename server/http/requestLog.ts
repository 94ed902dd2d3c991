import type { RequestHandler } from "express";
import type { Logger } from "pino";

/** One structured log line per API request: method, path, status, duration. */
export function requestLog(log: Logger): RequestHandler {
  return (req, res, next) => {
    const start = process.hrtime.bigint();
    res.on("finish", () => {
      const ms = Number(process.hrtime.bigint() - start) / 1e6;
      log.info({ method: req.method, path: req.originalUrl.split("?")[0], status: res.statusCode, ms: Math.round(ms * 10) / 10 }, "request");
    });
    next();
  };
}
