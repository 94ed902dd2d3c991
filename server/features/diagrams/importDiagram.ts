import type { DiagramSummary } from "@shared/api/diagrams";
import type { DiagramDocument } from "@shared/diagram/schema";
import { createDiagram, findDiagram, summaryOf } from "@server/features/diagrams/service";
import type { SaveCheck } from "@server/features/versions/check";
import { saveVersion } from "@server/features/versions/service";
import { AuditEvent } from "@server/db/models/audit";
import { Diagram } from "@server/db/models/diagram";

/**
 * A new diagram in the team whose version 1 is `document`, saved through the versions service so the server's
 * check runs and its result is stored. If that save fails (e.g. 503 `check_busy`), the diagram and its
 * `diagram.imported` row are removed again: a failed import leaves nothing behind, not even in the trail.
 */
export async function importDiagram(
  teamId: string,
  userId: string,
  input: { title: string; fileName: string; document: DiagramDocument },
  check: SaveCheck,
): Promise<DiagramSummary> {
  const created = await createDiagram(teamId, userId, { title: input.title }, { fileName: input.fileName });
  const diagram = await findDiagram(created.id);
  try {
    await saveVersion(diagram, userId, { baseVersion: 0, message: "Imported from a file", document: input.document }, check);
  } catch (e) {
    await Diagram.sequelize!.transaction(async (transaction) => {
      await AuditEvent.destroy({ where: { diagramId: diagram.id }, transaction });
      await Diagram.destroy({ where: { id: diagram.id }, transaction });
    });
    throw e;
  }
  return summaryOf(diagram);
}
