import { describe, expect, it } from 'vitest';
import { DEFAULT_ROUTE_SETTINGS, stopPosition, tourRoute, type RouteDeck } from '../../shared/calc/tour-route.js';

// Two decks drawn at 2 cm per plan unit, bow to the right, frame 10 at x = 1000, frames 0.6 m apart
// (so 30 plan units per frame; frame numbers grow aft, leftward).
const main: RouteDeck = { id: 1, name: 'Main deck', position: 0, metresPerUnit: 0.02, centerlineY: 500, bowTo: 'right', frames: { referenceFrame: 10, referenceX: 1000, spacingMetres: 0.6, lastFrame: 80 } };
const lower: RouteDeck = { ...main, id: 2, name: 'Lower deck', position: 1 };

describe('tour route', () => {
  it('adds walking on a deck, fore-and-aft between decks and the deck-change allowance, then dwell', () => {
    // By hand:
    // Stop 1 (100, 100) to stop 2 (400, 500) on the main deck: dx 300, dy 400, so 500 units × 0.02 = 10 m.
    // Stop 2 to stop 3 (700, 300) on the lower deck: stop 2 is at frame 10 + (1000 − 400) / 30 = 30,
    // stop 3 at frame 10 + (1000 − 700) / 30 = 20: 10 frames × 0.6 m = 6 m, plus one deck change of 10 m.
    // Distance 10 + 6 + 10 = 26 m; at 0.5 m/s that is 52 s = 0.87 min, shown 0.9.
    // Dwell 3 + 5 + 2 = 10 min; total 10.87 min, shown 10.9.
    const route = tourRoute(
      [
        { deck: main, point: [100, 100], dwellMinutes: 3 },
        { deck: main, point: [400, 500], dwellMinutes: 5 },
        { deck: lower, point: [700, 300], dwellMinutes: 2 },
      ],
      { walkingPaceMetresPerSecond: 0.5, deckChangeMetres: 10 },
    );
    expect(route.legs).toEqual([
      { from: 1, to: 2, metres: 10, deckChanges: 0 },
      { from: 2, to: 3, metres: 6, deckChanges: 1 },
    ]);
    expect(route.distanceMetres).toBe(26);
    expect(route.deckChanges).toBe(1);
    expect(route.walkingMinutes).toBe(0.9);
    expect(route.dwellMinutes).toBe(10);
    expect(route.totalMinutes).toBe(10.9);
    expect(route.unmeasuredLegs).toBe(0);
  });

  it('names a leg it cannot measure instead of guessing, and still counts the deck change', () => {
    const uncalibrated: RouteDeck = { ...lower, metresPerUnit: null, frames: null };
    const route = tourRoute(
      [
        { deck: main, point: [100, 100], dwellMinutes: 1 },
        { deck: uncalibrated, point: [700, 300], dwellMinutes: 1 },
      ],
      DEFAULT_ROUTE_SETTINGS,
    );
    expect(route.legs[0]).toEqual({ from: 1, to: 2, metres: null, deckChanges: 1 });
    expect(route.distanceMetres).toBe(DEFAULT_ROUTE_SETTINGS.deckChangeMetres);
    expect(route.notes).toEqual(['Stops 1 to 2 not measured: the decks’ frames are not numbered.']);
  });

  it('stands a stop at its own point, else at the centre of its space', () => {
    expect(stopPosition([5, 6], [[0, 0], [10, 0], [10, 10], [0, 10]])).toEqual([5, 6]);
    expect(stopPosition(null, [[0, 0], [10, 0], [10, 10], [0, 10]])).toEqual([5, 5]);
    expect(stopPosition(null, null)).toBeNull();
  });
});
