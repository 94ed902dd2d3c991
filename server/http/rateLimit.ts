import { rateLimit } from "express-rate-limit";
import type { RequestHandler } from "express";

const MINUTE = 60 * 1000;

/** A per-client ceiling over a window; answers 429 with the sentence. */
function limiter(limit: number, windowMs: number, message: string): RequestHandler {
  return rateLimit({
    windowMs,
    limit,
    standardHeaders: "draft-7",
    legacyHeaders: false,
    handler: (_req, res) => void res.status(429).json({ error: { code: "rate_limited", message } }),
  });
}

/** Per-client ceiling on the sign-in, sign-up and invitation endpoints. */
export const authLimiter = (perFifteenMinutes: number): RequestHandler =>
  limiter(perFifteenMinutes, 15 * MINUTE, "Too many attempts. Wait a few minutes and try again.");

/** Per-client ceiling on share-link lookups: a guessed token costs a request, so guessing stays slow. */
export const shareLookupLimiter = (perMinute: number): RequestHandler =>
  limiter(perMinute, MINUTE, "Too many share-link requests. Wait a minute and try again.");

/** Per-client ceiling on file uploads (imports), which are parsed and checked in full. */
export const uploadLimiter = (perFifteenMinutes: number): RequestHandler =>
  limiter(perFifteenMinutes, 15 * MINUTE, "Too many uploads. Wait a few minutes and try again.");
