import { describe, expect, it } from 'vitest';
import { checkLinkAddress } from '../../shared/richtext/link-address.js';
import { isEmptyRichText, richTextPlainText } from '../../shared/richtext/plain-text.js';
import type { RichTextDoc } from '../../shared/schemas/rich-text.js';
import { renderRichText } from '../../server/richtext/render.js';

const story: RichTextDoc = {
  type: 'doc',
  content: [
    { type: 'heading', attrs: { level: 2 }, content: [{ type: 'text', text: 'The evaporator' }] },
    { type: 'paragraph', content: [{ type: 'text', text: 'Sea water went in. ' }, { type: 'text', text: 'Fresh', marks: [{ type: 'bold' }] }, { type: 'text', text: ' water came out.' }] },
    { type: 'bulletList', content: [{ type: 'listItem', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Shell' }] }] }] },
    { type: 'explainer', attrs: { kind: 'unit-card', config: null } },
  ],
};

describe('richTextPlainText', () => {
  it('gives the words the server stores, so the figures while writing match the saved ones', () => {
    expect(richTextPlainText(story)).toBe(renderRichText(story).text);
    expect(richTextPlainText(story)).toBe('The evaporator\nSea water went in. Fresh water came out.\nShell');
  });

  it('counts an editor’s empty paragraph as empty, an image or explainer as content', () => {
    expect(isEmptyRichText({ type: 'doc', content: [{ type: 'paragraph' }] })).toBe(true);
    expect(isEmptyRichText({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: '  ' }] }] })).toBe(true);
    expect(isEmptyRichText({ type: 'doc', content: [{ type: 'explainer', attrs: { kind: 'unit-card' } }] })).toBe(false);
  });
});

describe('checkLinkAddress', () => {
  it.each([
    ['https://example.org/a', 'https://example.org/a'],
    ['http://example.org', 'http://example.org'],
    ['mailto:docents@example.org', 'mailto:docents@example.org'],
    ['docents@example.org', 'mailto:docents@example.org'],
    ['example.org/visit', 'https://example.org/visit'],
  ])('takes %s as %s', (raw, href) => expect(checkLinkAddress(raw)).toEqual({ href }));

  it.each(['javascript:alert(1)', 'data:text/html,<b>x</b>', 'ftp://example.org', 'vbscript:msgbox'])('refuses %s', (raw) =>
    expect(checkLinkAddress(raw)).toEqual({ problem: 'Links may go only to web addresses (starting with https:// or http://) or e-mail addresses (mailto:).' }),
  );
  it('asks for an address when empty', () => expect(checkLinkAddress('  ')).toEqual({ problem: 'Give the address the link goes to.' }));
});
