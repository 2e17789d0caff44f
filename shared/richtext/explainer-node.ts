import { Node, mergeAttributes } from '@tiptap/core';
import { explainerSummary, parseExplainerConfig, EXPLAINER_KINDS, type ExplainerKind } from './explainers.js';

/**
 * A machinery explainer inside a story: an atom block that keeps its kind and settings as
 * attributes. Rendered as a <figure> carrying its settings as data and a plain-text summary,
 * so that the HTML reads without scripts and the visitor site can make it interactive.
 */
export const ExplainerNode = Node.create({
  name: 'explainer',
  group: 'block',
  atom: true,
  selectable: true,
  draggable: true,

  addAttributes() {
    return {
      kind: {
        default: 'boiling-ladder' as ExplainerKind,
        parseHTML: (el: { getAttribute(name: string): string | null }) => {
          const kind = el.getAttribute('data-explainer');
          return EXPLAINER_KINDS.includes(kind as ExplainerKind) ? kind : null;
        },
        renderHTML: (attrs: { kind: ExplainerKind }) => ({ 'data-explainer': attrs.kind }),
      },
      config: {
        default: null,
        parseHTML: (el: { getAttribute(name: string): string | null }) => el.getAttribute('data-config'),
        renderHTML: (attrs: { config: string | null }) => ({ 'data-config': attrs.config ?? '' }),
      },
    };
  },

  parseHTML() {
    return [{ tag: 'figure[data-explainer]' }];
  },

  renderHTML({ node, HTMLAttributes }) {
    const kind = node.attrs.kind as ExplainerKind;
    const config = parseExplainerConfig(kind, node.attrs.config as string | null);
    return ['figure', mergeAttributes(HTMLAttributes, { class: 'explainer' }), ['figcaption', {}, explainerSummary(kind, config)]];
  },
});
