import type { FieldValues, Path, UseFormSetError } from "react-hook-form";
import { ApiError, errorMessage } from "@/lib/apiClient";

/**
 * Puts a failed submit's message where the user looks: a 422's field errors beside their fields, a 409
 * beside `conflictField` when given, anything else above the submit button (`errors.root.server`).
 */
export function showServerError<T extends FieldValues>(
  e: unknown,
  setError: UseFormSetError<T>,
  fields: readonly Path<T>[],
  conflictField?: Path<T>,
): void {
  if (e instanceof ApiError) {
    const known = e.fields.filter((f) => (fields as readonly string[]).includes(f.path));
    for (const f of known) setError(f.path as Path<T>, { type: "server", message: f.message });
    if (known.length > 0) return;
    if (e.status === 409 && conflictField) {
      setError(conflictField, { type: "server", message: e.message }, { shouldFocus: true });
      return;
    }
  }
  setError("root.server", { type: "server", message: errorMessage(e) });
}
