import { createHash, randomBytes } from "node:crypto";
import type { InvitationPreview, InvitationView, InviteInput } from "@shared/api/teams";
import { href } from "@shared/routes";
import { Invitation, Membership, Team } from "@server/db/models/team";
import { User } from "@server/db/models/user";
import { recordAudit } from "@server/features/audit/record";
import { HttpError, conflict, forbidden, notFound } from "@server/http/errors";
import { isUuid } from "@server/http/ids";
import { invitationMail } from "@server/mail/invitationMail";
import type { Mailer } from "@server/mail/mailer";

const VALID_FOR_MS = 7 * 24 * 3600 * 1000;
// Only the hash is stored: a database leak must not hand out working invitation links.
const tokenHash = (token: string) => createHash("sha256").update(token).digest("hex");

const view = (i: Invitation): InvitationView => ({
  id: i.id,
  email: i.email,
  role: i.role,
  expiresAt: i.expiresAt.toISOString(),
  invitedBy: (i as unknown as { inviter?: User }).inviter?.name ?? "",
});

/** Pending (not accepted, not expired) invitations of a team. */
export async function listInvitations(teamId: string): Promise<InvitationView[]> {
  const rows = await Invitation.findAll({
    where: { teamId, acceptedAt: null },
    include: [{ model: User, as: "inviter" }],
    order: [["createdAt", "DESC"]],
  });
  return rows.filter((i) => i.expiresAt.getTime() > Date.now()).map(view);
}

/**
 * Creates a one-time invitation (replacing an older pending one for the same e-mail), records it in the trail and
 * mails its link, all in one transaction: if the mail cannot be sent, nothing changes, the older invitation stays.
 */
export async function invite(
  deps: { mailer: Mailer; publicUrl: string },
  teamId: string,
  inviter: { id: string; name: string },
  input: InviteInput,
): Promise<InvitationView> {
  const team = await Team.findByPk(teamId);
  if (!team) throw notFound("Team not found.");
  const existing = await User.findOne({ where: { email: input.email } });
  if (existing && (await Membership.findOne({ where: { teamId, userId: existing.id } })))
    throw conflict(`${input.email} is already a member of this team.`);
  const token = randomBytes(32).toString("base64url");
  const expiresAt = new Date(Date.now() + VALID_FOR_MS);
  const invitation = await Invitation.sequelize!.transaction(async (transaction) => {
    await Invitation.destroy({ where: { teamId, email: input.email, acceptedAt: null }, transaction });
    const created = await Invitation.create(
      { teamId, email: input.email, role: input.role, tokenHash: tokenHash(token), invitedBy: inviter.id, expiresAt, acceptedAt: null },
      { transaction },
    );
    await recordAudit(
      { teamId, actorId: inviter.id, kind: "invitation.sent", subject: created.id, detail: { email: input.email, role: input.role } },
      transaction,
    );
    const link = `${deps.publicUrl}${href.invite(token)}`;
    try {
      await deps.mailer.send(invitationMail({ to: input.email, inviter: inviter.name, team: team.name, role: input.role, link, expiresAt }));
    } catch {
      throw new HttpError(502, "mail_failed", "The invitation e-mail could not be sent. Check the mail settings and try again.");
    }
    return created;
  });
  return { ...view(invitation), invitedBy: inviter.name };
}

/** Withdraws a pending invitation; the trail keeps whom it was for. */
export async function revokeInvitation(teamId: string, invitationId: string, actorId: string): Promise<void> {
  await Invitation.sequelize!.transaction(async (transaction) => {
    const i = isUuid(invitationId)
      ? await Invitation.findOne({ where: { id: invitationId, teamId, acceptedAt: null }, lock: transaction.LOCK.UPDATE, transaction })
      : null;
    if (!i) throw notFound("No pending invitation with that id.");
    await i.destroy({ transaction });
    await recordAudit({ teamId, actorId, kind: "invitation.revoked", subject: i.id, detail: { email: i.email, role: i.role } }, transaction);
  });
}

async function findUsable(token: string, lock?: import("sequelize").Transaction): Promise<Invitation> {
  const invitation = await Invitation.findOne({
    where: { tokenHash: tokenHash(token) },
    include: lock ? [] : [{ model: User, as: "inviter" }, { model: Team, as: "team" }],
    ...(lock ? { transaction: lock, lock: lock.LOCK.UPDATE } : {}),
  });
  if (!invitation || invitation.acceptedAt) throw notFound("This invitation link is not valid or was already used.");
  if (invitation.expiresAt.getTime() <= Date.now())
    throw new HttpError(410, "expired", "This invitation has expired. Ask a team owner for a new one.");
  return invitation;
}

export async function previewInvitation(token: string): Promise<InvitationPreview> {
  const i = await findUsable(token);
  const related = i as unknown as { inviter: User; team: Team };
  return {
    teamName: related.team.name,
    email: i.email,
    role: i.role,
    invitedBy: related.inviter.name,
    expiresAt: i.expiresAt.toISOString(),
    accountExists: (await User.count({ where: { email: i.email } })) > 0,
  };
}

/** Joins the signed-in user to the team; the link works once and only for the invited e-mail. */
export async function acceptInvitation(token: string, user: { id: string; email: string }): Promise<string> {
  return Invitation.sequelize!.transaction(async (transaction) => {
    const i = await findUsable(token, transaction);
    if (i.email !== user.email)
      throw forbidden(`This invitation is for ${i.email}. Sign out and sign in or sign up with that e-mail.`);
    const member = await Membership.findOne({ where: { teamId: i.teamId, userId: user.id }, transaction });
    if (!member) await Membership.create({ teamId: i.teamId, userId: user.id, role: i.role }, { transaction });
    i.acceptedAt = new Date();
    await i.save({ transaction });
    await recordAudit(
      { teamId: i.teamId, actorId: user.id, kind: "invitation.accepted", subject: i.id, detail: { email: i.email, role: i.role, invitedBy: i.invitedBy } },
      transaction,
    );
    return i.teamId;
  });
}
