import { describe, expect, it } from 'vitest';
import { characterProblem, freeText, isInvalidCharactersIssue, line, text, withoutInvalidCharacters } from '../../shared/schemas/text.js';

// Ranges: Unicode general category Cc (C0 U+0000–U+001F, DEL U+007F, C1 U+0080–U+009F) and the
// explicit directional formatting characters of Unicode Standard Annex #9 (UAX #9), section 2.
const hex = (cp: number) => `U+${cp.toString(16).toUpperCase().padStart(4, '0')}`;
const range = (from: number, to: number) => Array.from({ length: to - from + 1 }, (_, i) => from + i);
const C0 = range(0x00, 0x1f);
const C1 = range(0x80, 0x9f);
const BIDI = [...range(0x202a, 0x202e), ...range(0x2066, 0x2069), 0x200e, 0x200f, 0x061c];

describe('the character rule of text fields', () => {
  it.each([...C0, 0x7f, ...C1].map(hex))('refuses %s in a line, naming it and the field', (name) => {
    const cp = Number.parseInt(name.slice(2), 16);
    expect(characterProblem(`a${String.fromCodePoint(cp)}b`, 'line', 'Name')).toBe(`Name contains a control character (${name}). Remove it and try again.`);
  });

  it.each(BIDI.map(hex))('refuses the direction character %s in lines and free text', (name) => {
    const char = String.fromCodePoint(Number.parseInt(name.slice(2), 16));
    expect(characterProblem(`a${char}b`, 'line', 'Name')).toContain(`(${name})`);
    expect(characterProblem(`a${char}b`, 'free', 'Notes')).toContain(`(${name})`);
  });

  it('allows tab and line breaks in free text only', () => {
    expect(characterProblem('a\tb\nc\r\nd', 'free')).toBeNull();
    expect(characterProblem('a\tb', 'line', 'Name')).toBe('Name contains a control character (U+0009). Remove it and try again.');
    expect(characterProblem('a\nb', 'line')).not.toBeNull();
    expect(characterProblem('a\u0000b', 'free', 'Notes')).toBe('Notes contains a control character (U+0000). Remove it and try again. Only tabs and line breaks are allowed.');
    expect(characterProblem('a\u0085b', 'free')).not.toBeNull();
    expect(characterProblem('a\u2028b', 'line')).not.toBeNull();
    expect(characterProblem('a\u2028b', 'free')).toBeNull();
  });

  it('allows ordinary text of any script, and emoji', () => {
    for (const ok of ['Engine room 3-110-2-E', 'Kesselraum Nr. 2 — Zündung', 'Ἀθηνᾶ', 'שלום', 'مرحبا', '機関室', '🚢 ⚓', 'a\u200Db', '€ ½ ©']) {
      expect(characterProblem(ok, 'line'), ok).toBeNull();
    }
  });

  it('refuses a lone surrogate but not a pair', () => {
    expect(characterProblem('a\uD83Db')).not.toBeNull();
    expect(characterProblem('a\uDEA2b')).not.toBeNull();
    expect(characterProblem('a\uD83D\uDEA2b')).toBeNull();
  });

  it('makes the schemas refuse with an issue the API answers 422', () => {
    for (const [schema, value] of [
      [text(80, 'Name'), '\u0000'],
      [line(80, 'Maker'), 'a\u202Eb'],
      [freeText(80, 'Notes'), 'x\u0085'],
    ] as const) {
      const result = schema.safeParse(value);
      expect(result.success).toBe(false);
      expect(result.error!.issues.some(isInvalidCharactersIssue)).toBe(true);
    }
    expect(text(80, 'Name').safeParse('   ').error!.issues.some(isInvalidCharactersIssue)).toBe(false);
  });

  it('keeps tab and newline in free text and turns CR LF into LF', () => {
    expect(freeText(80).parse('a\tb\nc')).toBe('a\tb\nc');
    expect(freeText(80).parse('a\r\nb\rc')).toBe('a\nb\nc');
    expect(text(80, 'Reason', 'free').parse(' a\r\nb ')).toBe('a\nb');
  });

  it('strips what it refuses from stored text', () => {
    expect(withoutInvalidCharacters('a\u0000b\u202Ec\u0085d')).toBe('abcd');
    expect(withoutInvalidCharacters('a\tb\r\nc\u0007', 'free')).toBe('a\tb\nc');
  });
});
