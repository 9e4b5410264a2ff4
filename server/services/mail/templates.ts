// Every e-mail Parlour writes, as text and as HTML with every value escaped. Features fill them in
// and send them through the outbox service (server/features/outbox/outbox.service.ts).
import { dateText } from '../../../shared/units/date-text';
import { escapeHtml } from './escape-html';

/** The client's e-mail with the presentation link. */
export function presentationMail(v: {
  to: string;
  studio: string;
  project: string;
  clientName: string;
  message: string;
  link: string;
  expiresAt: Date;
}) {
  const until = dateText(v.expiresAt);
  // The designer's own message carries their greeting; only without one does the mail greet for them.
  const message = v.message ? `${v.message}\n\n` : `Hello ${v.clientName},\n\n`;
  return {
    to: v.to,
    subject: `${v.studio}: your options for ${v.project}`,
    text: `${message}Walk round each option in 3D and choose one per room:\n${v.link}\n\nThe link works until ${until}. No account or password is needed.\n\n${v.studio}`,
    html:
      (v.message ? `<p style="white-space:pre-wrap">${escapeHtml(v.message)}</p>` : `<p>Hello ${escapeHtml(v.clientName)},</p>`) +
      `<p><a href="${escapeHtml(v.link)}">Walk round each option in 3D and choose one per room</a></p>` +
      `<p>The link works until ${until}. No account or password is needed.</p><p>${escapeHtml(v.studio)}</p>`,
  };
}

/** The designer's e-mail when the client chooses. */
export function choiceMail(v: {
  to: string;
  clientName: string;
  project: string;
  room: string;
  option: string;
  comment: string;
  projectLink: string;
}) {
  const comment = v.comment ? `\n\nTheir comment: “${v.comment}”` : '';
  return {
    to: v.to,
    subject: `${v.clientName} chose ${v.option} for ${v.room} (${v.project})`,
    text: `${v.clientName} chose ${v.option} for ${v.room} in ${v.project}.${comment}\n\nSee the choices on the project: ${v.projectLink}`,
    html:
      `<p>${escapeHtml(v.clientName)} chose <strong>${escapeHtml(v.option)}</strong> for ${escapeHtml(v.room)} in ${escapeHtml(v.project)}.</p>` +
      (v.comment ? `<blockquote>${escapeHtml(v.comment)}</blockquote>` : '') +
      `<p><a href="${escapeHtml(v.projectLink)}">See the choices on the project</a></p>`,
  };
}

/** The e-mail that invites someone to join a studio. */
export function memberInviteMail(v: { to: string; by: string; studio: string; role: string; link: string; days: number }) {
  return {
    to: v.to,
    subject: `${v.by} invited you to ${v.studio} on Parlour`,
    text: `${v.by} invited you to join ${v.studio} on Parlour as ${v.role}.\n\nAccept the invitation: ${v.link}\n\nThe link works for ${v.days} days.`,
    html: `<p>${escapeHtml(v.by)} invited you to join <strong>${escapeHtml(v.studio)}</strong> on Parlour as ${escapeHtml(v.role)}.</p><p><a href="${escapeHtml(v.link)}">Accept the invitation</a></p><p>The link works for ${v.days} days.</p>`,
  };
}
