import { describe, expect, it } from 'vitest';
import { formatMapView, parseMapView, sameMapView } from '@/utils/map-view';

describe('the map view in the address', () => {
  it('writes whole plan pixels and the zoom to a hundredth, and reads them back', () => {
    const written = formatMapView({ x: 1520.44, y: 610.6, zoom: 2.4999 });
    expect(written).toBe('1520,611,2.5');
    expect(parseMapView(written)).toEqual({ x: 1520, y: 611, zoom: 2.5 });
  });

  it('reads anything else as the fitted view', () => {
    for (const value of [undefined, null, '', '1,2', '1,2,3,4', 'a,b,c', '1,,3', '1,2,99', ['1,2,3']]) expect(parseMapView(value)).toBeNull();
    expect(parseMapView('-20,40,-1')).toEqual({ x: -20, y: 40, zoom: -1 });
  });

  it('takes a view read back from the address for the one written', () => {
    const view = { x: 1520.44, y: 610.6, zoom: 2.4999 };
    expect(sameMapView(view, parseMapView(formatMapView(view)))).toBe(true);
    expect(sameMapView(view, { ...view, x: view.x + 2 })).toBe(false);
    expect(sameMapView(view, { ...view, zoom: 2.75 })).toBe(false);
    expect(sameMapView(null, null)).toBe(true);
    expect(sameMapView(view, null)).toBe(false);
  });
});
