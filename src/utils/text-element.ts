/**
 * An element holding `text` as a text node, for content handed to Leaflet (tooltips, popups,
 * div icons): Leaflet sets a string as HTML, so text from records must reach it as an element.
 */
export function textElement<K extends keyof HTMLElementTagNameMap>(tag: K, className: string, text: string): HTMLElementTagNameMap[K] {
  const el = document.createElement(tag);
  if (className) el.className = className;
  el.textContent = text;
  return el;
}
