import type { Point } from '@shared/calc/geometry';
import L from 'leaflet';
import 'leaflet/dist/leaflet.css';

// leaflet-geoman extends the global `L`; this module must be imported before it. @vue-leaflet's
// `LMap` (with `use-global-leaflet`) builds its map from this same global, so geoman's `map.pm` is there.
(window as unknown as { L: typeof L }).L = L;

/**
 * A point of a deck plan (pixels of the image, that is at the plan's `maxZoom`) as a position on
 * the deck map, which uses `CRS.Simple`: the same as `map.unproject(point, maxZoom)`, but usable
 * before the map exists (the outlines and the tiles' bounds are bound as props).
 */
export const planLatLng = (p: Point, maxZoom: number): L.LatLng => L.CRS.Simple.pointToLatLng(L.point(p[0], p[1]), maxZoom);

/** The reverse of `planLatLng`: a position on the deck map as a plan point, to a tenth of a pixel. */
export function planPoint(latlng: L.LatLng, maxZoom: number): Point {
  const p = L.CRS.Simple.latLngToPoint(latlng, maxZoom);
  return [Math.round(p.x * 10) / 10, Math.round(p.y * 10) / 10];
}

export default L;
