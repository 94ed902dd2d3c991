import type { RequestHandler } from "express";
import { resolveShareToken } from "@server/features/shareLinks/resolve";
import { HttpError } from "@server/http/errors";

const escapeHtml = (text: string) => text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/** A page of its own for a link that opens nothing: readable without the client's code, and saying why. */
function unavailablePage(status: number, message: string): string {
  const heading = status === 410 ? "This share link no longer works" : "This share link does not exist";
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="robots" content="noindex"><title>${heading} · Loopwright</title>
<style>body{font-family:system-ui,sans-serif;background:#f7f5f0;color:#1d2430;margin:0;display:grid;place-items:center;min-height:100vh}
main{max-width:32rem;margin:1rem;padding:1.5rem 2rem;border:1px solid #d8d3c7;border-radius:6px;background:#fff}
h1{font-size:1.25rem;margin:0 0 .75rem}p{line-height:1.5;margin:0}small{display:block;margin-top:1rem;color:#5b6473}</style>
</head><body><main><h1>${heading}</h1><p>${escapeHtml(message)}</p><small>HTTP ${status} · Loopwright read-only share link</small></main></body></html>`;
}

/**
 * GET /s/:token. The server decides the status before any page is sent: a working link gets the client (which
 * then asks /api/shared/:token), a revoked or expired one a 410 page, an unknown one a 404 page.
 * `page` renders the client's index.html for a path; null when no client is built (then the request falls through).
 */
export function sharePage(page: ((path: string) => string) | null): RequestHandler {
  return async (req, res, next) => {
    try {
      await resolveShareToken((req.params as { token: string }).token);
    } catch (e) {
      if (!(e instanceof HttpError)) return next(e);
      return void res.status(e.status).type("html").send(unavailablePage(e.status, e.message));
    }
    if (!page) return next();
    res.type("html").send(page(req.path));
  };
}
