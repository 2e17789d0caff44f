import type { OutgoingMail } from './mailer.js';
import { layout } from './templates.js';

/** A tour's review, both ways: submitted to the curators, approved or returned to its docent. */
export function tourReviewMail(input: { to: string; name: string; subject: string; lines: string[]; url: string; organisationName: string }): OutgoingMail {
  const paragraphs = [`Hello ${input.name},`, ...input.lines];
  const footer = `You receive this about the review of a tour of ${input.organisationName}.`;
  return {
    to: input.to,
    subject: input.subject,
    text: `${paragraphs.join('\n\n')}\n\nOpen the tour in Shipkeeper: ${input.url}\n\n${footer}\n`,
    html: layout(input.subject, paragraphs, { label: 'Open the tour', url: input.url }, footer),
  };
}
