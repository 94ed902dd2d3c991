import { randomBytes } from "node:crypto";
import type { z } from "zod";
import type { createShareLinkSchema, CreatedShareLink, SharedVersionView, ShareLinkView, TeamShareLinkView } from "@shared/api/shareLinks";
import { href } from "@shared/routes";
import { Diagram, DiagramVersion } from "@server/db/models/diagram";
import { ShareLink } from "@server/db/models/shareLink";
import { User } from "@server/db/models/user";
import { recordAudit } from "@server/features/audit/record";
import { hashShareToken, resolveShareToken } from "@server/features/shareLinks/resolve";
import { HttpError, notFound } from "@server/http/errors";
import { isUuid } from "@server/http/ids";

type WithRelations = ShareLink & { creator?: User | null; diagram?: Diagram };

const DAY_MS = 24 * 3600 * 1000;
const iso = (d: Date | null) => (d ? d.toISOString() : null);

const view = (l: WithRelations): ShareLinkView => ({
  id: l.id,
  version: l.versionNumber,
  creator: l.creator ? { id: l.creator.id, name: l.creator.name, email: l.creator.email } : null,
  createdAt: l.createdAt.toISOString(),
  expiresAt: iso(l.expiresAt),
  revokedAt: iso(l.revokedAt),
  lastOpenedAt: iso(l.lastOpenedAt),
  timesOpened: l.timesOpened,
});

const withCreator = { model: User, as: "creator", attributes: ["id", "name", "email"] };

/**
 * Makes a link to the diagram's latest version (version null) or to a fixed one. The token (32 random bytes,
 * 256 bits) leaves the server once, inside the answer's URL; the table keeps only its hash.
 */
export async function createShareLink(
  diagram: Diagram,
  userId: string,
  input: z.output<typeof createShareLinkSchema>,
  publicUrl: string,
): Promise<CreatedShareLink> {
  const exists = await DiagramVersion.count({ where: input.version === null ? { diagramId: diagram.id } : { diagramId: diagram.id, number: input.version } });
  if (!exists) {
    const message = input.version === null ? "This diagram has no saved version yet: save one before sharing it." : `Version ${input.version} of this diagram does not exist.`;
    throw new HttpError(422, "validation", `version: ${message}`, [{ path: "version", message }]);
  }
  const token = randomBytes(32).toString("base64url");
  const expiresAt = input.expiresInDays === null ? null : new Date(Date.now() + input.expiresInDays * DAY_MS);
  const link = await ShareLink.sequelize!.transaction(async (transaction) => {
    const created = await ShareLink.create(
      { diagramId: diagram.id, versionNumber: input.version, tokenHash: hashShareToken(token), createdBy: userId, expiresAt },
      { transaction },
    );
    await recordAudit(
      { teamId: diagram.teamId, actorId: userId, kind: "share_link.created", diagramId: diagram.id, subject: created.id, detail: { version: input.version, expiresAt: iso(expiresAt) } },
      transaction,
    );
    return created;
  });
  return { id: link.id, url: `${publicUrl}${href.share(token)}`, version: link.versionNumber, expiresAt: iso(link.expiresAt) };
}

/** A diagram's links, newest first, revoked and expired ones included (they still tell who shared what). */
export async function listDiagramShareLinks(diagramId: string): Promise<ShareLinkView[]> {
  const rows = (await ShareLink.findAll({ where: { diagramId }, include: [withCreator], order: [["createdAt", "DESC"]] })) as WithRelations[];
  return rows.map(view);
}

/** Every link of a team's diagrams, newest first, each with its diagram's title. */
export async function listTeamShareLinks(teamId: string): Promise<TeamShareLinkView[]> {
  const rows = (await ShareLink.findAll({
    include: [withCreator, { model: Diagram, as: "diagram", attributes: ["id", "title"], where: { teamId }, required: true }],
    order: [["createdAt", "DESC"]],
  })) as WithRelations[];
  return rows.map((l) => ({ ...view(l), diagram: { id: l.diagram!.id, title: l.diagram!.title } }));
}

/** Revokes a link of this diagram; revoking it again changes nothing. */
export async function revokeShareLink(diagram: Diagram, linkId: string, userId: string): Promise<void> {
  const link = isUuid(linkId) ? await ShareLink.findOne({ where: { id: linkId, diagramId: diagram.id } }) : null;
  if (!link) throw notFound("No share link with that id on this diagram.");
  if (link.revokedAt) return;
  await ShareLink.sequelize!.transaction(async (transaction) => {
    link.revokedAt = new Date();
    await link.save({ transaction });
    await recordAudit({ teamId: diagram.teamId, actorId: userId, kind: "share_link.revoked", diagramId: diagram.id, subject: link.id }, transaction);
  });
}

/** What a link's reader sees; each opening moves the link's count and last-opened time and the team's audit row. */
export async function openSharedVersion(token: string): Promise<SharedVersionView> {
  const target = await resolveShareToken(token);
  await ShareLink.sequelize!.transaction(async (transaction) => {
    await ShareLink.sequelize!.query("UPDATE share_links SET times_opened = times_opened + 1, last_opened_at = now() WHERE id = :id", {
      replacements: { id: target.linkId },
      transaction,
    });
    await recordAudit({ teamId: target.teamId, actorId: null, kind: "share_link.opened", diagramId: target.diagramId, subject: target.linkId }, transaction);
  });
  const { number, document, result } = target.version;
  return { diagram: { title: target.title }, version: { number, document, result } };
}
