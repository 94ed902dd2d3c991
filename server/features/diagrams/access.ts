import type { Role } from "@shared/api/teams";
import type { Diagram } from "@server/db/models/diagram";
import { findDiagram } from "@server/features/diagrams/service";
import { requireRole } from "@server/features/teams/access";

/** The diagram and the caller's role in its team; a non-member gets the same 404 as for a missing diagram. */
export async function diagramWithRole(userId: string, id: string, least: Role): Promise<{ diagram: Diagram; role: Role }> {
  const diagram = await findDiagram(id);
  const role = await requireRole(diagram.teamId, userId, least, "Diagram not found.");
  return { diagram, role };
}
