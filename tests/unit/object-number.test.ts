import { describe, expect, it } from 'vitest';
import { checkObjectNumber, matchesPattern, objectNumberSortKey, patternExample, patternProblem, PATTERN_PROBLEM_MESSAGES } from '../../shared/calc/object-number.js';
import { matchExpression, mergeHighlights } from '../../server/search/search-index.js';

// The three-part year.lot.item number is common practice in museum registration, no published source.
describe('object numbers', () => {
  // part suffixes as registrars write them (common practice, no published source)
  it.each(['2026.3.1a', '2026.3.1b', '2026.3.1.1-2', '2026.3.1.2', '2026.3.1.1.3', '2026.3.1.2a'])('accepts the part number %j, as typed', (input) => {
    expect(checkObjectNumber(input)).toEqual({ ok: true, value: input });
  });

  it.each(['2026.3.1abc', '2026.3.1.0', '2026.3.1.', '2026.3.1-', '2026.3.1..2', '2026.3.1.1-', '2026.3.1 a'])('refuses the malformed part %j', (input) => {
    expect(checkObjectNumber(input).ok).toBe(false);
  });

  it('accepts year.lot.item by default and stores it trimmed, its case as typed', () => {
    expect(checkObjectNumber(' 2019.4.12 ')).toEqual({ ok: true, value: '2019.4.12' });
    expect(checkObjectNumber('1923.1.1')).toMatchObject({ ok: true });
  });

  it.each(['2019.4', '19.4.12', '2019.04.12', '2019-4-12', '2019.4.x', '', '   ', '3019.1.1'])('refuses %j', (input) => {
    expect(checkObjectNumber(input).ok).toBe(false);
  });

  it('follows another pattern, with letters and separators', () => {
    expect(checkObjectNumber('sk-2020-7', 'SK-YYYY-N')).toEqual({ ok: true, value: 'sk-2020-7' });
    expect(checkObjectNumber('SK-2020-7', 'SK-YYYY-N')).toEqual({ ok: true, value: 'SK-2020-7' });
    expect(checkObjectNumber('2020-7', 'SK-YYYY-N').ok).toBe(false);
    expect(checkObjectNumber('12/3', 'N/N')).toMatchObject({ ok: true });
    const refused = checkObjectNumber('2020.7', 'YYYY.N.N');
    expect(refused.ok ? '' : refused.message).toBe('Object number 2020.7 does not follow the pattern YYYY.N.N (for example 2019.4.12).');
  });

  it('checks the pattern itself', () => {
    expect(patternProblem('YYYY.N.N')).toBeNull();
    expect(patternProblem('SK YYYY/N')).toBeNull();
    expect(patternProblem('')).toBe('empty');
    expect(patternProblem('yyyy.n')).toBe('characters');
    expect(patternProblem('ABC')).toBe('no-number');
    expect(patternExample('SK-YYYY-N')).toBe('SK-2019-4');
  });

  it.each(['NN', 'NNNNNNNNNNNNNN', 'YYYYN', 'NYYYY', 'SK-YYYYYYYY', 'YYYY.NN'])('refuses %j: its numbers sit side by side', (pattern) => {
    expect(patternProblem(pattern)).toBe('adjacent');
  });

  it('caps the pattern at 40 characters', () => {
    expect(patternProblem('N.'.repeat(20))).toBeNull();
    expect(patternProblem('N.'.repeat(20) + 'N')).toBe('long');
    expect(PATTERN_PROBLEM_MESSAGES.long).toBe('A pattern has at most 40 characters.');
  });

  it('refuses a number longer than 40 characters before matching it', () => {
    const refused = checkObjectNumber('1.'.repeat(20) + '1', 'N.'.repeat(19) + 'N');
    expect(refused).toEqual({ ok: false, message: 'Object number must be at most 40 characters.' });
  });

  it('matches the same numbers as before for a pattern whose number has several splits', () => {
    // Patterns stored before adjacent numbers were refused still work: NN is 2 to 12 digits, no leading zero.
    expect(matchesPattern('12', 'NN')).toBe(true);
    expect(matchesPattern('1234567', 'NN')).toBe(true);
    expect(matchesPattern('123456789012', 'NN')).toBe(true);
    expect(matchesPattern('1234567890123', 'NN')).toBe(false);
    expect(matchesPattern('1', 'NN')).toBe(false);
    expect(matchesPattern('0123', 'NN')).toBe(false);
    expect(matchesPattern('20191', 'YYYYN')).toBe(true);
    expect(matchesPattern('2019', 'YYYYN')).toBe(false);
  });
});

