/** A number typed into a table cell: empty means "not set" unless required; anything else must be finite. */
export function parseNumberField(text: string, what: string, required: boolean): { ok: true; value: number | undefined } | { ok: false; error: string } {
  const t = text.trim();
  if (t === "") return required ? { ok: false, error: `${what} is required` } : { ok: true, value: undefined };
  const n = Number(t);
  if (!Number.isFinite(n)) return { ok: false, error: `${what} must be a finite number such as 0.5 or 2e-3, not "${t}"` };
  return { ok: true, value: n };
}
