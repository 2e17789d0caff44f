import { describe, expect, it } from 'vitest';
import { designationErrors, designationWarnings, suggestDesignation, type DeckPlacement } from '../../shared/calc/designation-check.js';
import { parseNavyDesignation, type ParsedDesignation } from '../../shared/calc/designation.js';
import { centerlineOffset, describePlanPoint, findingLocationText, frameAt, outlineFrames, type DeckGeometry } from '../../shared/calc/plan-location.js';

// Hand-computed: frames 24 in (0.6096 m) apart drawn 20 px apart, so one pixel is 0.03048 m;
// frame 0 at x = 3000 with the bow to the right (frames number aft, leftward); centerline y = 500.
const deck: DeckGeometry = { metresPerUnit: 0.03048, centerlineY: 500, bowTo: 'right', frames: { referenceFrame: 0, referenceX: 3000, spacingMetres: 0.6096, lastFrame: 140 } };

describe('a plan point as frame and offset from the centerline', () => {
  it('x 1720 is frame 64 ((3000 − 1720) / 20); y 431.1 is 68.9 px × 0.03048 m = 2.1 m above the centerline, to port with the bow right', () => {
    expect(frameAt(1720, deck)).toBeCloseTo(64, 9);
    expect(centerlineOffset(431.1, deck)).toMatchObject({ side: 'port' });
    expect(centerlineOffset(431.1, deck)!.metres).toBeCloseTo(-2.100072, 6);
    expect(describePlanPoint([1720, 431.1], deck, 'metric')).toBe('Frame 64, 2.1 m to port');
    // 2.100072 m / 0.0254 = 82.7 in, to the nearest inch 83 in = 6 ft 11 in.
    expect(describePlanPoint([1720, 431.1], deck, 'us-customary')).toBe('Frame 64, 6′ 11″ to port');
  });

  it('with the bow to the left, frames number rightward and below the centerline is port', () => {
    const left: DeckGeometry = { ...deck, bowTo: 'left', frames: { ...deck.frames!, referenceFrame: 10, referenceX: 100 } };
    expect(frameAt(300, left)).toBeCloseTo(20, 9); // 10 + 200 px / 20 px per frame
    expect(describePlanPoint([300, 600], left, 'metric')).toBe('Frame 20, 3.0 m to port'); // 100 px × 0.03048 = 3.048 m
    expect(describePlanPoint([300, 501], left, 'metric')).toBe('Frame 20, on the centerline'); // 3 cm off
  });

  it('says what is missing instead of giving pixels', () => {
    expect(describePlanPoint([1720, 431.1], { ...deck, metresPerUnit: null }, 'metric')).toBe('Marked on the plan; the deck is not calibrated, so no frame or offset can be given.');
    expect(describePlanPoint([1720, 431.1], { ...deck, frames: null }, 'metric')).toBe("2.1 m to port (the plan's frames are not numbered)");
    expect(describePlanPoint([1720, 431.1], { ...deck, centerlineY: null }, 'metric')).toBe("Frame 64 (the deck's centerline is not set)");
  });

  it('reads an outline between frames 40 and 60, with a boundary between frames taking the frame forward of it', () => {
    expect(outlineFrames([[2200, 400], [1800, 400], [1800, 600], [2200, 600]], deck)).toEqual({ foremost: 40, aftmost: 60 });
    expect(outlineFrames([[2190, 400], [1810, 400], [1810, 600]], deck)).toEqual({ foremost: 40, aftmost: 60 }); // 40.5 → 40, 59.5 → 60
    expect(outlineFrames([[2195, 400], [1800, 400], [1800, 600]], deck)).toEqual({ foremost: 40, aftmost: 60 }); // 40.25 snaps to 40
  });
});

// Designations in the 1949 numbering (NAVEDTRA 14325, ch. 8): the frame is the foremost frame of
// the compartment, the frame forward of the boundary where it lies between frames; 0 on the
// centerline, odd to starboard, even to port.
const second: DeckPlacement = { ...deck, name: 'Second deck', levelCode: '2' };
const parsed = (v: string): ParsedDesignation => {
  const r = parseNavyDesignation(v);
  if (!r.ok) throw new Error(r.message);
  return r.designation;
};
const starboardRoom: [number, number][] = [[2200, 520], [1800, 520], [1800, 650], [2200, 650]]; // frames 40–60, below the centerline

describe('a designation checked against its outline', () => {
  it('agrees when deck, frame and side match', () => {
    expect(designationWarnings(parsed('2-40-1-E'), second, starboardRoom)).toEqual([]);
    expect(designationWarnings(parsed('2-50-3-E'), second, starboardRoom)).toEqual([]); // within the span: no warning
    expect(designationErrors(parsed('2-40-1-E'), second)).toEqual([]);
  });

  it('warns of the wrong deck, side and a frame outside the outline', () => {
    expect(designationWarnings(parsed('3-70-2-E'), second, starboardRoom)).toEqual([
      'The designation says third deck, but the compartment is on Second deck (deck 2).',
      'An even position means a compartment to port, but the outline reaches to starboard of the centerline.',
      'The designation says frame 70, but the outline spans frames 40–60; designations use the foremost, 40.',
    ]);
  });

  it('refuses a frame beyond the plan’s last frame', () => {
    expect(designationErrors(parsed('2-141-1-E'), second)).toEqual([{ part: 'frame', message: "Frame 141 is beyond the last frame of Second deck's plan (frame 140)." }]);
    expect(designationErrors(parsed('2-140-1-E'), second)).toEqual([]);
    // The error says it all: no second word about the outline's frames.
    expect(designationWarnings(parsed('2-141-1-E'), second, starboardRoom)).toEqual([]);
    expect(designationErrors(parsed('2-141-1-E'), { ...second, metresPerUnit: null })).toEqual([]);
  });

  it('suggests deck, foremost frame and side from the drawing, keeping the typed use letters', () => {
    expect(suggestDesignation('', second, starboardRoom)).toBe('2-40-1-');
    expect(suggestDesignation('3-70-2-E', second, starboardRoom)).toBe('2-40-1-E');
    expect(suggestDesignation('2-40-5-E', second, starboardRoom)).toBeNull(); // already right: 5 is the third compartment to starboard
    expect(suggestDesignation('2-44-0-L', second, [[2200, 400], [1800, 400], [1800, 600]])).toBe('2-40-0-L');
    expect(suggestDesignation('2-40-1-E', { ...second, levelCode: null, centerlineY: null, frames: null }, starboardRoom)).toBeNull();
  });
});

describe('a finding location in words', () => {
  it('states a plan point as frame and offset, and a photo mark by caption and place', () => {
    const name = (id: number) => (id === 7 ? 'Boiler front, port side' : null);
    expect(findingLocationText({ on: 'plan', point: [1720, 431.1] }, deck, 'metric', name)).toBe('Frame 64, 2.1 m to port');
    expect(findingLocationText({ on: 'photo', mediaId: 7, area: [0.05, 0.1, 0.2, 0.2] }, deck, 'metric', name)).toBe('Marked on the photo “Boiler front, port side”: upper left');
    expect(findingLocationText({ on: 'photo', mediaId: 8, area: [0.35, 0.35, 0.3, 0.3] }, deck, 'metric', name)).toBe('Marked on a photo: centre');
    expect(findingLocationText(null, deck, 'metric', name)).toBeNull();
  });
});
