/**
 * Compartment designations in the US Navy numbering used for ships built after March 1949
 * (`deck-frame-position-use`, e.g. `3-110-2-E`), as taught in the Navy's Basic Military
 * Requirements (NAVEDTRA 14325, ch. 8) and the Damage Controlman training manuals.
 */
export const DESIGNATION_PARTS = ['deck', 'frame', 'position', 'use'] as const;
export type DesignationPart = (typeof DESIGNATION_PARTS)[number] | 'format';

/** Use letters and what they stand for (the source's list; medium confidence, see REFERENCES.md). */
export const USE_LETTERS: Record<string, string> = {
  A: 'stowage space',
  AA: 'cargo hold',
  C: 'control space',
  E: 'engineering space',
  F: 'oil stowage',
  FF: 'oil stowage',
  G: 'gasoline stowage',
  GG: 'gasoline stowage',
  J: 'JP-5 fuel stowage',
  JJ: 'JP-5 fuel stowage',
  K: 'chemicals and dangerous materials',
  L: 'living space',
  M: 'ammunition space',
  Q: 'miscellaneous space',
  T: 'vertical access trunk',
  V: 'void',
  W: 'water stowage',
};

export interface ParsedDesignation {
  value: string;
  deck: { text: string; level: number; aboveMainDeck: boolean; meaning: string };
  frame: { number: number; meaning: string };
  position: { number: number; side: 'centerline' | 'starboard' | 'port'; ordinal: number; meaning: string };
  use: { letters: string; meaning: string };
  explanation: string;
}

export type DesignationResult = { ok: true; designation: ParsedDesignation } | { ok: false; part: DesignationPart; message: string };

const ORDINALS = ['zeroth', 'first', 'second', 'third', 'fourth', 'fifth', 'sixth', 'seventh', 'eighth', 'ninth', 'tenth', 'eleventh', 'twelfth'];

function ordinal(n: number): string {
  if (n < ORDINALS.length) return ORDINALS[n]!;
  const suffix = n % 100 >= 11 && n % 100 <= 13 ? 'th' : (['th', 'st', 'nd', 'rd'][n % 10] ?? 'th');
  return `${n}${suffix}`;
}

function deckMeaning(text: string): ParsedDesignation['deck'] | null {
  if (/^0[1-9]\d?$/.test(text)) {
    const level = Number(text);
    return { text, level, aboveMainDeck: true, meaning: `${text} level (${ordinal(level)} level above the main deck)` };
  }
  if (/^[1-9]\d?$/.test(text)) {
    const level = Number(text);
    return { text, level, aboveMainDeck: false, meaning: level === 1 ? 'main deck' : `${ordinal(level)} deck` };
  }
  return null;
}

function positionMeaning(n: number): ParsedDesignation['position'] {
  if (n === 0) return { number: 0, side: 'centerline', ordinal: 0, meaning: 'on the centerline' };
  if (n % 2 === 1) {
    const nth = (n + 1) / 2;
    return { number: n, side: 'starboard', ordinal: nth, meaning: `${ordinal(nth)} compartment to starboard` };
  }
  const nth = n / 2;
  return { number: n, side: 'port', ordinal: nth, meaning: `${ordinal(nth)} compartment to port` };
}

/** Parses and explains a designation, or says which part is wrong. */
export function parseNavyDesignation(input: string): DesignationResult {
  const value = input.trim().toUpperCase();
  const parts = value.split('-');
  if (parts.length !== 4 || parts.some((p) => p === '')) {
    return { ok: false, part: 'format', message: 'Write the designation as deck-frame-position-use, e.g. 3-110-2-E.' };
  }
  const [deckText, frameText, positionText, useText] = parts as [string, string, string, string];
  const deck = deckMeaning(deckText);
  if (!deck) {
    return { ok: false, part: 'deck', message: `"${deckText}" is not a deck: use 1 for the main deck, 2, 3, … for decks below it, and 01, 02, … for levels above it.` };
  }
  if (!/^\d{1,3}$/.test(frameText)) {
    return { ok: false, part: 'frame', message: `"${frameText}" is not a frame number: use the number of the foremost frame of the compartment, e.g. 110.` };
  }
  if (!/^\d{1,2}$/.test(positionText)) {
    return { ok: false, part: 'position', message: `"${positionText}" is not a position: use 0 on the centerline, odd numbers to starboard (1, 3, …) and even numbers to port (2, 4, …).` };
  }
  const use = USE_LETTERS[useText];
  if (!use) {
    return { ok: false, part: 'use', message: `"${useText}" is not a use letter of this scheme: use one of ${Object.keys(USE_LETTERS).join(', ')}.` };
  }
  const frame = Number(frameText);
  const position = positionMeaning(Number(positionText));
  const designation: ParsedDesignation = {
    value: `${deckText}-${frame}-${Number(positionText)}-${useText}`,
    deck,
    frame: { number: frame, meaning: `frame ${frame}` },
    position,
    use: { letters: useText, meaning: use },
    explanation: `${deck.meaning}, frame ${frame}, ${position.meaning}, ${use}`,
  };
  return { ok: true, designation };
}
