import { describe, expect, it } from 'vitest';
import { checkObjectNumber, objectNumberSortKey, patternExample, patternProblem } from '../../shared/calc/object-number.js';
import { matchExpression, mergeHighlights } from '../../server/search/search-index.js';

// The three-part year.lot.item number is common practice in museum registration, no published source.
describe('object numbers', () => {
  it('accepts year.lot.item by default and stores it trimmed and upper-cased', () => {
    expect(checkObjectNumber(' 2019.4.12 ')).toEqual({ ok: true, value: '2019.4.12' });
    expect(checkObjectNumber('1923.1.1')).toMatchObject({ ok: true });
  });

  it.each(['2019.4', '2019.4.12.1', '19.4.12', '2019.04.12', '2019-4-12', '2019.4.x', '', '   ', '3019.1.1'])('refuses %j', (input) => {
    expect(checkObjectNumber(input).ok).toBe(false);
  });

  it('follows another pattern, with letters and separators', () => {
    expect(checkObjectNumber('sk-2020-7', 'SK-YYYY-N')).toEqual({ ok: true, value: 'SK-2020-7' });
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
