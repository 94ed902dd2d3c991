import { versionSummary } from "@shared/analysis/versionSummary";
import { parseDiagram } from "@shared/diagram/parseDiagram";
import { printReduction } from "@shared/reduce/printReduction";
import { reduceDiagram, type ReduceOptions } from "@shared/reduce/reduceDiagram";
import type { DiagramDocument } from "@shared/diagram/schema";
import { serveChecks } from "@server/features/versions/serveChecks";

/** The published result of a saved document and its version-table summary, from one parse and one reduction. */
function checkDocument(document: DiagramDocument, opts: ReduceOptions) {
  const parsed = parseDiagram(document);
  if (!parsed.ok) return { ok: false as const, problems: parsed.problems };
  const reduced = reduceDiagram(parsed.diagram, opts);
  if (!reduced.ok) return reduced;
  return { ok: true as const, result: printReduction(reduced.reduction), summary: versionSummary(reduced.reduction) };
}

// A long-lived worker: checks one saved document at a time, off the request thread.
serveChecks(checkDocument);
