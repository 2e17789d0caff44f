import { describe, expect, it } from 'vitest';
import { fleschKincaidGrade, readingFigures, READING_WPM } from '../../shared/calc/readability.js';

describe('reading figures', () => {
  it('applies the Flesch–Kincaid grade formula as published', () => {
    // Kincaid, Fishburne, Rogers & Chissom (1975), Research Branch Report 8-75, formula (1):
    // 0.39 × (100 / 5) + 11.8 × (150 / 100) − 15.59 = 7.80 + 17.70 − 15.59 = 9.91, worked by hand.
    expect(fleschKincaidGrade(100, 5, 150)).toBeCloseTo(9.91, 10);
    // One-syllable words in ten-word sentences: 3.9 + 11.8 − 15.59 = 0.11.
    expect(fleschKincaidGrade(10, 1, 10)).toBeCloseTo(0.11, 10);
  });

  it('counts words, sentences and syllables of a label, and grades it', () => {
    // Counted by hand: "The(1) boiler(2) makes(1) steam(1). The(1) steam(1) turns(1) the(1) engine(2) and(1) the(1) screw(1)."
    // 12 words, 2 sentences, 14 syllables → 0.39 × 6 + 11.8 × 14/12 − 15.59 = 0.52, shown as 0.5.
    const figures = readingFigures('The boiler makes steam. The steam turns the engine and the screw.');
    expect(figures).toMatchObject({ words: 12, sentences: 2, syllables: 14, grade: 0.5 });
  });

  it('reads paragraphs without full stops as sentences of their own, and gives no grade to a fragment', () => {
    const figures = readingFigures('Main feed pump\nBuilt to lift water into the boiler');
    expect(figures.sentences).toBe(2);
    expect(readingFigures('Main feed pump').grade).toBeNull();
    expect(readingFigures('')).toMatchObject({ words: 0, sentences: 0, readingMinutes: 0, grade: null });
  });

  it('rounds the reading time up to the half minute at the adult silent reading rate', () => {
    // 238 words per minute, Brysbaert (2019), Journal of Memory and Language 109 (from memory).
    expect(READING_WPM).toBe(238);
    const words = (n: number) => Array.from({ length: n }, () => 'steam').join(' ') + '.';
    expect(readingFigures(words(238)).readingMinutes).toBe(1);
    expect(readingFigures(words(239)).readingMinutes).toBe(1.5);
    expect(readingFigures(words(60)).readingMinutes).toBe(0.5);
  });
});
