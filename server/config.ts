import { z } from "zod";
import ports from "@shared/ports.json" with { type: "json" };

/** Every environment variable the server reads, parsed once at start-up. Nothing else reads process.env. */
const envSchema = z.object({
  NODE_ENV: z.enum(["production", "development", "test"]).default("development"),
  PORT: z.coerce.number().int().min(1).max(65535).default(ports.app),
  DATABASE_URL: z.string().min(1, "DATABASE_URL is required (the bootstrap sets it for the private cluster)"),
  PUBLIC_URL: z.string().url().optional(),
  CLIENT_DIR: z.string().default("dist/client"),
  LOG_LEVEL: z.enum(["fatal", "error", "warn", "info", "debug", "trace", "silent"]).default("info"),
  SESSION_COOKIE_NAME: z.string().default("loopwright_session"),
  /** Defaults to true when PUBLIC_URL is https. */
  SESSION_COOKIE_SECURE: z.enum(["true", "false"]).optional(),
  SMTP_HOST: z.string().optional(),
  SMTP_PORT: z.coerce.number().int().optional(),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  SMTP_SECURE: z.enum(["true", "false"]).default("false"),
  MAIL_FROM: z.string().default("Loopwright <no-reply@loopwright.invalid>"),
  FAKE_MAIL_PORT: z.coerce.number().int().default(ports.mail),
  RATE_LIMIT_AUTH_PER_15_MIN: z.coerce.number().int().min(1).default(30),
  RATE_LIMIT_SHARE_PER_MIN: z.coerce.number().int().min(1).default(300),
  RATE_LIMIT_UPLOADS_PER_15_MIN: z.coerce.number().int().min(1).default(60),
  DEMO_SEED: z.enum(["true", "false"]).default("true"),
});

export type Config = {
  env: "production" | "development" | "test";
  port: number;
  databaseUrl: string;
  publicUrl: string;
  clientDir: string;
  logLevel: string;
  cookie: { name: string; secure: boolean };
  /** null: no SMTP settings, so the fake mail service runs on fakeMailPort. */
  smtp: { host: string; port: number; user?: string; password?: string; secure: boolean } | null;
  mailFrom: string;
  fakeMailPort: number;
  authRateLimit: number;
  shareRateLimit: number;
  uploadRateLimit: number;
  demo: boolean;
};

export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
    throw new Error(`Invalid environment:\n${lines.join("\n")}`);
  }
  const e = parsed.data;
  const publicUrl = (e.PUBLIC_URL ?? `http://localhost:${e.PORT}`).replace(/\/$/, "");
  return {
    env: e.NODE_ENV,
    port: e.PORT,
    databaseUrl: e.DATABASE_URL,
    publicUrl,
    clientDir: e.CLIENT_DIR,
    logLevel: e.LOG_LEVEL,
    cookie: {
      name: e.SESSION_COOKIE_NAME,
      secure: e.SESSION_COOKIE_SECURE ? e.SESSION_COOKIE_SECURE === "true" : publicUrl.startsWith("https://"),
    },
    smtp: e.SMTP_HOST
      ? { host: e.SMTP_HOST, port: e.SMTP_PORT ?? 587, user: e.SMTP_USER, password: e.SMTP_PASSWORD, secure: e.SMTP_SECURE === "true" }
      : null,
    mailFrom: e.MAIL_FROM,
    fakeMailPort: e.FAKE_MAIL_PORT,
    authRateLimit: e.RATE_LIMIT_AUTH_PER_15_MIN,
    shareRateLimit: e.RATE_LIMIT_SHARE_PER_MIN,
    uploadRateLimit: e.RATE_LIMIT_UPLOADS_PER_15_MIN,
    demo: e.DEMO_SEED === "true",
  };
}
