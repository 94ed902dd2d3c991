import { Op } from "sequelize";
import type { CommentPerson, CommentView, ThreadView } from "@shared/api/comments";
import { Comment } from "@server/db/models/comment";
import { User } from "@server/db/models/user";

type WithPeople = Comment & { author?: User; resolver?: User | null };

const person = (u: User | null | undefined, id: string): CommentPerson => ({ id, name: u?.name ?? "" });

const withPeople = {
  include: [
    { model: User, as: "author", attributes: ["id", "name"] },
    { model: User, as: "resolver", attributes: ["id", "name"] },
  ],
};

const commentView = (c: WithPeople): CommentView => ({
  id: c.id,
  body: c.body,
  author: person(c.author, c.authorId),
  createdAt: c.createdAt.toISOString(),
  updatedAt: c.updatedAt.toISOString(),
});

function threadView(root: WithPeople, number: number, replies: WithPeople[]): ThreadView {
  return {
    ...commentView(root),
    number,
    versionNumber: root.versionNumber,
    pin: root.pin,
    resolvedAt: root.resolvedAt ? root.resolvedAt.toISOString() : null,
    resolvedBy: root.resolvedBy ? person(root.resolver, root.resolvedBy) : null,
    replies: replies.map(commentView),
  };
}

// Threads are numbered 1, 2, … in order of creation on their version; none is ever deleted, so a number stays.
const ORDER: [string, string][] = [["createdAt", "ASC"], ["id", "ASC"]];

/** A version's thread roots, oldest first (thread n is at index n − 1). */
export const threadRoots = (diagramId: string, versionNumber: number) =>
  Comment.findAll({ where: { diagramId, versionNumber, threadId: null }, order: ORDER, ...withPeople }) as Promise<WithPeople[]>;

/** Every thread of a version with its replies, oldest first. */
export async function listThreads(diagramId: string, versionNumber: number): Promise<ThreadView[]> {
  const roots = await threadRoots(diagramId, versionNumber);
  const replies = roots.length
    ? ((await Comment.findAll({ where: { threadId: roots.map((r) => r.id) }, order: ORDER, ...withPeople })) as WithPeople[])
    : [];
  return roots.map((root, i) => threadView(root, i + 1, replies.filter((r) => r.threadId === root.id)));
}

/** One thread as the API shows it, by its root's id. */
export async function threadById(rootId: string): Promise<ThreadView> {
  const root = (await Comment.findByPk(rootId, withPeople)) as WithPeople;
  const [earlier, replies] = await Promise.all([
    Comment.count({
      where: {
        diagramId: root.diagramId,
        versionNumber: root.versionNumber,
        threadId: null,
        [Op.or]: [{ createdAt: { [Op.lt]: root.createdAt } }, { createdAt: root.createdAt, id: { [Op.lt]: root.id } }],
      },
    }),
    Comment.findAll({ where: { threadId: root.id }, order: ORDER, ...withPeople }) as Promise<WithPeople[]>,
  ]);
  return threadView(root, earlier + 1, replies);
}
