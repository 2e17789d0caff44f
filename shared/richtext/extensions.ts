import type { Extensions } from '@tiptap/core';
import StarterKit from '@tiptap/starter-kit';
import Image from '@tiptap/extension-image';
import { ExplainerNode } from './explainer-node.js';

/** Where a story's images may come from: our own media, by id (staff and public paths). */
export const OWN_MEDIA_SRC = /^\/api\/v1\/(?:visit\/)?media\/\d+\/(?:display|thumb)$/;
export const LINK_PROTOCOLS = ['http', 'https', 'mailto'] as const;

export function mediaSrc(mediaId: number): string {
  return `/api/v1/media/${mediaId}/display`;
}

/**
 * The one list of what a story may hold, used by the editor and by the server's renderer, so
 * that what the docent sees is what the visitor gets: StarterKit with two heading levels, links,
 * images from the collection with their alt text, and explainers.
 */
export function richTextExtensions(): Extensions {
  return [
    StarterKit.configure({
      heading: { levels: [2, 3] },
      code: false,
      codeBlock: false,
      underline: false,
      link: {
        openOnClick: false,
        autolink: true,
        protocols: ['mailto'],
        defaultProtocol: 'https',
        isAllowedUri: (url) => /^(https?:\/\/|mailto:)/i.test(url),
        HTMLAttributes: { rel: 'noopener noreferrer nofollow', target: null },
      },
    }),
    Image.configure({ inline: false, allowBase64: false }),
    ExplainerNode,
  ];
}
