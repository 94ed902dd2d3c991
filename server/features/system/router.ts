import { Router } from "express";
import type { Sequelize } from "sequelize";
import type { PublicConfig } from "@shared/api/errors";
import { DEMO_PASSWORD, DEMO_USERS } from "@server/db/demoAccounts";
import { User } from "@server/db/models/user";
import type { FakeMailService } from "@server/mail/fakeMailService";

/** Health, the public client configuration and, with the fake mail service only, the captured mailbox. */
export function systemRouter(deps: { sequelize: Sequelize; mailbox: FakeMailService | null; demo: boolean }): Router {
  const router = Router();

  router.get("/health", async (_req, res) => {
    await deps.sequelize.query("SELECT 1");
    res.json({ ok: true, database: "up" });
  });

  router.get("/config", async (_req, res) => {
    // The demo accounts are advertised only while they exist with the documented password's owner list.
    const demo = deps.demo && (await User.count({ where: { email: DEMO_USERS.map((u) => u.email) } })) === DEMO_USERS.length;
    const body: PublicConfig = {
      demo,
      demoPassword: demo ? DEMO_PASSWORD : null,
      demoUsers: demo ? DEMO_USERS.map(({ email, role }) => ({ email, role })) : [],
      mailbox: deps.mailbox !== null,
    };
    res.json(body);
  });

  if (deps.mailbox) {
    const mailbox = deps.mailbox;
    router.get("/dev/mailbox", (_req, res) => {
      res.json({ messages: mailbox.messages });
    });
  }
  return router;
}
