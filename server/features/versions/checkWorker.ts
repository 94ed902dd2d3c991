import { checkDocument, versionSummary } from "@shared/analysis/versionSummary";
import { serveChecks } from "@server/features/versions/serveChecks";

// A long-lived worker: checks one saved document at a time, off the request thread, keeping the version's summary.
serveChecks((document, { limits }) => {
  const checked = checkDocument(document, { limits });
  return checked.ok ? { ok: true, result: checked.result, summary: versionSummary(checked.pair) } : checked;
});
