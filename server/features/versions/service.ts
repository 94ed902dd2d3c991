import type { DiagramVersionView } from "@shared/api/diagrams";
import { checkedSummary, restoredMessage, type CheckedResult, type SaveVersion, type VersionListItem } from "@shared/api/versions";
import { Diagram, DiagramVersion } from "@server/db/models/diagram";
import { User } from "@server/db/models/user";
import { recordAudit } from "@server/features/audit/record";
import type { SaveCheck } from "@server/features/versions/check";
import { diagramDocumentOf } from "@server/features/versions/document";
import { HttpError, notFound } from "@server/http/errors";

type WithAuthor = DiagramVersion & { author?: User };

export const versionView = (v: WithAuthor): DiagramVersionView => ({
  number: v.number,
  document: v.document,
  result: v.result,
  message: v.message,
  createdAt: v.createdAt.toISOString(),
  createdBy: v.author?.name ?? "",
});

const withAuthor = { include: [{ model: User, as: "author", attributes: ["name"] }] };

async function latest(diagramId: string): Promise<WithAuthor | null> {
  return DiagramVersion.findOne({ where: { diagramId }, order: [["number", "DESC"]], ...withAuthor }) as Promise<WithAuthor | null>;
}

async function staleUnless(diagramId: string, baseVersion: number, current: number): Promise<void> {
  if (current === baseVersion) return;
  const winner = await latest(diagramId);
  throw new HttpError(
    409,
    "stale_version",
    `Version ${current} was saved by ${winner?.author?.name ?? "someone"} after you opened version ${baseVersion}. Reload it or save yours as a new diagram.`,
    undefined,
    { latest: winner ? versionView(winner) : null },
  );
}

/**
 * Stores version n+1 of a diagram: the editor's base version must still be the latest (409 with the winner
 * otherwise), and the save-time check re-runs the reducer on it in a worker. Documents with diagram problems, or
 * whose check did not finish, are kept with that as their result, so unfinished work is never lost.
 */
export async function saveVersion(
  diagram: Diagram,
  userId: string,
  input: SaveVersion,
  check: SaveCheck,
  also?: { kind: "version.restored"; detail: Record<string, unknown> },
): Promise<DiagramVersionView> {
  await staleUnless(diagram.id, input.baseVersion, (await latest(diagram.id))?.number ?? 0);
  const checked: CheckedResult = await check.run(input.document, { diagramId: diagram.id });
  const saved = await DiagramVersion.sequelize!.transaction(async (transaction) => {
    // The row lock serialises concurrent saves of one diagram: exactly one of them wins each number.
    await Diagram.findByPk(diagram.id, { lock: transaction.LOCK.UPDATE, transaction });
    const current = ((await DiagramVersion.max("number", { where: { diagramId: diagram.id }, transaction })) as number | null) ?? 0;
    await staleUnless(diagram.id, input.baseVersion, current);
    const v = await DiagramVersion.create(
      { diagramId: diagram.id, number: current + 1, document: input.document, result: checked, message: input.message, createdBy: userId },
      { transaction },
    );
    await recordAudit(
      { teamId: diagram.teamId, actorId: userId, kind: "version.saved", diagramId: diagram.id, subject: String(v.number), detail: { message: input.message } },
      transaction,
    );
    if (also) await recordAudit({ teamId: diagram.teamId, actorId: userId, kind: also.kind, diagramId: diagram.id, subject: String(v.number), detail: also.detail }, transaction);
    diagram.changed("updatedAt", true);
    await diagram.save({ transaction });
    return v;
  });
  return versionView(Object.assign(saved, { author: (await User.findByPk(userId)) ?? undefined }));
}

/** The diagram's versions, newest first; `limit` keeps only the newest ones (an open editor asks for 1 every few seconds). */
export async function listVersions(diagramId: string, limit?: number): Promise<VersionListItem[]> {
  const rows = (await DiagramVersion.findAll({ where: { diagramId }, order: [["number", "DESC"]], limit, ...withAuthor })) as WithAuthor[];
  return rows.map((v) => ({
    number: v.number,
    message: v.message,
    createdAt: v.createdAt.toISOString(),
    createdBy: v.author?.name ?? "",
    ...checkedSummary(v.result as CheckedResult | null),
  }));
}

/**
 * Saves the document of version `from` as the diagram's next version ("Restored from vN"), checked like any save;
 * the trail records the restore beside the save.
 */
export async function restoreVersion(diagram: Diagram, userId: string, from: number, check: SaveCheck): Promise<DiagramVersionView> {
  const source = await getVersion(diagram.id, from);
  const baseVersion = (await latest(diagram.id))?.number ?? 0;
  const document = diagramDocumentOf(source.document);
  return saveVersion(diagram, userId, { baseVersion, message: restoredMessage(from), document }, check, {
    kind: "version.restored",
    detail: { from },
  });
}

export async function getVersion(diagramId: string, number: number): Promise<DiagramVersionView> {
  const v = Number.isInteger(number)
    ? ((await DiagramVersion.findOne({ where: { diagramId, number }, ...withAuthor })) as WithAuthor | null)
    : null;
  if (!v) throw notFound(`Version ${number} of this diagram does not exist.`);
  return versionView(v);
}
