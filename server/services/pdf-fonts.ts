import { createRequire } from 'node:module';

/** Font files resolved from their packages, so they are found from any working directory. */
const file = createRequire(import.meta.url).resolve;

export const PDF_FONTS = {
  /** DejaVu Sans covers all of Latin, Greek and Cyrillic and the common signs (• ° ± µ → − ≤ ≥). */
  body: file('dejavu-fonts-ttf/ttf/DejaVuSans.ttf'),
  bodyBold: file('dejavu-fonts-ttf/ttf/DejaVuSans-Bold.ttf'),
  /** The shipped heading face; its latin subset lacks e.g. Ł and Ž, so headings fall back to DejaVu Sans Bold. */
  heading: file('@fontsource/merriweather/files/merriweather-latin-700-normal.woff'),
};

/** Control characters (other than new lines) and bidi overrides never reach the page. */
export function printable(text: string): string {
  return text.replace(/[\u0000-\u0009\u000b-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/g, '');
}
