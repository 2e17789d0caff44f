/** Image tags in stored, sanitized HTML (sanitizing escapes `>` inside attribute values, so `[^>]*` stays inside one tag). */
const IMG = /<img\b[^>]*\bsrc="[^"]*\/media\/(\d+)\/(?:display|thumb)"[^>]*>/g;
const STAFF_MEDIA = /\/api\/v1\/media\/(\d+)\/(display|thumb)/g;

/** Points a published text's images at a public route (`to` gives its path), collecting the ids it shows. */
export function pointImagesAt(html: string, to: (mediaId: number, variant: 'display' | 'thumb') => string, ids?: Set<number>): string {
  return html.replace(STAFF_MEDIA, (_m, id: string, variant: 'display' | 'thumb') => {
    ids?.add(Number(id));
    return to(Number(id), variant);
  });
}

/** The media ids of the images in stored HTML. */
export function imageIdsIn(html: string): number[] {
  return [...html.matchAll(IMG)].map((m) => Number(m[1]));
}

/** Leaves out the images of photos no longer public (withdrawn, or without alt text): visitors would see a broken image. */
export function withoutImages(html: string, hidden: ReadonlySet<number>): string {
  if (!hidden.size) return html;
  return html.replace(IMG, (tag, id: string) => (hidden.has(Number(id)) ? '' : tag));
}
