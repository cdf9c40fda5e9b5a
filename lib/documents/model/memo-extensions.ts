import type { Extensions } from '@tiptap/core';
import StarterKit from '@tiptap/starter-kit';
import { TableKit } from '@tiptap/extension-table';
import { CalcBlock } from './nodes/calc-block';
import { CaptionedImage } from './nodes/captioned-image';
import { Figure } from './nodes/figure';
import { LiveValue } from './nodes/live-value';
import { FigureRef } from '@/lib/documents/model/nodes/figure-ref';
import { Requirement } from './nodes/requirement';
import { ComplianceTable } from './nodes/compliance-table';
import { DocumentIndexExtension } from './document-index-plugin';

/**
 * The one extension list of a memo document. The editor, the server-side
 * readers (freeze, diff) and the PDF renderer all build their schema from
 * this list, so a node type exists everywhere or nowhere. The editor adds
 * React node views on top (components/editor/editor-extensions.ts) without
 * changing the schema. The node types are listed in ./node-types.ts; the
 * document index plugin adds no schema, only the editor's DocumentIndex.
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
    Requirement,
    ComplianceTable,
    DocumentIndexExtension,
  ];
}

export { MEMO_NODE_TYPES, MEMO_MARK_TYPES } from './node-types';
