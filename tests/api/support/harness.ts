import pg from "pg";
import type { Sequelize } from "sequelize";
import { pino } from "pino";
import request from "supertest";
import type { Express } from "express";
import { createApp, type AppDeps } from "@server/app";
import { createLucia } from "@server/auth/lucia";
import { loadConfig, type Config } from "@server/config";
import { createSequelize } from "@server/db/sequelize";
import type { FakeMailService } from "@server/mail/fakeMailService";
import { setUpMail } from "@server/mail/setUpMail";

let sharedSequelize: Sequelize | undefined;

export const ORIGIN = "http://loopwright.test";

export interface TestApp {
  app: Express;
  deps: AppDeps;
  config: Config;
  /** The fake mail service, or null when SMTP settings are given. */
  mailbox: FakeMailService;
  /** A cookie-keeping client that sends our Origin, as the browser app does. */
  client(): ReturnType<typeof request.agent>;
  close(): Promise<void>;
}

/** The real app on the real test database (DATABASE_URL from `npm test`), with a real fake-SMTP on a free port. */
export async function startTestApp(env: Record<string, string> = {}): Promise<TestApp> {
  const config = loadConfig({
    ...process.env,
    NODE_ENV: "test",
    PUBLIC_URL: ORIGIN,
    LOG_LEVEL: "silent",
    RATE_LIMIT_AUTH_PER_15_MIN: "100000",
    RATE_LIMIT_SHARE_PER_MIN: "100000",
    RATE_LIMIT_UPLOADS_PER_15_MIN: "100000",
    FAKE_MAIL_PORT: "0",
    ...env,
  });
  const pool = new pg.Pool({ connectionString: config.databaseUrl, connectionTimeoutMillis: 2000 });
  pool.on("error", () => undefined);
  // Sequelize models are bound to one instance per process: every test app of a file shares it.
  sharedSequelize ??= createSequelize(config.databaseUrl);
  const sequelize = sharedSequelize;
  const { mailer, mailbox } = await setUpMail(config);
  const deps: AppDeps = {
    config,
    sequelize,
    lucia: createLucia(pool, config),
    mailer,
    mailbox,
    log: pino({ level: config.logLevel }),
  };
  const app = createApp(deps);
  return {
    app,
    deps,
    config,
    mailbox: mailbox as FakeMailService,
    client: () => request.agent(app).set("Origin", ORIGIN),
    close: async () => {
      await Promise.allSettled([mailbox?.close(), pool.end()]);
    },
  };
}

let counter = 0;
/** A fresh e-mail address for each call, so tests never collide on the shared test database. */
export const uniqueEmail = (who: string) => `${who}.${Date.now().toString(36)}.${++counter}@example.test`;

export const PASSWORD = "correct horse battery";

/** Signs up a new account and returns its signed-in client and user. */
export async function signedUp(t: TestApp, who: string) {
  const client = t.client();
  const email = uniqueEmail(who);
  const res = await client.post("/api/auth/sign-up").send({ name: who, email, password: PASSWORD });
  if (res.status !== 201) throw new Error(`sign-up failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { client, user: res.body.user as { id: string; email: string; name: string } };
}

/** The invitation link's token from the newest message the fake mail service caught for `to`. */
export function invitationToken(mailbox: FakeMailService, to: string): string {
  const message = mailbox.messages.find((m) => m.to.includes(to));
  const match = message?.text.match(/\/invite\/([A-Za-z0-9_-]+)/);
  if (!match) throw new Error(`no invitation mail for ${to}`);
  return match[1];
}
