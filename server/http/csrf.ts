import type { RequestHandler } from "express";
import { verifyRequestOrigin } from "lucia";
import { HttpError } from "@server/http/errors";

const SAFE = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * Cookie-authenticated mutations must come from our own origin: browsers send Origin on every
 * cross-site and same-site POST/PATCH/DELETE, so a missing or foreign Origin is refused.
 */
export function originCheck(publicUrl: string): RequestHandler {
  const allowed = new URL(publicUrl).host;
  return (req, _res, next) => {
    if (SAFE.has(req.method)) return next();
    const origin = req.headers.origin;
    const hosts = [allowed, req.headers.host ?? ""].filter(Boolean);
    if (!origin || !verifyRequestOrigin(origin, hosts))
      return next(new HttpError(403, "bad_origin", "This request did not come from the Loopwright app (Origin check failed)."));
    next();
  };
}
