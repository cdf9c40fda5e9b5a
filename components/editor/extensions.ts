import type { Extensions } from '@tiptap/core';
import StarterKit from '@tiptap/starter-kit';
import Image from '@tiptap/extension-image';
import { TableKit } from '@tiptap/extension-table';

/**
 * The one extension list of a memo document. The editor, the server-side
 * readers (read view, freeze, diff) and the PDF renderer all build their
 * schema from this list, so a node type exists everywhere or nowhere.
 */
export function memoExtensions(): Extensions {
  return [
    StarterKit.configure({ heading: { levels: [1, 2, 3] }, link: { openOnClick: false, autolink: true } }),
    Image.configure({ inline: false }),
    TableKit.configure({ table: { resizable: false } }),
  ];
}
