/**
 * Object numbers follow a pattern the organisation chooses, written with two tokens:
 * `YYYY` (a four-digit year) and `N` (a whole number), between literal separators or letters.
 * The default `YYYY.N.N` is the common three-part year.lot.item number (e.g. 2019.4.12).
 */
export const DEFAULT_OBJECT_NUMBER_PATTERN = 'YYYY.N.N';

const TOKEN = /YYYY|N/g;
const PATTERN_SHAPE = /^(?:YYYY|N|[A-Z.\-/ ])+$/;
/** Longest pattern and longest object number accepted (the number's column is 40 wide). */
export const MAX_PATTERN_LENGTH = 40;
export const MAX_OBJECT_NUMBER_LENGTH = 40;

export type PatternProblem = 'empty' | 'long' | 'characters' | 'no-number' | 'adjacent';

type Part = { kind: 'year' } | { kind: 'number' } | { kind: 'literal'; text: string };

function partsOf(pattern: string): Part[] {
  const parts: Part[] = [];
  let last = 0;
  for (const match of pattern.matchAll(TOKEN)) {
    if (match.index > last) parts.push({ kind: 'literal', text: pattern.slice(last, match.index) });
    parts.push({ kind: match[0] === 'YYYY' ? 'year' : 'number' });
    last = match.index + match[0].length;
  }
  if (last < pattern.length) parts.push({ kind: 'literal', text: pattern.slice(last) });
  return parts;
}

/** Why a pattern cannot be used, or null when it can. */
export function patternProblem(pattern: string): PatternProblem | null {
  if (!pattern.trim()) return 'empty';
  if (pattern.length > MAX_PATTERN_LENGTH) return 'long';
  if (!PATTERN_SHAPE.test(pattern)) return 'characters';
  const parts = partsOf(pattern);
  if (!parts.some((p) => p.kind !== 'literal')) return 'no-number';
  // NN or YYYYN: the digits could be split more than one way, and no reader could tell the numbers apart.
  if (parts.some((p, i) => i > 0 && p.kind !== 'literal' && parts[i - 1]!.kind !== 'literal')) return 'adjacent';
  return null;
}

export const PATTERN_PROBLEM_MESSAGES: Record<PatternProblem, string> = {
  empty: 'Enter a pattern such as YYYY.N.N.',
  long: `A pattern has at most ${MAX_PATTERN_LENGTH} characters.`,
  characters: 'A pattern is made of YYYY (a year), N (a number), capital letters and the separators . - / and space.',
  'no-number': 'A pattern needs at least one YYYY or N.',
  adjacent: 'Put a separator or a letter between two numbers of the pattern (NN or YYYYN cannot be told apart).',
};

const isDigit = (c: string | undefined) => c !== undefined && c >= '0' && c <= '9';
const YEAR = /^(?:1[5-9]\d\d|2\d\d\d)$/;
/**
 * A part of an object: a letter or two (2026.3.1a) or further numbered parts, singly or as a range
 * (2026.3.1.1-2), as registrars number the parts of one object. Each group starts with its own
 * separator, so the expression cannot backtrack.
 */
const PART_SUFFIX = /^(?:[a-z]{1,2}|(?:\.[1-9]\d{0,5}(?:-[1-9]\d{0,5})?)+[a-z]{0,2})$/i;
/** N is a whole number of 1 to 6 digits without a leading zero. */
const NUMBER_DIGITS = 6;

/**
 * Whether `value` follows `pattern`, in time linear in the number's length whatever the pattern
 * (a backtracking regular expression takes exponential time on NN…N, issue 9). It walks the pattern
 * part by part keeping every position the number could have reached so far. Written here rather
 * than taken from a linear-time regex package (re2js) so the client does not carry a whole regex
 * engine for three kinds of token.
 */
export function matchesPattern(value: string, pattern: string): boolean {
  let reached: boolean[] = [true];
  for (const part of partsOf(pattern)) {
    const next: boolean[] = [];
    for (let at = 0; at <= value.length; at++) {
      if (!reached[at]) continue;
      if (part.kind === 'literal') {
        if (value.toUpperCase().startsWith(part.text, at)) next[at + part.text.length] = true;
      } else if (part.kind === 'year') {
        if (YEAR.test(value.slice(at, at + 4))) next[at + 4] = true;
      } else if (value[at] !== '0') {
        for (let end = at + 1; end <= at + NUMBER_DIGITS && isDigit(value[end - 1]); end++) next[end] = true;
      }
    }
    if (!next.some(Boolean)) return false;
    reached = next;
  }
  return reached.some((hit, at) => hit && (at === value.length || PART_SUFFIX.test(value.slice(at))));
}

/** An example number in the pattern, for hints and messages. */
export function patternExample(pattern: string): string {
  const numbers = [4, 12, 3, 7];
  let n = 0;
  return pattern.replace(TOKEN, (token) => (token === 'YYYY' ? '2019' : String(numbers[n++ % numbers.length])));
}

export type ObjectNumberCheck = { ok: true; value: string } | { ok: false; message: string };

/** Checks an object number against the pattern (a part suffix allowed); the stored form is trimmed, its case kept as typed. */
export function checkObjectNumber(input: string, pattern = DEFAULT_OBJECT_NUMBER_PATTERN): ObjectNumberCheck {
  const value = input.trim();
  if (!value) return { ok: false, message: 'Object number is required.' };
  if (value.length > MAX_OBJECT_NUMBER_LENGTH) return { ok: false, message: `Object number must be at most ${MAX_OBJECT_NUMBER_LENGTH} characters.` };
  if (!matchesPattern(value, pattern)) {
    return { ok: false, message: `Object number ${value} does not follow the pattern ${pattern} (for example ${patternExample(pattern)}).` };
  }
  return { ok: true, value };
}

/** A key that sorts object numbers in natural order: 2019.4.9 before 2019.4.12. */
export function objectNumberSortKey(value: string): string {
  return value.toUpperCase().replace(/\d+/g, (digits) => digits.replace(/^0+(?=\d)/, '').padStart(10, '0'));
}
