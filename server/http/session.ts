import type { RequestHandler, Response } from "express";
import type { Session, User } from "lucia";
import type { AppLucia } from "@server/auth/lucia";
import { HttpError } from "@server/http/errors";

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Locals {
      user: User | null;
      session: Session | null;
    }
  }
}

/** Loads the session from the cookie on every request and keeps the cookie fresh. */
export function sessionMiddleware(lucia: AppLucia): RequestHandler {
  return async (req, res, next) => {
    const id = lucia.readSessionCookie(req.headers.cookie ?? "");
    res.locals.user = null;
    res.locals.session = null;
    if (!id) return next();
    const { session, user } = await lucia.validateSession(id);
    if (session?.fresh) res.append("Set-Cookie", lucia.createSessionCookie(session.id).serialize());
    if (!session) res.append("Set-Cookie", lucia.createBlankSessionCookie().serialize());
    res.locals.user = user;
    res.locals.session = session;
    next();
  };
}

/** The signed-in user, or a 401. */
export function requireUser(res: Response): User {
  if (!res.locals.user) throw new HttpError(401, "unauthenticated", "Sign in to continue.");
  return res.locals.user;
}
