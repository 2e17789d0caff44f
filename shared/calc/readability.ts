import { syllable } from 'syllable';

export interface ReadingFigures {
  words: number;
  sentences: number;
  syllables: number;
  /** Flesch–Kincaid grade level; null below ten words, where it means little. */
  grade: number | null;
  /** Minutes to read silently, rounded up to the half minute. */
  readingMinutes: number;
}

/** Silent reading rate of adults for non-fiction, words per minute (Brysbaert 2019, from memory). */
export const READING_WPM = 238;
const WORD = /[\p{L}\p{N}]+(?:['’-][\p{L}\p{N}]+)*/gu;
const SENTENCE_END = /[.!?]+(?=\s|$)|\n+/g;

/**
 * Flesch–Kincaid grade level, Kincaid, Fishburne, Rogers & Chissom (1975), Research Branch
 * Report 8-75: 0.39 × words/sentences + 11.8 × syllables/words − 15.59.
 */
export function fleschKincaidGrade(words: number, sentences: number, syllables: number): number {
  return 0.39 * (words / sentences) + 11.8 * (syllables / words) - 15.59;
}

export function readingFigures(text: string): ReadingFigures {
  const words = text.match(WORD) ?? [];
  const sentences = Math.max(1, text.split(SENTENCE_END).filter((part) => /[\p{L}\p{N}]/u.test(part)).length);
  // Numerals count as one syllable each, as the readers of the formula's trials would say them briefly.
  const syllables = words.reduce((sum, word) => sum + (/^\p{N}+$/u.test(word) ? 1 : Math.max(1, syllable(word))), 0);
  const grade = words.length >= 10 ? Math.round(fleschKincaidGrade(words.length, sentences, syllables) * 10) / 10 : null;
  return {
    words: words.length,
    sentences: words.length ? sentences : 0,
    syllables,
    grade,
    readingMinutes: words.length ? Math.ceil((words.length / READING_WPM) * 2) / 2 : 0,
  };
}
