import { fn, col } from "sequelize";
import type { ChangeRoleInput, CreateTeamInput, MemberView, Role, TeamView } from "@shared/api/teams";
import { Membership, Team } from "@server/db/models/team";
import { User } from "@server/db/models/user";
import { recordAudit } from "@server/features/audit/record";
import { conflict, notFound } from "@server/http/errors";

async function memberCounts(teamIds: string[]): Promise<Map<string, number>> {
  const rows = (await Membership.findAll({
    attributes: ["teamId", [fn("COUNT", col("user_id")), "count"]],
    where: { teamId: teamIds },
    group: ["teamId"],
    raw: true,
  })) as unknown as { teamId: string; count: string }[];
  return new Map(rows.map((r) => [r.teamId, Number(r.count)]));
}

export async function listTeams(userId: string): Promise<TeamView[]> {
  const memberships = await Membership.findAll({
    where: { userId },
    include: [{ model: Team, as: "team" }],
    order: [[{ model: Team, as: "team" }, "name", "ASC"]],
  });
  const counts = await memberCounts(memberships.map((m) => m.teamId));
  return memberships.map((m) => {
    const team = (m as unknown as { team: Team }).team;
    return { id: team.id, name: team.name, role: m.role, memberCount: counts.get(team.id) ?? 0 };
  });
}

export async function getTeam(teamId: string, role: Role): Promise<TeamView> {
  const team = await Team.findByPk(teamId);
  if (!team) throw notFound("Team not found.");
  const counts = await memberCounts([teamId]);
  return { id: team.id, name: team.name, role, memberCount: counts.get(teamId) ?? 0 };
}

/** Creates a team with its creator as the first owner. */
export async function createTeam(userId: string, input: CreateTeamInput): Promise<TeamView> {
  const team = await Team.sequelize!.transaction(async (transaction) => {
    const t = await Team.create({ name: input.name }, { transaction });
    await Membership.create({ teamId: t.id, userId, role: "owner" }, { transaction });
    return t;
  });
  return { id: team.id, name: team.name, role: "owner", memberCount: 1 };
}

const memberView = (m: Membership): MemberView => {
  const user = (m as unknown as { user: User }).user;
  return { userId: m.userId, name: user.name, email: user.email, role: m.role, joinedAt: m.createdAt.toISOString() };
};

export async function listMembers(teamId: string): Promise<MemberView[]> {
  const rows = await Membership.findAll({
    where: { teamId },
    include: [{ model: User, as: "user" }],
    order: [["createdAt", "ASC"]],
  });
  return rows.map(memberView);
}

/** Locks the team's owner rows so two owners demoting each other at once cannot leave it ownerless. */
async function assertNotLastOwner(teamId: string, userId: string, transaction: import("sequelize").Transaction) {
  const owners = await Membership.findAll({ where: { teamId, role: "owner" }, lock: transaction.LOCK.UPDATE, transaction });
  if (owners.length === 1 && owners[0].userId === userId)
    throw conflict("A team needs at least one owner: make someone else an owner first.");
}

/** Changes a member's role; the trail keeps who changed it from what to what (an unchanged role records nothing). */
export async function changeRole(teamId: string, actorId: string, userId: string, input: ChangeRoleInput): Promise<MemberView> {
  return Membership.sequelize!.transaction(async (transaction) => {
    const m = await Membership.findOne({ where: { teamId, userId }, include: [{ model: User, as: "user" }], transaction });
    if (!m) throw notFound("That person is not a member of this team.");
    if (m.role === "owner" && input.role !== "owner") await assertNotLastOwner(teamId, userId, transaction);
    const from = m.role;
    if (from === input.role) return memberView(m);
    m.role = input.role;
    await m.save({ transaction });
    const { name, email } = memberView(m);
    await recordAudit({ teamId, actorId, kind: "member.role_changed", subject: userId, detail: { name, email, from, to: input.role } }, transaction);
    return memberView(m);
  });
}

/** Removes a member (or, when actor and member are the same person, lets them leave); the trail keeps who it was. */
export async function removeMember(teamId: string, actorId: string, userId: string): Promise<void> {
  await Membership.sequelize!.transaction(async (transaction) => {
    const m = await Membership.findOne({ where: { teamId, userId }, include: [{ model: User, as: "user" }], transaction });
    if (!m) throw notFound("That person is not a member of this team.");
    if (m.role === "owner") await assertNotLastOwner(teamId, userId, transaction);
    const { name, email, role } = memberView(m);
    await m.destroy({ transaction });
    await recordAudit({ teamId, actorId, kind: "member.removed", subject: userId, detail: { name, email, role, left: actorId === userId } }, transaction);
  });
}
