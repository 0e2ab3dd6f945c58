import { Node, mergeAttributes } from '@tiptap/core';

declare module '@tiptap/core' {
  interface Commands<ReturnType> {
    liveValue: {
      /** Inserts a Live value showing `output` of the block with id `block`. */
      insertLiveValue: (attrs: { block: string; output: string }) => ReturnType;
    };
  }
}

/**
 * The Live value node: inline and atomic (it is edited as one character), holding only a
 * reference to a block and the name of one of its outputs. The number itself is never in
 * the document: it comes from the block's current run, so it cannot drift from the block.
 */
export const liveValueNode = Node.create({
  name: 'liveValue',
  group: 'inline',
  inline: true,
  atom: true,
  selectable: true,

  addAttributes() {
    return {
      block: { default: null, parseHTML: (el) => el.getAttribute('data-block'), renderHTML: (a) => ({ 'data-block': a.block }) },
      output: { default: 'estimate', parseHTML: (el) => el.getAttribute('data-output') ?? 'estimate', renderHTML: (a) => ({ 'data-output': a.output }) },
    };
  },

  parseHTML() {
    return [{ tag: 'span[data-live-value]' }];
  },

  renderHTML({ HTMLAttributes }) {
    return ['span', mergeAttributes(HTMLAttributes, { 'data-live-value': '' }), '[live value]'];
  },

  renderText() {
    return '[live value]';
  },

  addCommands() {
    return {
      insertLiveValue:
        (attrs) =>
        ({ commands }) =>
          commands.insertContent({ type: this.name, attrs }),
    };
  },
});
