import type { Extensions } from '@tiptap/core';
import StarterKit from '@tiptap/starter-kit';
import { TableKit } from '@tiptap/extension-table';
import { CalcBlock } from './nodes/calc-block';
import { CaptionedImage } from './nodes/captioned-image';
import { Figure } from './nodes/figure';
import { LiveValue } from './nodes/live-value';
import { FigureRef } from './nodes/figure-ref';

/**
 * The one extension list of a memo document. The editor, the server-side
 * readers (freeze, diff) and the PDF renderer all build their schema from
 * this list, so a node type exists everywhere or nowhere. The editor adds
 * React node views on top (components/editor/editor-extensions.ts) without
 * changing the schema.
 */
export function memoExtensions(): Extensions {
  return [
    StarterKit.configure({ heading: { levels: [1, 2, 3] }, link: { openOnClick: false, autolink: true } }),
    CaptionedImage,
    TableKit.configure({ table: { resizable: false } }),
    CalcBlock,
    LiveValue,
    Figure,
    FigureRef,
  ];
}

/** Node types a stored memo may contain (the PDF renderer needs a handler for each). */
export const MEMO_NODE_TYPES = [
  'doc', 'paragraph', 'text', 'heading', 'bulletList', 'orderedList', 'listItem', 'blockquote', 'codeBlock', 'hardBreak', 'horizontalRule',
  'image', 'table', 'tableRow', 'tableHeader', 'tableCell', 'calcBlock', 'liveValue', 'figure', 'figureRef',
] as const;
/** Marks a stored memo may contain. */
export const MEMO_MARK_TYPES = ['bold', 'italic', 'strike', 'code', 'underline', 'link'] as const;
