/**
 * Object numbers follow a pattern the organisation chooses, written with two tokens:
 * `YYYY` (a four-digit year) and `N` (a whole number), between literal separators or letters.
 * The default `YYYY.N.N` is the common three-part year.lot.item number (e.g. 2019.4.12).
 */
export const DEFAULT_OBJECT_NUMBER_PATTERN = 'YYYY.N.N';

const TOKEN = /YYYY|N/g;
const PATTERN_SHAPE = /^(?:YYYY|N|[A-Z.\-/ ])+$/;

export type PatternProblem = 'empty' | 'characters' | 'no-number';

/** Why a pattern cannot be used, or null when it can. */
export function patternProblem(pattern: string): PatternProblem | null {
  if (!pattern.trim()) return 'empty';
  if (!PATTERN_SHAPE.test(pattern)) return 'characters';
  if (!/YYYY|N/.test(pattern)) return 'no-number';
  return null;
}

export const PATTERN_PROBLEM_MESSAGES: Record<PatternProblem, string> = {
  empty: 'Enter a pattern such as YYYY.N.N.',
  characters: 'A pattern is made of YYYY (a year), N (a number), capital letters and the separators . - / and space.',
  'no-number': 'A pattern needs at least one YYYY or N.',
};

function escapeRegExp(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\/-]/g, '\\$&');
}

export function patternRegExp(pattern: string): RegExp {
  let source = '';
  let last = 0;
  for (const match of pattern.matchAll(TOKEN)) {
    source += escapeRegExp(pattern.slice(last, match.index));
    source += match[0] === 'YYYY' ? '(1[5-9]\\d\\d|2\\d\\d\\d)' : '([1-9]\\d{0,5})';
    last = match.index! + match[0].length;
  }
  source += escapeRegExp(pattern.slice(last));
  return new RegExp(`^${source}$`);
}

/** An example number in the pattern, for hints and messages. */
export function patternExample(pattern: string): string {
  const numbers = [4, 12, 3, 7];
  let n = 0;
  return pattern.replace(TOKEN, (token) => (token === 'YYYY' ? '2019' : String(numbers[n++ % numbers.length])));
}

export type ObjectNumberCheck = { ok: true; value: string } | { ok: false; message: string };

/** Checks an object number against the pattern; the stored form is trimmed and upper-cased. */
export function checkObjectNumber(input: string, pattern = DEFAULT_OBJECT_NUMBER_PATTERN): ObjectNumberCheck {
  const value = input.trim().toUpperCase();
  if (!value) return { ok: false, message: 'Object number is required.' };
  if (!patternRegExp(pattern).test(value)) {
    return { ok: false, message: `Object number ${value} does not follow the pattern ${pattern} (for example ${patternExample(pattern)}).` };
  }
  return { ok: true, value };
}

/** A key that sorts object numbers in natural order: 2019.4.9 before 2019.4.12. */
export function objectNumberSortKey(value: string): string {
  return value.toUpperCase().replace(/\d+/g, (digits) => digits.replace(/^0+(?=\d)/, '').padStart(10, '0'));
}
