import { z } from 'zod';
import { characterProblem, INVALID_CHARACTERS } from './text.js';

/** The largest story document accepted, as JSON (a 5,000-word stop is about 60 kB). */
export const RICH_TEXT_MAX_BYTES = 400_000;

interface RichTextNode {
  type: string;
  text?: string;
  attrs?: Record<string, unknown>;
  content?: RichTextNode[];
  marks?: { type: string; attrs?: Record<string, unknown> }[];
}
export interface RichTextDoc {
  type: 'doc';
  content?: RichTextNode[];
}

function firstTextProblem(node: RichTextNode, label: string): string | null {
  if (typeof node.text === 'string') {
    const problem = characterProblem(node.text, 'free', label);
    if (problem) return problem;
  }
  for (const child of node.content ?? []) {
    const problem = firstTextProblem(child, label);
    if (problem) return problem;
  }
  return null;
}

// A named object with a getter is how zod 4 declares a recursive schema; the OpenAPI generator then writes a $ref to it.
const node: z.ZodType<RichTextNode> = z
  .object({
    type: z.string().max(40),
    text: z.string().optional(),
    attrs: z.record(z.string(), z.unknown()).optional(),
    get content() {
      return z.array(node).max(5000).optional();
    },
    marks: z.array(z.object({ type: z.string().max(40), attrs: z.record(z.string(), z.unknown()).optional() })).max(10).optional(),
  })
  .meta({ id: 'RichTextNode' });

/** A tiptap (ProseMirror) JSON document; its text obeys the character rule of free text. */
export function richTextDoc(label = 'Text') {
  return z
    .object({ type: z.literal('doc', { error: `${label} must be a rich-text document.` }), content: z.array(node).max(5000).optional() })
    .check((ctx) => {
      if (JSON.stringify(ctx.value).length > RICH_TEXT_MAX_BYTES) {
        ctx.issues.push({ code: 'custom', message: `${label} is too long (at most ${RICH_TEXT_MAX_BYTES / 1000} kB).`, input: ctx.value });
        return;
      }
      const problem = firstTextProblem(ctx.value as RichTextNode, label);
      if (problem) ctx.issues.push({ code: 'custom', message: problem, input: ctx.value, params: { rule: INVALID_CHARACTERS } });
    }) as z.ZodType<RichTextDoc>;
}

export const EMPTY_DOC: RichTextDoc = { type: 'doc', content: [{ type: 'paragraph' }] };
