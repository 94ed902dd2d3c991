import { z } from "zod";

/** The longest a share link may live; a link that must outlive it is made again. */
export const MAX_SHARE_LINK_DAYS = 365;

/**
 * Creating a read-only share link: to a fixed version, or (null) always to the latest one; expiring after a
 * number of days, or (null) never. Example: { version: 3, expiresInDays: 14 }.
 */
export const createShareLinkSchema = z.object({
  version: z.number().int("version is a whole number").positive("version is at least 1").nullable().default(null),
  expiresInDays: z
    .number()
    .int("expiresInDays is a whole number of days")
    .positive("expiresInDays is at least 1")
    .max(MAX_SHARE_LINK_DAYS, `expiresInDays is at most ${MAX_SHARE_LINK_DAYS}`)
    .nullable()
    .default(null),
});
export type CreateShareLinkInput = z.input<typeof createShareLinkSchema>;

/** The 201 answer: the only time the link's URL (and so its token) is ever shown. */
export interface CreatedShareLink {
  id: string;
  url: string;
  version: number | null;
  expiresAt: string | null;
}

/** A link as lists show it: never its token. */
export interface ShareLinkView {
  id: string;
  /** null: always the latest version. */
  version: number | null;
  creator: { id: string; name: string; email: string } | null;
  createdAt: string;
  expiresAt: string | null;
  revokedAt: string | null;
  lastOpenedAt: string | null;
  timesOpened: number;
}

/** The team page's list: each link with the diagram it opens. */
export interface TeamShareLinkView extends ShareLinkView {
  diagram: { id: string; title: string };
}

/** `GET /api/shared/:token`: all a link's reader gets. */
export interface SharedVersionView {
  diagram: { title: string };
  version: { number: number; document: unknown; result: unknown };
}

/** Whether a link still opens, as of `now` (ms). */
export function shareLinkState(link: Pick<ShareLinkView, "expiresAt" | "revokedAt">, now: number): "active" | "revoked" | "expired" {
  if (link.revokedAt) return "revoked";
  if (link.expiresAt && Date.parse(link.expiresAt) <= now) return "expired";
  return "active";
}
