import type { RichTextDoc } from '../schemas/rich-text.js';

interface AnyNode {
  type: string;
  text?: string;
  content?: AnyNode[];
}

const BLOCKS = new Set(['paragraph', 'heading', 'listItem', 'blockquote', 'hardBreak']);

function collect(node: AnyNode, words: string[]): void {
  if (node.type === 'text' && node.text) words.push(node.text);
  for (const child of node.content ?? []) collect(child, words);
  if (BLOCKS.has(node.type)) words.push('\n');
}

/**
 * The words of a story, one line per block, as the server's renderer stores them beside the HTML:
 * what the reading figures count while a person writes.
 */
export function richTextPlainText(doc: RichTextDoc | null | undefined): string {
  if (!doc) return '';
  const words: string[] = [];
  collect(doc as AnyNode, words);
  return words.join('').replace(/[ \t]+\n/g, '\n').replace(/\n{2,}/g, '\n').trim();
}

/** Whether a story holds no words, images or explainers (an editor's empty paragraph counts as empty). */
export function isEmptyRichText(doc: RichTextDoc | null | undefined): boolean {
  const walk = (node: AnyNode): boolean =>
    (node.type === 'text' && Boolean(node.text?.trim())) || node.type === 'image' || node.type === 'explainer' || (node.content ?? []).some(walk);
  return !doc || !walk(doc as AnyNode);
}
