import type { Role } from "@shared/api/teams";
import type { OutgoingMail } from "@server/mail/mailer";

const escape = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/** The invitation e-mail: who invites, to which team, with which role, and the one-time link. */
export function invitationMail(p: { to: string; inviter: string; team: string; role: Role; link: string; expiresAt: Date }): OutgoingMail {
  const until = p.expiresAt.toUTCString();
  return {
    to: p.to,
    subject: `${p.inviter} invited you to ${p.team} on Loopwright`,
    text: `${p.inviter} invited you to join the team "${p.team}" on Loopwright as ${p.role}.\n\nAccept the invitation: ${p.link}\n\nThe link works once and expires ${until}.`,
    html: `<p>${escape(p.inviter)} invited you to join the team <strong>${escape(p.team)}</strong> on Loopwright as ${p.role}.</p>
<p><a href="${escape(p.link)}">Accept the invitation</a></p><p>The link works once and expires ${until}.</p>`,
  };
}
