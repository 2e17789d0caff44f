import { describe, expect, it } from 'vitest';
import { parseNavyDesignation } from '../../shared/calc/designation.js';

// Source for every case: US Navy compartment numbering for ships built after March 1949, as taught
// in Basic Military Requirements (NAVEDTRA 14325, ch. 8) and the Damage Controlman training
// manuals: deck-frame-position-use; deck 1 is the main deck, 2, 3, … below it, 01, 02, … above;
// position 0 on the centerline, odd to starboard, even to port. Use letters: medium confidence.
describe('US Navy 1949 compartment designations', () => {
  it('explains the textbook example 3-110-2-E', () => {
    const result = parseNavyDesignation('3-110-2-E');
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.designation.explanation).toBe('third deck, frame 110, first compartment to port, engineering space');
    expect(result.designation.deck).toMatchObject({ level: 3, aboveMainDeck: false });
    expect(result.designation.position).toMatchObject({ side: 'port', ordinal: 1 });
  });

  it.each([
    ['1-50-0-L', 'main deck, frame 50, on the centerline, living space'],
    ['2-75-1-AA', 'second deck, frame 75, first compartment to starboard, cargo hold'],
    ['4-120-3-E', 'fourth deck, frame 120, second compartment to starboard, engineering space'],
    ['4-120-4-E', 'fourth deck, frame 120, second compartment to port, engineering space'],
    ['01-30-0-C', '01 level (first level above the main deck), frame 30, on the centerline, control space'],
    ['02-45-2-Q', '02 level (second level above the main deck), frame 45, first compartment to port, miscellaneous space'],
    ['5-88-0-V', 'fifth deck, frame 88, on the centerline, void'],
    ['3-96-0-t', 'third deck, frame 96, on the centerline, vertical access trunk'],
  ])('%s', (value, explanation) => {
    const result = parseNavyDesignation(value);
    expect(result.ok && result.designation.explanation).toBe(explanation);
  });

  it('normalises case and leading zeros of frame and position', () => {
    const result = parseNavyDesignation(' 3-0110-02-e ');
    expect(result.ok).toBe(false); // a frame has at most three digits
    const ok = parseNavyDesignation('3-010-02-e');
    expect(ok.ok && ok.designation.value).toBe('3-10-2-E');
  });

  it.each([
    ['3-110-2', 'format'],
    ['3--2-E', 'format'],
    ['0-110-2-E', 'deck'],
    ['00-110-2-E', 'deck'],
    ['B-110-2-E', 'deck'],
    ['3-1X0-2-E', 'frame'],
    ['3-110-P-E', 'position'],
    ['3-110-2-Z', 'use'],
    ['3-110-2-EE', 'use'],
  ])('refuses %s and names the %s part', (value, part) => {
    const result = parseNavyDesignation(value);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.part).toBe(part);
  });
});
