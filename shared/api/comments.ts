import { z } from "zod";

/** A comment's text: plain text, trimmed, 1–4000 characters. */
export const commentBodySchema = z.string().trim().min(1, "Write a comment").max(4000, "Use at most 4000 characters");

/**
 * Where a thread is pinned on its version's drawing: one block or one wire, by id. The server checks the id
 * against that version's document (422 naming an unknown one).
 * Example: { blockId: "G" } or { wireId: "w3" }.
 */
export const commentPinSchema = z.union([
  z.strictObject({ blockId: z.string().min(1, "Name a block id") }),
  z.strictObject({ wireId: z.string().min(1, "Name a wire id") }),
]);
export type CommentPin = z.infer<typeof commentPinSchema>;

/** `POST /api/diagrams/:id/versions/:n/comments`: a new thread. Example: { body: "Is this gain in rad/s?", pin: { blockId: "G" } }. */
export const createThreadSchema = z.object({
  body: commentBodySchema,
  pin: commentPinSchema.nullable().optional(),
});
export type CreateThreadInput = z.input<typeof createThreadSchema>;

/** `POST /api/diagrams/:id/comments/:commentId/replies`. Example: { body: "Yes, see the datasheet." }. */
export const replySchema = z.object({ body: commentBodySchema });
export type ReplyInput = z.input<typeof replySchema>;

export interface CommentPerson {
  id: string;
  name: string;
}

export interface CommentView {
  id: string;
  body: string;
  author: CommentPerson;
  createdAt: string;
  updatedAt: string;
}

/** A thread: its root comment, its number among the version's threads ("1", "2", … in order of creation), its replies. */
export interface ThreadView extends CommentView {
  number: number;
  versionNumber: number;
  pin: CommentPin | null;
  resolvedAt: string | null;
  resolvedBy: CommentPerson | null;
  replies: CommentView[];
}

/** `GET …/versions/:n/comments` → { threads }, oldest first; `POST …/comments` → 201 { thread }; replies → 201 { comment }; resolve/reopen → { thread }. */
export interface ThreadList {
  threads: ThreadView[];
}

/** The words for a pin: "block G", "wire w3". */
export const pinLabel = (pin: CommentPin): string => ("blockId" in pin ? `block ${pin.blockId}` : `wire ${pin.wireId}`);

/**
 * The words for a pin with its block's label from the drawing, as the panel and the export show them.
 * Example: pinTarget({ blockId: "b3" }, { blocks: [{ id: "b3", label: "Plant" }] }) === "block b3 (Plant)".
 */
export function pinTarget(pin: CommentPin, doc: { blocks: readonly { id: string; label?: string }[] }): string {
  const label = "blockId" in pin ? doc.blocks.find((b) => b.id === pin.blockId)?.label : undefined;
  return label ? `${pinLabel(pin)} (${label})` : pinLabel(pin);
}

/** What the canvas needs to draw a thread's numbered pin. Example: { id: "c1", number: 1, pin: { blockId: "G" }, resolved: false }. */
export interface PinnedThread {
  id: string;
  number: number;
  pin: CommentPin;
  resolved: boolean;
}
