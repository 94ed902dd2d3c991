import type { CommentPin, CommentView, ThreadView } from "@shared/api/comments";
import { Comment } from "@server/db/models/comment";
import type { Diagram } from "@server/db/models/diagram";
import { DiagramVersion } from "@server/db/models/diagram";
import { recordAudit } from "@server/features/audit/record";
import { threadById } from "@server/features/comments/threads";
import { HttpError, notFound } from "@server/http/errors";
import { isUuid } from "@server/http/ids";

interface StoredDocument {
  blocks?: { id?: unknown }[];
  wires?: { id?: unknown }[];
}

/** The stored document of version `number` (404 when the diagram has no such version). */
export async function versionDocument(diagramId: string, number: number): Promise<StoredDocument> {
  const v = Number.isInteger(number) ? await DiagramVersion.findOne({ where: { diagramId, number }, attributes: ["document"] }) : null;
  if (!v) throw notFound(`Version ${number} of this diagram does not exist.`);
  return (v.document ?? {}) as StoredDocument;
}

/** A pin must name a block or wire of the commented version itself, not of some later drawing. */
function checkPin(pin: CommentPin, doc: StoredDocument, number: number): void {
  const [kind, id, list] = "blockId" in pin ? (["block", pin.blockId, doc.blocks] as const) : (["wire", pin.wireId, doc.wires] as const);
  if ((list ?? []).some((x) => x.id === id)) return;
  const message = `Version ${number} has no ${kind} "${id}".`;
  throw new HttpError(422, "unknown_pin_target", message, [{ path: `pin.${kind}Id`, message }]);
}

/** Starts a thread on version `number`, optionally pinned to one of its blocks or wires. */
export async function createThread(
  diagram: Diagram,
  number: number,
  authorId: string,
  input: { body: string; pin?: CommentPin | null },
): Promise<ThreadView> {
  const doc = await versionDocument(diagram.id, number);
  if (input.pin) checkPin(input.pin, doc, number);
  const root = await Comment.create({
    diagramId: diagram.id,
    versionNumber: number,
    threadId: null,
    pin: input.pin ?? null,
    body: input.body,
    authorId,
  });
  return threadById(root.id);
}

/** The root of the thread `commentId` belongs to (itself when it is a root), on this diagram; else 404. */
export async function threadRootOf(diagramId: string, commentId: string): Promise<Comment> {
  const c = isUuid(commentId) ? await Comment.findOne({ where: { id: commentId, diagramId } }) : null;
  if (!c) throw notFound("No comment with that id on this diagram.");
  return c.threadId ? ((await Comment.findByPk(c.threadId)) as Comment) : c;
}

/** Adds a reply to a thread; answers the reply and the whole thread. */
export async function addReply(root: Comment, authorId: string, body: string): Promise<{ comment: CommentView; thread: ThreadView }> {
  const reply = await Comment.create({ diagramId: root.diagramId, versionNumber: root.versionNumber, threadId: root.id, pin: null, body, authorId });
  const thread = await threadById(root.id);
  return { comment: thread.replies.find((r) => r.id === reply.id)!, thread };
}

/**
 * Resolves (or reopens) a thread and records that in the team's audit trail in the same transaction. Doing it
 * again changes nothing and records nothing.
 */
export async function setResolved(diagram: Diagram, root: Comment, actorId: string, resolved: boolean): Promise<ThreadView> {
  await Comment.sequelize!.transaction(async (transaction) => {
    const row = (await Comment.findByPk(root.id, { lock: transaction.LOCK.UPDATE, transaction }))!;
    if (Boolean(row.resolvedAt) === resolved) return;
    await row.update(resolved ? { resolvedAt: new Date(), resolvedBy: actorId } : { resolvedAt: null, resolvedBy: null }, { transaction });
    await recordAudit(
      {
        teamId: diagram.teamId,
        actorId,
        kind: resolved ? "comment.resolved" : "comment.reopened",
        diagramId: diagram.id,
        subject: row.id,
        detail: { version: row.versionNumber },
      },
      transaction,
    );
  });
  return threadById(root.id);
}
