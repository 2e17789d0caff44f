import { ROLE_LABELS, type Role } from '../../shared/roles.js';
import { mailDateTime } from './dates.js';
import type { OutgoingMail } from './mailer.js';

function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

export function layout(title: string, paragraphs: string[], action: { label: string; url: string }, footer: string): string {
  const body = paragraphs.map((p) => `<p style="margin:0 0 16px">${escapeHtml(p)}</p>`).join('');
  return `<!doctype html><html><body style="margin:0;background:#f3f1ec;font-family:Georgia,serif;color:#1d2a36">
<div style="max-width:560px;margin:24px auto;background:#fff;border-top:6px solid #1f4e5f;padding:28px 32px">
<h1 style="font-size:22px;margin:0 0 20px;color:#1f4e5f">${escapeHtml(title)}</h1>${body}
<p style="margin:24px 0"><a href="${escapeHtml(action.url)}" style="background:#1f4e5f;color:#fff;padding:12px 20px;text-decoration:none;border-radius:4px;font-family:Arial,sans-serif">${escapeHtml(action.label)}</a></p>
<p style="font-size:13px;color:#5b6770;margin:0">${escapeHtml(footer)}</p>
</div></body></html>`;
}

export function invitationMail(input: { to: string; name: string; role: Role; organisationName: string; invitedBy: string; url: string; expiresAt: Date }): OutgoingMail {
  const subject = `You are invited to ${input.organisationName} on Shipkeeper`;
  const expires = mailDateTime(input.expiresAt);
  const paragraphs = [
    `Hello ${input.name},`,
    `${input.invitedBy} has invited you to join ${input.organisationName} on Shipkeeper as ${ROLE_LABELS[input.role].toLowerCase()}.`,
    `Choose your password to accept. The link works once and expires on ${expires}.`,
  ];
  const footer = 'If you did not expect this invitation, you can ignore this message.';
  return {
    to: input.to,
    subject,
    text: `${paragraphs.join('\n\n')}\n\nAccept the invitation: ${input.url}\n\n${footer}\n`,
    html: layout(subject, paragraphs, { label: 'Accept the invitation', url: input.url }, footer),
  };
}

export function passwordResetMail(input: { to: string; name: string; url: string; expiresAt: Date }): OutgoingMail {
  const subject = 'Reset your Shipkeeper password';
  const paragraphs = [
    `Hello ${input.name},`,
    'Someone asked to reset the password of your Shipkeeper account. If it was you, choose a new password with the link below.',
    `The link works once and expires on ${mailDateTime(input.expiresAt)}.`,
  ];
  const footer = 'If you did not ask for this, ignore this message: your password stays as it is.';
  return {
    to: input.to,
    subject,
    text: `${paragraphs.join('\n\n')}\n\nChoose a new password: ${input.url}\n\n${footer}\n`,
    html: layout(subject, paragraphs, { label: 'Choose a new password', url: input.url }, footer),
  };
}

/** To a curator or conservator: an incident was logged, or a submitted report holds critical findings. */
export function conditionAlertMail(input: { to: string; name: string; subject: string; lines: string[]; url: string; organisationName: string }): OutgoingMail {
  const paragraphs = [`Hello ${input.name},`, ...input.lines];
  const footer = `You receive this as a curator or conservator of ${input.organisationName}. Follow the site safety plan before anyone enters a space that may be unsafe.`;
  return {
    to: input.to,
    subject: input.subject,
    text: `${paragraphs.join('\n\n')}\n\nOpen it in Shipkeeper: ${input.url}\n\n${footer}\n`,
    html: layout(input.subject, paragraphs, { label: 'Open in Shipkeeper', url: input.url }, footer),
  };
}

/** Review of interpretive text: to curators when it is submitted, to its author when it is published or returned. */
export function interpretationReviewMail(input: { to: string; name: string; subject: string; lines: string[]; url: string; organisationName: string }): OutgoingMail {
  const paragraphs = [`Hello ${input.name},`, ...input.lines];
  const footer = `You receive this as a member of the staff of ${input.organisationName} who writes or reviews interpretive text.`;
  return {
    to: input.to,
    subject: input.subject,
    text: `${paragraphs.join('\n\n')}\n\nOpen it in Shipkeeper: ${input.url}\n\n${footer}\n`,
    html: layout(input.subject, paragraphs, { label: 'Open in Shipkeeper', url: input.url }, footer),
  };
}
