import type { Role } from "@shared/api/teams";
import { Membership } from "@server/db/models/team";
import { forbidden, notFound } from "@server/http/errors";
import { isUuid } from "@server/http/ids";

const rank: Record<Role, number> = { viewer: 0, editor: 1, owner: 2 };

const WHAT: Record<Role, string> = {
  viewer: "view this team",
  editor: "Only editors and owners can change diagrams in this team.",
  owner: "Only team owners can manage members and invitations or read the team's activity.",
};

/**
 * The caller's role in a team, or a 404 when they are not a member (a non-member learns nothing,
 * not even that the team exists); a 403 when their role is below `least`.
 */
export async function requireRole(
  teamId: string,
  userId: string,
  least: Role = "viewer",
  hiddenAs = "Team not found.",
): Promise<Role> {
  const membership = isUuid(teamId) ? await Membership.findOne({ where: { teamId, userId } }) : null;
  if (!membership) throw notFound(hiddenAs);
  if (rank[membership.role] < rank[least]) throw forbidden(WHAT[least]);
  return membership.role;
}
