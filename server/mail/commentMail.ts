import { pinLabel, type ThreadView } from "@shared/api/comments";
import type { OutgoingMail } from "@server/mail/mailer";

const escape = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/** A review comment or reply: who wrote it, on which diagram, version and pin, its text, and the link to it. */
export function commentMail(p: { to: string; writer: string; diagram: string; thread: ThreadView; body: string; isReply: boolean; link: string }): OutgoingMail {
  const where = `v${p.thread.versionNumber}${p.thread.pin ? `, ${pinLabel(p.thread.pin)}` : ""}`;
  const what = p.isReply ? `replied in comment thread ${p.thread.number}` : `commented (thread ${p.thread.number})`;
  return {
    to: p.to,
    subject: `${p.writer} ${p.isReply ? "replied" : "commented"} on ${p.diagram} v${p.thread.versionNumber}`,
    text: `${p.writer} ${what} on "${p.diagram}" (${where}):\n\n${p.body}\n\nOpen the comment: ${p.link}`,
    html: `<p>${escape(p.writer)} ${what} on <strong>${escape(p.diagram)}</strong> (${escape(where)}):</p>
<blockquote style="white-space:pre-wrap">${escape(p.body)}</blockquote>
<p><a href="${escape(p.link)}">Open the comment</a></p>`,
  };
}
