/**
 * The memo's image node: Tiptap's Image with a `caption` attribute (printed under the image in the PDF and used as its
 * alternative text). The caption is asked for when an image is added and changed by double-clicking the image; the
 * file name is never used, as it says nothing to the reader.
 */
import Image from '@tiptap/extension-image';
import { Plugin } from '@tiptap/pm/state';

export const IMAGE_CAPTION_MAX = 500;

export const askImageCaption = (current: string): string | null =>
  window.prompt('Caption of this image (printed under it in the PDF, and its alternative text)', current);

export const CaptionedImage = Image.extend({
  addAttributes() {
    return {
      ...this.parent?.(),
      caption: {
        default: null,
        parseHTML: (el: HTMLElement) => el.getAttribute('data-caption'),
        renderHTML: (attrs: { caption?: string | null }) => (attrs.caption ? { 'data-caption': attrs.caption } : {}),
      },
    };
  },
  addProseMirrorPlugins() {
    return [
      new Plugin({
        props: {
          handleDoubleClickOn: (view, pos, node) => {
            if (node.type.name !== this.name || !view.editable) return false;
            const caption = askImageCaption(typeof node.attrs.caption === 'string' ? node.attrs.caption : '');
            if (caption === null) return true;
            const text = caption.trim().slice(0, IMAGE_CAPTION_MAX);
            view.dispatch(
              view.state.tr.setNodeMarkup(pos, undefined, { ...node.attrs, caption: text || null, alt: text || null }),
            );
            return true;
          },
        },
      }),
    ];
  },
}).configure({ inline: false });
