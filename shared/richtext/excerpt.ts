/**
 * The opening of a stored plain text for a card: paragraphs run together, cut at the last whole
 * word within `max` characters (ellipsis included), so a summary never ends mid-word.
 */
export function excerpt(text: string, max: number): string {
  const flat = text.replace(/\s+/g, ' ').trim();
  if (flat.length <= max) return flat;
  const room = flat.slice(0, max); // the ellipsis takes the place of the space it cuts at
  const cut = room.lastIndexOf(' ');
  const head = (cut > max / 2 ? room.slice(0, cut) : room.slice(0, max - 1)).replace(/[\s,;:.–—-]+$/u, '');
  return `${head}…`;
}
