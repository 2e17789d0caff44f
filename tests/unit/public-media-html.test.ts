import { describe, expect, it } from 'vitest';
import { imageIdsIn, pointImagesAt, withoutImages } from '../../server/services/public-media-html.js';

const html = '<img src="/api/v1/media/3/display" alt="A gauge &gt; the valve" /><p>Text</p><img src="/api/v1/media/12/thumb" alt="Valve" />';

describe('published html and its photos', () => {
  it('points staff image paths at a public route and collects their ids', () => {
    const ids = new Set<number>();
    const out = pointImagesAt(html, (id, variant) => `/api/v1/visit/x/media/${id}/${variant}`, ids);
    expect(out).toBe('<img src="/api/v1/visit/x/media/3/display" alt="A gauge &gt; the valve" /><p>Text</p><img src="/api/v1/visit/x/media/12/thumb" alt="Valve" />');
    expect([...ids]).toEqual([3, 12]);
    expect(pointImagesAt(out, () => 'never')).toBe(out);
    expect(imageIdsIn(out)).toEqual([3, 12]);
  });

  it('leaves out only the images of hidden photos', () => {
    expect(withoutImages(html, new Set([3]))).toBe('<p>Text</p><img src="/api/v1/media/12/thumb" alt="Valve" />');
    expect(withoutImages(html, new Set([1]))).toBe(html);
    expect(withoutImages(html, new Set())).toBe(html);
  });
});
