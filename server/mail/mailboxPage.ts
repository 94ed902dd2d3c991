import type { CapturedMail } from "@server/mail/fakeMailService";

const escape = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
const linkify = (text: string) => escape(text).replace(/(https?:\/\/[^\s<]+)/g, '<a href="$1">$1</a>');

/** The /dev/mailbox page: every message the fake mail service kept, newest first, links clickable. */
export function mailboxPage(messages: CapturedMail[]): string {
  const items = messages
    .map(
      (m) => `<article aria-label="Message ${m.id}"><h2>${escape(m.subject)}</h2>
<p class="meta">To ${escape(m.to)} · ${escape(m.receivedAt)}</p><pre>${linkify(m.text)}</pre></article>`,
    )
    .join("\n");
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Loopwright dev mailbox</title>
<style>body{font-family:system-ui,sans-serif;max-width:48rem;margin:2rem auto;padding:0 1rem;color:#1c2430}
article{border:1px solid #c9d3de;border-radius:6px;padding:0.5rem 1rem;margin:1rem 0}.meta{color:#5a6878;font-size:.9rem}
pre{white-space:pre-wrap;font-family:inherit}</style></head><body>
<h1>Dev mailbox</h1><p>Messages caught by Loopwright's local fake mail service (demo mode only). Nothing here was sent anywhere.</p>
${items || "<p>No messages yet.</p>"}</body></html>`;
}
