import { createHash } from "node:crypto";
import { Diagram, DiagramVersion } from "@server/db/models/diagram";
import { ShareLink } from "@server/db/models/shareLink";
import { HttpError, notFound } from "@server/http/errors";

/** Tokens are 32 random bytes in base64url: anything else is unknown without asking the database. */
const TOKEN_SHAPE = /^[A-Za-z0-9_-]{43}$/;

/** Only this hash of a token is stored or compared: a leaked table opens nothing. */
export const hashShareToken = (token: string): string => createHash("sha256").update(token).digest("hex");

/** What a working share link grants: one version of one diagram, nothing else. */
export interface SharedTarget {
  linkId: string;
  diagramId: string;
  teamId: string;
  title: string;
  version: DiagramVersion;
}

/**
 * The version a share link's token opens (the fixed one, or the diagram's latest), or an HttpError: 404 for an
 * unknown token, 410 for a revoked or expired link. Opens nothing and counts nothing: callers that serve the
 * reader (GET /api/shared/:token) record the opening themselves.
 * Example: const { title, version } = await resolveShareToken(req.params.token).
 */
export async function resolveShareToken(token: string): Promise<SharedTarget> {
  const link = TOKEN_SHAPE.test(token) ? await ShareLink.findOne({ where: { tokenHash: hashShareToken(token) } }) : null;
  const diagram = link ? await Diagram.findByPk(link.diagramId) : null;
  if (!link || !diagram) throw notFound("This share link does not exist. Check that it was copied whole.");
  if (link.revokedAt) throw new HttpError(410, "share_link_revoked", "This share link was revoked. Ask the person who sent it for a new one.");
  if (link.expiresAt && link.expiresAt.getTime() <= Date.now())
    throw new HttpError(410, "share_link_expired", `This share link expired on ${link.expiresAt.toISOString().slice(0, 10)}. Ask the person who sent it for a new one.`);
  const version = await DiagramVersion.findOne({
    where: link.versionNumber === null ? { diagramId: diagram.id } : { diagramId: diagram.id, number: link.versionNumber },
    order: [["number", "DESC"]],
  });
  if (!version) throw notFound("The version this share link opens does not exist.");
  return { linkId: link.id, diagramId: diagram.id, teamId: diagram.teamId, title: diagram.title, version };
}
