'use client';

import { useId } from 'react';
import { NodeViewWrapper, type ReactNodeViewProps } from '@tiptap/react';
import { IMAGE_CAPTION_MAX } from '@/lib/documents/model/nodes/captioned-image';

/**
 * An image in the editor with its alt text (read out in place of the image) and its caption
 * (the node's `caption`, which the PDF prints under the image) editable next to it.
 */
export function ImageView({ node, updateAttributes, editor, selected }: ReactNodeViewProps) {
  const id = useId();
  const src = String(node.attrs.src ?? '');
  const alt = String(node.attrs.alt ?? '');
  const caption = String(node.attrs.caption ?? '');
  const editable = editor.isEditable;
  return (
    <NodeViewWrapper as="figure" className="my-3" data-image-view="">
      {/* eslint-disable-next-line @next/next/no-img-element -- user attachment served by our API; next/image optimisation does not apply */}
      <img src={src} alt={alt} className={`!my-0 ${selected ? 'ring-2 ring-orbit-500' : ''}`} data-drag-handle="" />
      {editable ? (
        <div className="mt-1 grid gap-1 sm:grid-cols-2" contentEditable={false}>
          <div>
            <label className="label" htmlFor={`${id}-alt`}>
              Alt text
            </label>
            <input
              id={`${id}-alt`}
              className="field py-1 text-note"
              value={alt}
              maxLength={500}
              placeholder="What the image shows, for a screen reader"
              onChange={(e) => updateAttributes({ alt: e.target.value || null })}
            />
          </div>
          <div>
            <label className="label" htmlFor={`${id}-caption`}>
              Caption
            </label>
            <input
              id={`${id}-caption`}
              className="field py-1 text-note"
              value={caption}
              maxLength={IMAGE_CAPTION_MAX}
              placeholder="Printed under the image in the PDF"
              onChange={(e) => updateAttributes({ caption: e.target.value || null })}
            />
          </div>
        </div>
      ) : (
        caption && <figcaption className="mt-1 text-note text-ink-soft">{caption}</figcaption>
      )}
    </NodeViewWrapper>
  );
}
