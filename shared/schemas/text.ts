import { z } from 'zod';

/**
 * The one rule for characters in text fields. Refused everywhere: C0 controls (U+0000–U+001F),
 * DEL (U+007F) and C1 controls (U+0080–U+009F), the categories Cc of Unicode; the bidirectional
 * embeddings and overrides (U+202A–U+202E), isolates (U+2066–U+2069) and marks (U+200E, U+200F,
 * U+061C) of Unicode Standard Annex #9, which can make text display in an order other than the
 * one stored (the "Trojan Source" attack, CVE-2021-42574); and lone surrogates, which are not text.
 * Free text (several lines) may hold tab and line feed; CR LF and a lone CR become LF. Single
 * lines also refuse the line and paragraph separators U+2028 and U+2029.
 */
export const INVALID_CHARACTERS = 'invalid_characters';

const CONTROL = /[\u0000-\u001F\u007F-\u009F]/;
/** Tab, LF and CR (which becomes LF) are kept in free text. */
const CONTROL_BUT_LINE_BREAKS = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F]/;
const BIDI = /[\u202A-\u202E\u2066-\u2069\u200E\u200F\u061C]/;
const SEPARATOR = /[\u2028\u2029]/;
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

export type TextKind = 'line' | 'free';

function codePoint(char: string): string {
  return `U+${char.codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')}`;
}

/** Why `value` may not be stored, or null when it may. */
export function characterProblem(value: string, kind: TextKind = 'line', label = 'This field'): string | null {
  const control = value.match(kind === 'free' ? CONTROL_BUT_LINE_BREAKS : CONTROL)?.[0];
  if (control) {
    const allowed = kind === 'free' ? ' Only tabs and line breaks are allowed.' : '';
    return `${label} contains a control character (${codePoint(control)}). Remove it and try again.${allowed}`;
  }
  const bidi = value.match(BIDI)?.[0];
  if (bidi) return `${label} contains a text-direction character (${codePoint(bidi)}) that can disguise what it says. Remove it and try again.`;
  const separator = kind === 'line' ? value.match(SEPARATOR)?.[0] : undefined;
  if (separator) return `${label} must be one line: it contains a line separator (${codePoint(separator)}).`;
  if (LONE_SURROGATE.test(value)) return `${label} contains a broken character (a lone surrogate). Remove it and try again.`;
  return null;
}

/** `value` without the characters `characterProblem` refuses (for writing out stored text). */
export function withoutInvalidCharacters(value: string, kind: TextKind = 'line'): string {
  const cleaned = kind === 'free' ? value.replace(/\r\n?/g, '\n') : value;
  const refused = [kind === 'free' ? CONTROL_BUT_LINE_BREAKS : CONTROL, BIDI, ...(kind === 'line' ? [SEPARATOR] : []), LONE_SURROGATE];
  return cleaned.replace(new RegExp(refused.map((r) => r.source).join('|'), 'g'), '');
}

/** Whether a zod issue came from this rule (the API answers those 422, not 400). */
export function isInvalidCharactersIssue(issue: z.core.$ZodIssue): boolean {
  return issue.code === 'custom' && (issue.params as { rule?: unknown } | undefined)?.rule === INVALID_CHARACTERS;
}

/** Adds the rule to a string schema; put it first so that it sees what was sent. */
export function refuseInvalidCharacters<T extends z.ZodString>(schema: T, label = 'This field', kind: TextKind = 'line'): T {
  return schema.check((ctx) => {
    const message = characterProblem(ctx.value, kind, label);
    if (message) ctx.issues.push({ code: 'custom', message, input: ctx.value, params: { rule: INVALID_CHARACTERS } });
  }) as T;
}

function multiline(label: string) {
  return refuseInvalidCharacters(z.string().overwrite((v) => v.replace(/\r\n?/g, '\n')), label, 'free');
}

/** A trimmed line of text, possibly empty. */
export function line(max: number, label = 'This field') {
  return refuseInvalidCharacters(z.string(), label)
    .trim()
    .max(max, `${label} must be at most ${max} characters.`);
}

/** Trimmed, non-empty text: one line, or several when `kind` is 'free'. */
export function text(max: number, label = 'This field', kind: TextKind = 'line') {
  return (kind === 'free' ? multiline(label) : refuseInvalidCharacters(z.string(), label))
    .trim()
    .min(1, `${label} is required.`)
    .max(max, `${label} must be at most ${max} characters.`);
}

/** Trimmed text of several lines (tabs and line feeds allowed; CR LF becomes LF), possibly empty. */
export function freeText(max: number, label = 'This field') {
  return multiline(label)
    .trim()
    .max(max, `${label} must be at most ${max} characters.`);
}
