import { Router, type Response } from "express";
import type { RequestHandler } from "express";
import { signInSchema, signUpSchema } from "@shared/api/auth";
import type { AppLucia } from "@server/auth/lucia";
import { requireUser } from "@server/http/session";
import { parseWith } from "@server/http/validate";
import { signIn, signUp, userView } from "@server/features/auth/service";

/** Sign-up, sign-in (always a new session id), sign-out (invalidated on the server) and who-am-I. */
export function authRouter(lucia: AppLucia, limiter: RequestHandler): Router {
  const router = Router();

  async function startSession(res: Response, userId: string) {
    const old = res.locals.session;
    if (old) await lucia.invalidateSession(old.id);
    const session = await lucia.createSession(userId, {});
    res.append("Set-Cookie", lucia.createSessionCookie(session.id).serialize());
  }

  router.post("/sign-up", limiter, async (req, res) => {
    const user = await signUp(parseWith(signUpSchema, req.body));
    await startSession(res, user.id);
    res.status(201).json({ user });
  });

  router.post("/sign-in", limiter, async (req, res) => {
    const user = await signIn(parseWith(signInSchema, req.body));
    await startSession(res, user.id);
    res.json({ user });
  });

  router.post("/sign-out", async (_req, res) => {
    if (res.locals.session) await lucia.invalidateSession(res.locals.session.id);
    res.append("Set-Cookie", lucia.createBlankSessionCookie().serialize());
    res.status(204).end();
  });

  router.get("/me", (_req, res) => {
    res.json({ user: userView(requireUser(res)) });
  });

  return router;
}
