import type { z } from "zod";
import { HttpError } from "@server/http/errors";

/** Parses a request part with a shared zod schema; a mismatch is a 422 (or `status`, e.g. 400 for a query) naming each field. */
export function parseWith<S extends z.ZodType>(schema: S, value: unknown, status = 422): z.infer<S> {
  const r = schema.safeParse(value ?? {});
  if (r.success) return r.data;
  const fields = r.error.issues.map((i) => ({ path: i.path.join(".") || "(body)", message: i.message }));
  throw new HttpError(status, "validation", fields.map((f) => `${f.path}: ${f.message}`).join("; "), fields);
}
