import { describe, expect, it } from 'vitest';
import { firstLine, stopUrl } from '../../server/services/tour-placards-pdf.js';

describe('placard text', () => {
  it('prints the first sentence of the first block, as text', () => {
    expect(firstLine('<h2>The stokehold</h2><p>Two boilers.</p>')).toBe('The stokehold');
    expect(firstLine('<p>Coal &amp; ash went up the hoist. Then overboard.</p>')).toBe('Coal & ash went up the hoist.');
    expect(firstLine('<figure class="explainer"><figcaption>Boils at 125 °F.</figcaption></figure><p>Later.</p>')).toBe('Boils at 125 °F.');
  });

  it('cuts a long sentence on a word at 140 characters', () => {
    const long = `<p>${'steam '.repeat(40).trim()}</p>`;
    const line = firstLine(long);
    expect(line.length).toBeLessThanOrEqual(140);
    expect(line.endsWith('steam…')).toBe(true);
  });

  it('codes the public address of the stop', () => {
    expect(stopUrl('https://ship.example', 'fire-and-steam', 3)).toBe('https://ship.example/visit/tours/fire-and-steam/stops/3?here=1');
  });
});
