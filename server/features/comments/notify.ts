import type { Logger } from "pino";
import type { CommentView, ThreadView } from "@shared/api/comments";
import { href } from "@shared/routes";
import type { Diagram } from "@server/db/models/diagram";
import { DiagramVersion } from "@server/db/models/diagram";
import { Membership } from "@server/db/models/team";
import { User } from "@server/db/models/user";
import { commentMail } from "@server/mail/commentMail";
import type { Mailer } from "@server/mail/mailer";

export interface CommentMailDeps {
  mailer: Mailer;
  publicUrl: string;
  log: Logger;
}

/**
 * Who hears of a new comment: the diagram's creator, the commented version's author and everyone who wrote in
 * the thread, if still in the team, never the writer.
 */
async function recipients(diagram: Diagram, thread: ThreadView, writerId: string): Promise<User[]> {
  const version = await DiagramVersion.findOne({ where: { diagramId: diagram.id, number: thread.versionNumber }, attributes: ["createdBy"] });
  const ids = new Set([diagram.createdBy, version?.createdBy, thread.author.id, ...thread.replies.map((r) => r.author.id)]);
  ids.delete(writerId);
  ids.delete(undefined);
  const members = await Membership.findAll({ where: { teamId: diagram.teamId, userId: [...ids] as string[] }, attributes: ["userId"] });
  return User.findAll({ where: { id: members.map((m) => m.userId) }, attributes: ["id", "email", "name"] });
}

/**
 * Mails the comment `written` of `thread` with a link to it. Called once the comment is stored; a mail that
 * fails is logged and the comment stands. Awaited, so the answer to the writer means the mail was handed over.
 */
export async function mailComment(deps: CommentMailDeps, diagram: Diagram, thread: ThreadView, written: CommentView): Promise<void> {
  try {
    const link = `${deps.publicUrl}${href.diagramComment(diagram.id, thread.versionNumber, written.id)}`;
    const people = await recipients(diagram, thread, written.author.id);
    const results = await Promise.allSettled(
      people.map((to) =>
        deps.mailer.send(
          commentMail({ to: to.email, writer: written.author.name, diagram: diagram.title, thread, body: written.body, isReply: written.id !== thread.id, link }),
        ),
      ),
    );
    for (const r of results) if (r.status === "rejected") deps.log.warn({ err: (r.reason as Error).message, commentId: written.id }, "comment mail failed");
  } catch (err) {
    deps.log.warn({ err: (err as Error).message, commentId: written.id }, "comment mail failed");
  }
}
