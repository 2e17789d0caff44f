/** A view of a deck plan: the plan point at the centre of the frame (plan pixels) and the map's zoom. */
export type MapView = { x: number; y: number; zoom: number };

const round = (n: number, places: number) => Math.round(n * 10 ** places) / 10 ** places;

/** The view as the address writes it (`view=1520,610,2.5`): whole plan pixels, zoom to a hundredth. */
export function formatMapView(view: MapView): string {
  return `${Math.round(view.x)},${Math.round(view.y)},${round(view.zoom, 2)}`;
}

/** The view of an address's `view`, or null (the whole plan, fitted) when it is missing or not three numbers. */
export function parseMapView(value: unknown): MapView | null {
  if (typeof value !== 'string') return null;
  const parts = value.split(',');
  if (parts.length !== 3 || parts.some((p) => p.trim() === '')) return null;
  const [x, y, zoom] = parts.map(Number) as [number, number, number];
  if (![x, y, zoom].every(Number.isFinite) || zoom < -4 || zoom > 24) return null;
  return { x, y, zoom };
}

/** Whether two views show the same (within what the address keeps); null is the fitted view. */
export function sameMapView(a: MapView | null, b: MapView | null): boolean {
  if (a === null || b === null) return a === b;
  return Math.abs(a.x - b.x) < 1 && Math.abs(a.y - b.y) < 1 && Math.abs(a.zoom - b.zoom) < 0.01;
}
