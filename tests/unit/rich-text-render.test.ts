import { describe, expect, it } from 'vitest';
import { renderRichText, sanitizeStoryHtml } from '../../server/richtext/render.js';
import type { RichTextDoc } from '../../shared/schemas/rich-text.js';

const para = (...content: object[]) => ({ type: 'paragraph', content });
const doc = (...content: object[]) => ({ type: 'doc', content }) as RichTextDoc;

describe('story rendering', () => {
  it('renders headings, lists, links, own images and explainers, with the words alone beside', () => {
    const out = renderRichText(
      doc(
        { type: 'heading', attrs: { level: 2 }, content: [{ type: 'text', text: 'The feed pump' }] },
        para({ type: 'text', text: 'It lifts ' }, { type: 'text', text: 'water', marks: [{ type: 'bold' }] }, { type: 'text', text: ' into the boiler.' }),
        { type: 'bulletList', content: [{ type: 'listItem', content: [para({ type: 'text', text: 'Look for the gauge.' })] }] },
        para({ type: 'text', text: 'More', marks: [{ type: 'link', attrs: { href: 'https://example.org/pumps' } }] }),
        { type: 'image', attrs: { src: '/api/v1/media/12/display', alt: 'Feed pump, port side' } },
        { type: 'explainer', attrs: { kind: 'unit-card', config: JSON.stringify({ label: 'Pressure', value: 150, from: 'psi', to: 'kPa' }) } },
      ),
    );
    expect(out.html).toContain('<h2>The feed pump</h2>');
    expect(out.html).toContain('<strong>water</strong>');
    expect(out.html).toContain('<ul><li><p>Look for the gauge.</p></li></ul>');
    expect(out.html).toContain('<a rel="noopener noreferrer nofollow" href="https://example.org/pumps">More</a>');
    expect(out.html).toContain('<img src="/api/v1/media/12/display" alt="Feed pump, port side"');
    expect(out.html).toMatch(/<figure data-explainer="unit-card" data-config="[^"]+" class="explainer"><figcaption>[^<]+<\/figcaption><\/figure>/);
    expect(out.text).toBe('The feed pump\nIt lifts water into the boiler.\nLook for the gauge.\nMore');
    expect(out.images).toEqual([{ mediaId: 12, alt: 'Feed pump, port side' }]);
    expect(out.explainers).toHaveLength(1);
  });

  it('keeps markup typed as text as text', () => {
    const out = renderRichText(doc(para({ type: 'text', text: '<script>alert(1)</script><img src=x onerror=alert(1)>' })));
    expect(out.html).toBe('<p>&lt;script&gt;alert(1)&lt;/script&gt;&lt;img src=x onerror=alert(1)&gt;</p>');
  });

  it('refuses 422 a node, a mark or an image the editor does not make', () => {
    const refused = (d: RichTextDoc) => {
      try {
        renderRichText(d, 'story');
      } catch (error) {
        return error as { status: number; code: string; fields: Record<string, string> };
      }
      return null;
    };
    for (const bad of [
      doc({ type: 'iframe', attrs: { src: 'https://evil.example' } }),
      doc({ type: 'codeBlock', content: [{ type: 'text', text: 'x' }] }),
      doc(para({ type: 'text', text: 'x', marks: [{ type: 'textStyle', attrs: { color: 'red' } }] })),
      doc({ type: 'image', attrs: { src: 'https://evil.example/pixel.gif', alt: '' } }),
      doc({ type: 'image', attrs: { src: 'data:image/svg+xml;base64,PHN2Zz4=', alt: '' } }),
      doc({ type: 'explainer', attrs: { kind: 'script', config: '' } }),
    ]) {
      const error = refused(bad);
      expect(error, JSON.stringify(bad)).toMatchObject({ status: 422, code: 'invalid_rich_text' });
      expect(Object.keys(error!.fields)).toEqual(['story']);
    }
  });

  it('drops links to scripts and data, so only http(s) and mailto links survive', () => {
    for (const href of ['javascript:alert(1)', 'JaVaScRiPt:alert(1)', 'data:text/html,<script>alert(1)</script>', 'vbscript:x']) {
      const out = renderRichText(doc(para({ type: 'text', text: 'click', marks: [{ type: 'link', attrs: { href } }] })));
      expect(out.html, href).not.toMatch(/javascript|data:|vbscript/i);
    }
    const mail = renderRichText(doc(para({ type: 'text', text: 'write', marks: [{ type: 'link', attrs: { href: 'mailto:docents@example.org' } }] })));
    expect(mail.html).toContain('href="mailto:docents@example.org"');
  });

  // Payloads after the OWASP XSS Filter Evasion Cheat Sheet (from memory).
  it.each([
    ['<img src=x onerror=alert(1)>', ''],
    ['<svg onload=alert(1)>', ''],
    ['<p onclick="alert(1)" style="color:red">hi</p>', '<p>hi</p>'],
    ['<a href="javascript:alert(1)">x</a>', '<a rel="noopener noreferrer nofollow">x</a>'],
    ['<a href="&#106;avascript:alert(1)">x</a>', '<a rel="noopener noreferrer nofollow">x</a>'],
    ['<iframe src="https://evil.example"></iframe>', ''],
    ['<math><mtext><table><mglyph><style><img src=x onerror=alert(1)>', ''],
    ['<img src="/api/v1/media/3/display" onerror="alert(1)" alt="ok">', '<img src="/api/v1/media/3/display" alt="ok" />'],
    ['<img src="//evil.example/x.png">', ''],
    ['<figure class="explainer evil" data-explainer="unit-card" onmouseover="x"><figcaption>ok</figcaption></figure>', '<figure class="explainer" data-explainer="unit-card"><figcaption>ok</figcaption></figure>'],
  ])('the allow-list strips %s', (input, expected) => {
    expect(sanitizeStoryHtml(input)).toBe(expected);
  });
});
