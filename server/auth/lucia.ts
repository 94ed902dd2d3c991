import { NodePostgresAdapter } from "@lucia-auth/adapter-postgresql";
import { Lucia, TimeSpan } from "lucia";
import type pg from "pg";
import type { Config } from "@server/config";

/** Session store: lucia on the `user_sessions` table, reading the user's public attributes from `users`. */
export function createLucia(pool: pg.Pool, config: Config) {
  return new Lucia(new NodePostgresAdapter(pool, { user: "users", session: "user_sessions" }), {
    sessionExpiresIn: new TimeSpan(30, "d"),
    sessionCookie: {
      name: config.cookie.name,
      attributes: { secure: config.cookie.secure, sameSite: "lax" },
    },
    getUserAttributes: (row) => ({ email: row.email, name: row.name }),
  });
}

export type AppLucia = ReturnType<typeof createLucia>;

declare module "lucia" {
  interface Register {
    Lucia: AppLucia;
    DatabaseUserAttributes: { email: string; name: string };
  }
}
