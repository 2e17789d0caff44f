import type { Point } from './geometry.js';
import { formatFeetAndInches } from './units.js';

/**
 * Where a point of a deck plan lies as the trade states it: the frame it is at and how far it is
 * to port or starboard of the centerline. Frames are numbered from forward aft (frame 0 at or near
 * the bow), as in the US Navy numbering (NAVEDTRA 14325, ch. 8) and common shipyard practice.
 * Plans are images: y grows downward, so with the bow to the right starboard is below the centerline.
 */
export interface DeckFrames {
  /** A frame whose line is drawn on the plan, and the plan x of that line. */
  referenceFrame: number;
  referenceX: number;
  spacingMetres: number;
  /** The aftmost frame the plan shows; a designation beyond it is an error. */
  lastFrame: number;
}

export interface DeckGeometry {
  metresPerUnit: number | null;
  centerlineY: number | null;
  bowTo: 'right' | 'left';
  frames: DeckFrames | null;
}

export type UnitSystem = 'metric' | 'us-customary';
export type Side = 'port' | 'starboard' | 'centerline';

/** Less than this from the centerline is "on the centerline" (5 cm: common practice, no published source). */
export const ON_CENTERLINE_METRES = 0.05;

/** The frame number (fractional) at plan x, or null when the plan is not calibrated or its frames not numbered. */
export function frameAt(x: number, deck: DeckGeometry): number | null {
  if (!deck.metresPerUnit || !deck.frames) return null;
  const unitsPerFrame = deck.frames.spacingMetres / deck.metresPerUnit;
  // Frame numbers grow aft: leftward on the plan when the bow points right.
  const aft = deck.bowTo === 'right' ? deck.frames.referenceX - x : x - deck.frames.referenceX;
  return deck.frames.referenceFrame + aft / unitsPerFrame;
}

/** Signed offset from the centerline in metres (positive to starboard) and its side, or null without scale or centerline. */
export function centerlineOffset(y: number, deck: DeckGeometry): { metres: number; side: Side } | null {
  if (!deck.metresPerUnit || deck.centerlineY === null) return null;
  const below = (y - deck.centerlineY) * deck.metresPerUnit;
  const starboard = deck.bowTo === 'right' ? below : -below;
  const side: Side = Math.abs(starboard) < ON_CENTERLINE_METRES ? 'centerline' : starboard > 0 ? 'starboard' : 'port';
  return { metres: starboard, side };
}

/** A length for people: metres to one decimal, or feet and inches to the nearest inch. */
export function formatLength(metres: number, units: UnitSystem): string {
  return units === 'metric' ? `${metres.toFixed(1)} m` : formatFeetAndInches(metres);
}

/** Frames within a quarter of a frame of a whole one are read as on it (common practice, no published source). */
const FRAME_SNAP = 0.25;

/** The whole frame nearest a fractional one. */
export function nearestFrame(frame: number): number {
  return Math.round(frame);
}

/**
 * A plan point as a sentence: "frame 64, 2.1 m to port". Without a scale it says so instead of
 * giving pixels; a missing centerline or frame numbering is named.
 */
export function describePlanPoint(point: Point, deck: DeckGeometry, units: UnitSystem): string {
  if (!deck.metresPerUnit) return 'Marked on the plan; the deck is not calibrated, so no frame or offset can be given.';
  const frame = frameAt(point[0], deck);
  const offset = centerlineOffset(point[1], deck);
  const framePart = frame === null ? null : `frame ${nearestFrame(frame)}`;
  const offsetPart = offset === null ? null : offset.side === 'centerline' ? 'on the centerline' : `${formatLength(Math.abs(offset.metres), units)} to ${offset.side}`;
  if (framePart && offsetPart) return `${capitalise(framePart)}, ${offsetPart}`;
  if (framePart) return `${capitalise(framePart)} (the deck's centerline is not set)`;
  if (offsetPart) return `${capitalise(offsetPart)} (the plan's frames are not numbered)`;
  return "Marked on the plan; the plan's frames are not numbered and its centerline is not set.";
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** The frames an outline spans: its foremost frame (the one at or forward of the forward boundary) and aftmost. */
export function outlineFrames(outline: readonly Point[], deck: DeckGeometry): { foremost: number; aftmost: number } | null {
  if (outline.length < 3) return null;
  const frames = outline.map((p) => frameAt(p[0], deck));
  if (frames.some((f) => f === null)) return null;
  const values = frames as number[];
  const fore = Math.min(...values);
  const aft = Math.max(...values);
  // NAVEDTRA 14325, ch. 8: where the forward boundary lies between frames, the frame forward of it is used.
  const snap = (f: number, down: boolean) => (Math.abs(f - Math.round(f)) <= FRAME_SNAP ? Math.round(f) : down ? Math.floor(f) : Math.ceil(f));
  return { foremost: snap(fore, true), aftmost: snap(aft, false) };
}

/** Which side of the centerline an outline lies on: wholly to one side, or across it. */
export function outlineSide(outline: readonly Point[], deck: Pick<DeckGeometry, 'centerlineY' | 'bowTo'>): Side | null {
  if (outline.length < 3 || deck.centerlineY === null) return null;
  const c = deck.centerlineY;
  const starboardIsBelow = deck.bowTo === 'right';
  const ys = outline.map((p) => p[1]);
  if (ys.every((y) => (starboardIsBelow ? y >= c : y <= c))) return 'starboard';
  if (ys.every((y) => (starboardIsBelow ? y <= c : y >= c))) return 'port';
  return 'centerline';
}

/** Where on a photo a marked area sits, in words: "upper left", "centre", … */
function areaPlace([x, y, w, h]: readonly [number, number, number, number]): string {
  const cx = x + w / 2;
  const cy = y + h / 2;
  if (w >= 0.9 && h >= 0.9) return 'the whole photo';
  const across = cx < 1 / 3 ? 'left' : cx > 2 / 3 ? 'right' : '';
  const down = cy < 1 / 3 ? 'upper' : cy > 2 / 3 ? 'lower' : '';
  return [down, across].filter(Boolean).join(' ') || 'centre';
}

export type MarkedLocation = { on: 'plan'; point: Point } | { on: 'photo'; mediaId: number; area: readonly [number, number, number, number] };

/**
 * A finding's location as a sentence for the report page and its PDF: a plan point as frame and
 * offset ("Frame 64, 2.1 m to port"), a photo mark by the photo's caption and the part of it marked.
 */
export function findingLocationText(location: MarkedLocation | null, deck: DeckGeometry | null, units: UnitSystem, photoName: (mediaId: number) => string | null): string | null {
  if (!location) return null;
  if (location.on === 'plan') return deck ? describePlanPoint(location.point, deck, units) : 'Marked on the deck plan.';
  const name = photoName(location.mediaId);
  return `Marked on ${name ? `the photo “${name}”` : 'a photo'}: ${areaPlace(location.area)}`;
}
