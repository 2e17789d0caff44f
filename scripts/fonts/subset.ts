// Writes the heading font's two weights cut down to the characters our pages use (Basic Latin,
// Latin-1 and the common punctuation) into src/assets/fonts/, from the @fontsource files. Run it
// again after upgrading @fontsource/merriweather: `npx tsx scripts/fonts/subset.ts`.
import { readFileSync, writeFileSync } from 'node:fs';
import subsetFont from 'subset-font';

const range = (from: number, to: number) => Array.from({ length: to - from + 1 }, (_, i) => String.fromCodePoint(from + i)).join('');
/** Keep in step with the unicode-range in src/assets/fonts.css. */
const CHARACTERS = range(0x20, 0x7e) + range(0xa0, 0xff) + '‘’“”–—…•€×·';

for (const weight of [400, 700]) {
  const source = readFileSync(`node_modules/@fontsource/merriweather/files/merriweather-latin-${weight}-normal.woff2`);
  const subset = await subsetFont(source, CHARACTERS, { targetFormat: 'woff2' });
  writeFileSync(`src/assets/fonts/merriweather-${weight}.woff2`, subset);
  console.log(`merriweather ${weight}: ${source.length} → ${subset.length} bytes`);
}
