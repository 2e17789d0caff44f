// The tour's kinds and their labels, without zod: the public landing page (in the entry) reads them.
export const TOUR_MODES = ['on-board', 'virtual', 'both'] as const;
export type TourMode = (typeof TOUR_MODES)[number];
export const TOUR_MODE_LABELS: Record<TourMode, string> = { 'on-board': 'On board', virtual: 'Virtual', both: 'On board and virtual' };

export const TOUR_ACCESSIBILITY = ['step-free', 'some-stairs', 'ladders'] as const;
export type TourAccessibility = (typeof TOUR_ACCESSIBILITY)[number];
export const TOUR_ACCESSIBILITY_LABELS: Record<TourAccessibility, string> = { 'step-free': 'Step-free', 'some-stairs': 'Some stairs', ladders: 'Ladders' };

export const TOUR_AUDIENCES = ['general', 'families', 'technical'] as const;
export type TourAudience = (typeof TOUR_AUDIENCES)[number];
export const TOUR_AUDIENCE_LABELS: Record<TourAudience, string> = { general: 'General', families: 'Families', technical: 'Technical' };
