import { z } from 'zod';
import { line, text } from './text.js';

/**
 * The statement a gift's acknowledgment carries when nothing was given in return. IRS Publication
 * 1771 ("Charitable Contributions — Substantiation and Disclosure Requirements") lists, for a
 * contribution of $250 or more, "a statement that no goods or services were provided by the
 * organization in return for the contribution, if that was the case"; this sentence follows that
 * wording (quoted from the publication as remembered and as a secondary page reproduces it, not
 * checked against a copy of the current revision).
 */
export const PUBLICATION_1771_STATEMENT = 'No goods or services were provided by the organization in return for this contribution.';
/** Pub. 1771: a single contribution of $250 or more needs a contemporaneous written acknowledgment. */
export const PUBLICATION_1771_THRESHOLD_CENTS = 25_000;

export const DEFAULT_GIVING_SETTINGS = {
  minimumCents: 100,
  maximumCents: 2_500_000,
  presetCents: [2_500, 5_000, 10_000, 25_000],
  acknowledgmentThresholdCents: PUBLICATION_1771_THRESHOLD_CENTS,
  legalName: '',
  taxId: '',
  acknowledgmentStatement: PUBLICATION_1771_STATEMENT,
};

const cents = (label: string) =>
  z.number({ error: `${label} needs an amount.` }).int(`${label} must be a whole number of cents.`).min(1, `${label} must be more than zero.`).max(100_000_000_00, `${label} is too large.`);

const givingSettingsShape = z.object({
  minimumCents: cents('The minimum gift'),
  maximumCents: cents('The maximum gift'),
  presetCents: z.array(cents('A preset amount')).min(1, 'Give at least one preset amount.').max(6, 'Give at most six preset amounts.'),
  acknowledgmentThresholdCents: cents('The acknowledgment threshold'),
  legalName: line(200, 'Legal name'),
  taxId: line(40, 'Tax identification number'),
  acknowledgmentStatement: text(600, 'Acknowledgment statement', 'free'),
});

/** Bounds that contradict each other, as field → message (both sides check them). */
export function givingSettingsProblems(value: z.infer<typeof givingSettingsShape>): { field: string; message: string }[] {
  const problems: { field: string; message: string }[] = [];
  if (value.maximumCents < value.minimumCents) problems.push({ field: 'maximumCents', message: 'The maximum gift must be at least the minimum.' });
  value.presetCents.forEach((p, i) => {
    if (p < value.minimumCents || p > value.maximumCents) problems.push({ field: `presetCents.${i}`, message: 'Each preset amount must lie between the minimum and the maximum.' });
  });
  if (new Set(value.presetCents).size !== value.presetCents.length) problems.push({ field: 'presetCents', message: 'Each preset amount may appear once.' });
  return problems;
}

export const givingSettings = givingSettingsShape
  .superRefine((value, ctx) => {
    for (const p of givingSettingsProblems(value)) ctx.addIssue({ code: 'custom', message: p.message, path: p.field.split('.').map((s) => (/^\d+$/.test(s) ? Number(s) : s)) });
  })
  .meta({ id: 'GivingSettings' });
export type GivingSettings = z.infer<typeof givingSettings>;
