import type { RichTextDoc } from '@shared/schemas/rich-text';

/** Plain text as a rich-text document: one paragraph per non-empty line. */
export function docFromText(text: string): RichTextDoc {
  const paragraphs = text.split('\n').map((line) => line.trim()).filter(Boolean);
  return { type: 'doc', content: paragraphs.length ? paragraphs.map((line) => ({ type: 'paragraph', content: [{ type: 'text', text: line }] })) : [{ type: 'paragraph' }] };
}

type Node = { type: string; text?: string; content?: Node[] };

/** The text of a document, one line per block (what the plain field edits). */
export function textFromDoc(doc: RichTextDoc | null | undefined): string {
  const lines: string[] = [];
  const walk = (node: Node): string => (node.text ?? '') + (node.content ?? []).map(walk).join('');
  for (const block of (doc?.content ?? []) as Node[]) {
    if (block.type === 'bulletList' || block.type === 'orderedList') for (const item of block.content ?? []) lines.push(walk(item));
    else lines.push(walk(block));
  }
  return lines.filter((l) => l.trim()).join('\n');
}