/**
 * Milliseconds per check in the slowest of several runs of 20 checks each, after one warm-up check.
 * A run's mean rather than one call's time, so a shared machine's pause does not count as the check's.
 */
function worstMsPerCheck(check: () => unknown, runs = 5, calls = 20): number {
  check();
  let worst = 0;
  for (let r = 0; r < runs && worst < 10; r++) {
    const start = performance.now();
    for (let c = 0; c < calls; c++) check();
    worst = Math.max(worst, (performance.now() - start) / calls);
  }
  return worst;
}

// Issue 9: a backtracking regular expression took 0.8–7 s for a 31-character number against 14 N's.
describe('object-number checks take linear time', () => {
  const numbers = ['1'.repeat(31), '1'.repeat(30) + '.', '1'.repeat(40), '1'.repeat(39) + 'X', '1.'.repeat(19) + '1X', '9'.repeat(200) + '!'];

  it.each(['N.N.N.N.N.N.N.N.N.N.N.N.N.N.N.N.N.N.N.N', 'N-N.N/N N-N.N/N N-N.N/N N-N.N/N N-N.N/N', 'YYYY.N.YYYY.N.YYYY.N.YYYY.N.YYYY.N.N.N'])(
    'checks the worst numbers against the allowed pattern %j in under 10 ms',
    (pattern) => {
      expect(patternProblem(pattern)).toBeNull();
      for (const number of numbers) expect(worstMsPerCheck(() => checkObjectNumber(number, pattern))).toBeLessThan(10);
    },
  );

  it.each([14, 16, 40])('checks a 31-character number against a stored pattern of %i N in under 10 ms', (count) => {
    const pattern = 'N'.repeat(count);
    for (const number of ['1'.repeat(30) + '.', '1'.repeat(31) + 'X', '1'.repeat(31)]) {
      expect(worstMsPerCheck(() => checkObjectNumber(number, pattern))).toBeLessThan(10);
      expect(worstMsPerCheck(() => matchesPattern(number, pattern))).toBeLessThan(10);
    }
  });

  it('sorts numbers naturally', () => {
    const numbers = ['2019.4.12', '2019.10.1', '2019.4.9', '2018.1.100'];
    expect([...numbers].sort((a, b) => objectNumberSortKey(a).localeCompare(objectNumberSortKey(b)))).toEqual(['2018.1.100', '2019.4.9', '2019.4.12', '2019.10.1']);
  });
});

describe('search expressions', () => {
  it('quotes each word so that nothing typed is read as FTS5 syntax, and prefixes the last', () => {
    expect(matchExpression('steam gau')).toBe('"steam" "gau" *');
    expect(matchExpression('2019.4.12')).toBe('"2019.4.12" *');
    expect(matchExpression('say "hi" OR NEAR(x')).toBe('"say" """hi""" "OR" "NEAR(x" *');
    expect(matchExpression(' - * ')).toBeNull();
  });

  it('joins a number split by the tokenizer into one marked run', () => {
    expect(mergeHighlights('\uE0002019\uE001.\uE0004\uE001.\uE00012\uE001 gauge')).toBe('\uE0002019.4.12\uE001 gauge');
  });
});
