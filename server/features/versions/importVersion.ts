import type { DiagramVersionView } from "@shared/api/diagrams";
import { importedMessage } from "@shared/api/versions";
import type { DiagramDocument } from "@shared/diagram/schema";
import type { Diagram } from "@server/db/models/diagram";
import type { SaveCheck } from "@server/features/versions/check";
import { listVersions, saveVersion } from "@server/features/versions/service";

/**
 * An uploaded document stored as the diagram's next version, on top of whatever is latest now: the file does not
 * derive from the version the importer has open, so there is nothing to be stale against (a save that lands in
 * between still gets its own number, and this one the next, under saveVersion's row lock and check).
 */
export async function importVersion(
  diagram: Diagram,
  userId: string,
  input: { fileName: string; document: DiagramDocument },
  check: SaveCheck,
): Promise<DiagramVersionView> {
  const [latest] = await listVersions(diagram.id, 1);
  return saveVersion(diagram, userId, { baseVersion: latest?.number ?? 0, message: importedMessage(input.fileName), document: input.document }, check);
}
