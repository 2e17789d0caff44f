import { describe, expect, it } from 'vitest';
import { excerpt } from '../../shared/richtext/excerpt.js';

describe('excerpt', () => {
  it('keeps a short text whole, with its paragraphs run together', () => {
    expect(excerpt('First paragraph.\nSecond one.', 240)).toBe('First paragraph. Second one.');
  });

  it('cuts a long text at the last whole word, with an ellipsis, within the limit', () => {
    const text = 'Condensation drips from the deckhead of the steering gear room.\nYour gift pays for the steel.';
    const short = excerpt(text, 70);
    expect(short).toBe('Condensation drips from the deckhead of the steering gear room. Your…');
    expect(short.length).toBeLessThanOrEqual(70);
  });

  it('drops the punctuation before the cut', () => {
    expect(excerpt('One two three, four five six', 16)).toBe('One two three…');
  });

  it('cuts inside a word only when there is no space in the second half', () => {
    expect(excerpt('Supercalifragilistic', 10)).toBe('Supercali…');
  });
});
