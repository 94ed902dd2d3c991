import { rateLimit } from "express-rate-limit";
import type { RequestHandler } from "express";

/** Per-client ceiling on the sign-in, sign-up and invitation endpoints; answers 429 with a sentence. */
export function authLimiter(perFifteenMinutes: number): RequestHandler {
  return rateLimit({
    windowMs: 15 * 60 * 1000,
    limit: perFifteenMinutes,
    standardHeaders: "draft-7",
    legacyHeaders: false,
    handler: (_req, res) =>
      void res.status(429).json({ error: { code: "rate_limited", message: "Too many attempts. Wait a few minutes and try again." } }),
  });
}
