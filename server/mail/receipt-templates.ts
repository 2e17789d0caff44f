import { formatCents } from '../../shared/calc/money.js';
import { DEDICATION_LABELS, type DedicationKind } from '../../shared/schemas/donations.js';
import { mailDateTime } from './dates.js';
import type { OutgoingMail } from './mailer.js';

function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

export interface ReceiptInput {
  to: string;
  donorName: string;
  organisationName: string;
  legalName: string;
  taxId: string;
  projectTitle: string;
  giftNumber: number;
  receivedAt: Date;
  amountCents: number;
  refundedCents: number;
  currency: string;
  dedication: { kind: DedicationKind; name: string } | null;
  /** The acknowledgment statement, when the gift reaches the threshold; null below it. */
  statement: string | null;
  contactEmail: string;
}

/**
 * The written acknowledgment of a gift: who received it (legal name, tax id), when, how much and
 * for what, and at or above the threshold the statement that nothing was given in return. A
 * corrected acknowledgment after a refund states the amount refunded and what remains.
 */
export function receiptMail(input: ReceiptInput, kind: 'receipt' | 'corrected'): OutgoingMail {
  const money = (cents: number) => formatCents(cents, input.currency);
  const net = input.amountCents - input.refundedCents;
  const legal = input.legalName || input.organisationName;
  const subject = kind === 'receipt'
    ? `Thank you for your gift to ${input.organisationName}`
    : `Corrected acknowledgment of your gift to ${input.organisationName}`;
  const opening = kind === 'receipt'
    ? `Thank you for your gift towards “${input.projectTitle}”. This is your acknowledgment of it; please keep it for your records.`
    : `Part or all of your gift towards “${input.projectTitle}” has been refunded. This corrected acknowledgment replaces the one we sent before.`;
  const rows: [string, string][] = [
    ['Received by', legal],
    ...(input.taxId ? [['Tax identification number', input.taxId] as [string, string]] : []),
    ['Gift number', String(input.giftNumber)],
    ['Date of gift', mailDateTime(input.receivedAt)],
    ['Amount of gift', money(input.amountCents)],
    ...(kind === 'corrected' ? [['Refunded', money(input.refundedCents)], ['Amount of the contribution now', money(net)]] as [string, string][] : []),
    ['For', input.projectTitle],
    ...(input.dedication ? [[DEDICATION_LABELS[input.dedication.kind], input.dedication.name] as [string, string]] : []),
  ];
  const closing = input.contactEmail ? `Questions about your gift: ${input.contactEmail}.` : '';
  const lines = [`Dear ${input.donorName},`, opening, ...rows.map(([k, v]) => `${k}: ${v}`), ...(input.statement ? [input.statement] : []), ...(closing ? [closing] : []), `${legal}`];
  const table = rows.map(([k, v]) => `<tr><th style="text-align:left;padding:4px 12px 4px 0;font-weight:600">${escapeHtml(k)}</th><td style="padding:4px 0">${escapeHtml(v)}</td></tr>`).join('');
  const html = `<!doctype html><html><body style="margin:0;background:#f3f1ec;font-family:Georgia,serif;color:#1d2a36">
<div style="max-width:560px;margin:24px auto;background:#fff;border-top:6px solid #1f4e5f;padding:28px 32px">
<h1 style="font-size:22px;margin:0 0 20px;color:#1f4e5f">${escapeHtml(subject)}</h1>
<p style="margin:0 0 16px">Dear ${escapeHtml(input.donorName)},</p>
<p style="margin:0 0 16px">${escapeHtml(opening)}</p>
<table style="border-collapse:collapse;margin:0 0 16px;font-size:15px">${table}</table>
${input.statement ? `<p style="margin:0 0 16px;font-weight:600">${escapeHtml(input.statement)}</p>` : ''}
${closing ? `<p style="margin:0 0 16px;font-size:13px;color:#5b6770">${escapeHtml(closing)}</p>` : ''}
<p style="margin:0">${escapeHtml(legal)}</p>
</div></body></html>`;
  return { to: input.to, subject, text: `${lines.join('\n\n')}\n`, html };
}
