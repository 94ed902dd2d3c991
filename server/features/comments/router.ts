import { Router } from "express";
import { createThreadSchema, replySchema } from "@shared/api/comments";
import { diagramWithRole } from "@server/features/diagrams/access";
import { mailComment, type CommentMailDeps } from "@server/features/comments/notify";
import { addReply, createThread, setResolved, threadRootOf, versionDocument } from "@server/features/comments/service";
import { listThreads } from "@server/features/comments/threads";
import { requireUser } from "@server/http/session";
import { parseWith } from "@server/http/validate";

/**
 * Review comments (mounted under /api/diagrams): threads on a saved version, replies, resolve and reopen.
 * Every member may comment, viewers included: reviewing is not editing.
 */
export function commentsRouter(deps: CommentMailDeps): Router {
  const router = Router();
  router.get("/:id/versions/:number/comments", async (req, res) => {
    const { diagram } = await diagramWithRole(requireUser(res).id, req.params.id, "viewer");
    const number = Number(req.params.number);
    await versionDocument(diagram.id, number); // an unknown version is a 404, not an empty list
    res.json({ threads: await listThreads(diagram.id, number) });
  });
  router.post("/:id/versions/:number/comments", async (req, res) => {
    const user = requireUser(res);
    const { diagram } = await diagramWithRole(user.id, req.params.id, "viewer");
    const thread = await createThread(diagram, Number(req.params.number), user.id, parseWith(createThreadSchema, req.body));
    await mailComment(deps, diagram, thread, thread);
    res.status(201).json({ thread });
  });
  router.post("/:id/comments/:commentId/replies", async (req, res) => {
    const user = requireUser(res);
    const { diagram } = await diagramWithRole(user.id, req.params.id, "viewer");
    const root = await threadRootOf(diagram.id, req.params.commentId);
    const { comment, thread } = await addReply(root, user.id, parseWith(replySchema, req.body).body);
    await mailComment(deps, diagram, thread, comment);
    res.status(201).json({ comment, thread });
  });
  for (const [action, resolved] of [["resolve", true], ["reopen", false]] as const) {
    router.post(`/:id/comments/:commentId/${action}`, async (req, res) => {
      const user = requireUser(res);
      const { diagram } = await diagramWithRole(user.id, req.params.id, "viewer");
      const root = await threadRootOf(diagram.id, req.params.commentId);
      res.json({ thread: await setResolved(diagram, root, user.id, resolved) });
    });
  }
  return router;
}
