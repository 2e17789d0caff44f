import { generateHTML } from '@tiptap/html/server';
import sanitizeHtml from 'sanitize-html';
import { LINK_PROTOCOLS, OWN_MEDIA_SRC, richTextExtensions } from '../../shared/richtext/extensions.js';
import { EXPLAINER_KINDS } from '../../shared/richtext/explainers.js';
import type { RichTextDoc } from '../../shared/schemas/rich-text.js';
import { InvalidRichTextError } from '../http/errors.js';

export interface RenderedRichText {
  /** Sanitized HTML, the only form of a story that leaves the server. */
  html: string;
  /** The words alone, for search, reading figures and the PDF. */
  text: string;
  /** Media ids of the images it shows, with their alt text. */
  images: { mediaId: number; alt: string }[];
  explainers: { kind: string; config: string }[];
}

const NODES = new Set(['doc', 'paragraph', 'text', 'heading', 'bulletList', 'orderedList', 'listItem', 'blockquote', 'hardBreak', 'horizontalRule', 'image', 'explainer']);
const MARKS = new Set(['bold', 'italic', 'strike', 'link']);

interface AnyNode {
  type: string;
  text?: string;
  attrs?: Record<string, unknown>;
  content?: AnyNode[];
  marks?: { type: string; attrs?: Record<string, unknown> }[];
}

function checkNodes(node: AnyNode, field: string): void {
  if (!NODES.has(node.type)) throw new InvalidRichTextError(field, `The text holds a "${node.type.slice(0, 40)}" block, which stories do not use.`);
  for (const mark of node.marks ?? []) {
    if (!MARKS.has(mark.type)) throw new InvalidRichTextError(field, `The text holds a "${mark.type.slice(0, 40)}" mark, which stories do not use.`);
  }
  if (node.type === 'image' && !OWN_MEDIA_SRC.test(String(node.attrs?.src ?? ''))) {
    throw new InvalidRichTextError(field, 'Images in a story must come from the collection’s own photos.');
  }
  if (node.type === 'explainer' && !EXPLAINER_KINDS.includes(node.attrs?.kind as (typeof EXPLAINER_KINDS)[number])) {
    throw new InvalidRichTextError(field, 'The text holds an explainer of an unknown kind.');
  }
  for (const child of node.content ?? []) checkNodes(child, field);
}

/** The allow-list: what StarterKit (two heading levels), links, own images and explainers make, and nothing else. */
const SANITIZE: sanitizeHtml.IOptions = {
  allowedTags: ['p', 'h2', 'h3', 'strong', 'em', 's', 'blockquote', 'ul', 'ol', 'li', 'br', 'hr', 'a', 'img', 'figure', 'figcaption'],
  allowedAttributes: {
    a: ['href', 'rel'],
    img: ['src', 'alt', 'title'],
    ol: ['start'],
    figure: ['data-explainer', 'data-config', 'class'],
  },
  allowedClasses: { figure: ['explainer'] },
  allowedSchemes: [...LINK_PROTOCOLS],
  allowedSchemesByTag: { img: [] },
  allowProtocolRelative: false,
  disallowedTagsMode: 'discard',
  exclusiveFilter: (frame) => frame.tag === 'img' && !OWN_MEDIA_SRC.test(frame.attribs.src ?? ''),
  transformTags: {
    a: (tagName, attribs) => ({ tagName, attribs: { ...attribs, rel: 'noopener noreferrer nofollow' } }),
  },
};

export function sanitizeStoryHtml(html: string): string {
  return sanitizeHtml(html, SANITIZE);
}

function collect(node: AnyNode, out: RenderedRichText, words: string[]): void {
  if (node.type === 'text' && node.text) words.push(node.text);
  if (node.type === 'image') {
    const id = /\/media\/(\d+)\//.exec(String(node.attrs?.src ?? ''))?.[1];
    if (id) out.images.push({ mediaId: Number(id), alt: String(node.attrs?.alt ?? '') });
  }
  if (node.type === 'explainer') out.explainers.push({ kind: String(node.attrs?.kind), config: String(node.attrs?.config ?? '') });
  const block = ['paragraph', 'heading', 'listItem', 'blockquote', 'hardBreak'].includes(node.type);
  for (const child of node.content ?? []) collect(child, out, words);
  if (block) words.push('\n');
}

/**
 * A story document to sanitized HTML at save: refused (422) when it holds anything the editor
 * does not make, so what is stored is exactly what the docent saw.
 */
export function renderRichText(doc: RichTextDoc, field = 'text'): RenderedRichText {
  checkNodes(doc as AnyNode, field);
  let raw: string;
  try {
    raw = generateHTML(doc as Parameters<typeof generateHTML>[0], richTextExtensions());
  } catch {
    throw new InvalidRichTextError(field, 'The text could not be read as a story document; reload the editor and try again.');
  }
  const out: RenderedRichText = { html: sanitizeStoryHtml(raw), text: '', images: [], explainers: [] };
  const words: string[] = [];
  collect(doc as AnyNode, out, words);
  out.text = words.join('').replace(/[ \t]+\n/g, '\n').replace(/\n{2,}/g, '\n').trim();
  return out;
}
