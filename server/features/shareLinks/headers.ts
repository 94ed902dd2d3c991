import type { RequestHandler } from "express";

/**
 * Every answer about a share link (its page, its API): never indexed, never cached, and the capability URL is not
 * sent on as a Referer to anything the page links or loads.
 */
export const capabilityHeaders: RequestHandler = (_req, res, next) => {
  res.set({ "X-Robots-Tag": "noindex", "Referrer-Policy": "no-referrer", "Cache-Control": "no-store" });
  next();
};
