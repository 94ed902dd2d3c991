import pg from "pg";
import { pino } from "pino";
import { createApp } from "@server/app";
import { createLucia } from "@server/auth/lucia";
import { loadConfig } from "@server/config";
import { createSequelize } from "@server/db/sequelize";
import { createSaveCheck } from "@server/features/versions/check";
import { setUpMail } from "@server/mail/setUpMail";

// Starts the server: database pools, mail (real SMTP, or the local fake), HTTP. SIGINT/SIGTERM close everything.
const config = loadConfig();
const log = pino({ level: config.logLevel });

const pool = new pg.Pool({ connectionString: config.databaseUrl, max: 10, connectionTimeoutMillis: 5000 });
// An idle client losing its connection (database restarted) must not crash the server; the next query reconnects.
pool.on("error", (err) => log.warn({ err: err.message }, "database connection lost"));
const sequelize = createSequelize(config.databaseUrl);

const { mailer, mailbox } = await setUpMail(config).catch((e: Error) => {
  log.fatal(e.message);
  process.exit(1);
});
if (mailbox) log.info(`Fake mail service on 127.0.0.1:${mailbox.port}; messages at ${config.publicUrl}/dev/mailbox`);

const saveCheck = createSaveCheck({ log });
const app = createApp({
  config,
  sequelize,
  lucia: createLucia(pool, config),
  mailer,
  mailbox,
  log,
  saveCheck,
});

const server = app.listen(config.port, "0.0.0.0", () => {
  log.info(`Loopwright listening on ${config.publicUrl}`);
  saveCheck.warm().catch((e: Error) => log.warn(`The save check's worker did not start ahead of time: ${e.message}`));
});
server.on("error", (e) => {
  log.fatal(`Cannot listen on port ${config.port}: ${e.message}`);
  process.exit(1);
});

async function shutdown() {
  server.close();
  await Promise.allSettled([mailbox?.close(), sequelize.close(), pool.end()]);
  process.exit(0);
}
process.on("SIGINT", shutdown);
process.on("SIGTERM", shutdown);
