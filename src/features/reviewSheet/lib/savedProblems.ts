import type { CheckedResult } from "@shared/api/versions";

/**
 * The problems a version was saved with, as its stored check lists them (errors first), or null when the check
 * passed, did not finish (over budget, crashed: the document itself may be fine) or never ran.
 * Example: savedProblems({ ok: false, problems: [{ message: "Wire w3 ends nowhere", … }], engineMs: 2 }) → ["Wire w3 ends nowhere"].
 */
export function savedProblems(stored: CheckedResult | null): string[] | null {
  if (stored === null || stored.ok || "failure" in stored) return null;
  const rank = (severity: string) => (severity === "error" ? 0 : 1);
  return [...stored.problems].sort((a, b) => rank(a.severity) - rank(b.severity)).map((p) => p.message);
}
