/**
 * Every error response body of /api: `{ error: { code, message, fields? } }`.
 * Example: 422 { error: { code: "validation", message: "…", fields: [{ path: "email", message: "…" }] } }.
 */
export interface FieldError {
  path: string;
  message: string;
}

export interface ApiErrorBody {
  error: { code: string; message: string; fields?: FieldError[] };
}

export interface PublicConfig {
  demo: boolean; // demo users exist and the sign-in page may show them
  demoPassword: string | null;
  demoUsers: { email: string; role: string }[];
  mailbox: boolean; // the fake mail service and /dev/mailbox are in use
}
