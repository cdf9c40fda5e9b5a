'use client';

import { useRef } from 'react';
import type { Editor } from '@tiptap/core';
import { useEditorState } from '@tiptap/react';
import type { CalcKindDescriptor } from '@/lib/calc';
import { ValuePicker } from './ValuePicker';
import { PickList } from './PickList';
import { LinkDialog } from './LinkDialog';
import type { FigureKindInfo } from '@/lib/figures/figure-types';
import { useCalcContext } from './calc/calc-context';
import { editorDocumentIndex } from '@/lib/documents/model/document-index-plugin';

export type PickerState = 'none' | 'kind' | 'value' | 'figure' | 'requirement' | 'link';
type Props = {
  editor: Editor;
  kinds: ReadonlyMap<string, CalcKindDescriptor>;
  figureKinds: readonly FigureKindInfo[];
  onUploadImage: (file: File) => Promise<void>;
  picker: PickerState;
  setPicker: (p: PickerState) => void;
};

/** The memo's figures in document order, for references in the text. */
function figuresOf(editor: Editor): { figureId: string; number: number; caption: string }[] {
  const index = editorDocumentIndex(editor.state);
  return index.figures.map((f) => ({
    figureId: f.figureId,
    number: index.figureNumbers.get(f.figureId) ?? 0,
    caption: f.caption,
  }));
}

/** Nodewright's toolbar: text structure on the left, engine objects (calc block, live value) on the right. */
export function Toolbar({ editor, kinds, figureKinds, onUploadImage, picker, setPicker }: Props) {
  const { store } = useCalcContext();
  const active = useEditorState({
    editor,
    selector: ({ editor: e }) => ({
      bold: e.isActive('bold'),
      italic: e.isActive('italic'),
      h1: e.isActive('heading', { level: 1 }),
      h2: e.isActive('heading', { level: 2 }),
      h3: e.isActive('heading', { level: 3 }),
      bullet: e.isActive('bulletList'),
      ordered: e.isActive('orderedList'),
      quote: e.isActive('blockquote'),
      link: e.isActive('link'),
      href: String(e.getAttributes('link').href ?? ''),
      table: e.isActive('table'),
    }),
  });
  const fileRef = useRef<HTMLInputElement>(null);

  const b = (label: string, shortcut: string, on: boolean, run: () => void, text: string) => (
    <button
      type="button"
      aria-pressed={on}
      title={`${label}${shortcut ? ` (${shortcut})` : ''}`}
      onMouseDown={(e) => e.preventDefault()}
      onClick={run}
      className={`min-w-8 rounded-chip px-2 py-1 text-note ${on ? 'bg-orbit-600 text-white' : 'text-ink hover:bg-paper-sunk'}`}
    >
      {/* The glyph is shown, the label is read: a name of its own (aria-label) would have to contain the glyph (WCAG 2.1 SC 2.5.3). */}
      <span aria-hidden="true">{text}</span>
      <span className="sr-only">{label}</span>
    </button>
  );
  const chain = () => editor.chain().focus();
  /** Closing a pick list puts the caret back in the text, where the keyboard user was. */
  const closePicker = () => {
    setPicker('none');
    editor.commands.focus();
  };
  const insertAndClose = (insert: () => void) => {
    insert();
    setPicker('none');
  };

  return (
    <div
      role="toolbar"
      aria-label="Formatting and calculations"
      className="sticky top-0 z-10 flex flex-wrap items-center gap-1 border-b border-rule bg-paper-raised px-2 py-1"
    >
      {b('Bold', 'Ctrl+B', active.bold, () => chain().toggleBold().run(), 'B')}
      {b('Italic', 'Ctrl+I', active.italic, () => chain().toggleItalic().run(), 'I')}
      <span className="mx-1 h-5 w-px bg-rule" aria-hidden="true" />
      {b('Section heading', 'Ctrl+Alt+1', active.h1, () => chain().toggleHeading({ level: 1 }).run(), '§1')}
      {b('Subsection heading', 'Ctrl+Alt+2', active.h2, () => chain().toggleHeading({ level: 2 }).run(), '§2')}
      {b('Sub-subsection heading', 'Ctrl+Alt+3', active.h3, () => chain().toggleHeading({ level: 3 }).run(), '§3')}
      <span className="mx-1 h-5 w-px bg-rule" aria-hidden="true" />
      {b('Bulleted list', 'Ctrl+Shift+8', active.bullet, () => chain().toggleBulletList().run(), '•')}
      {b('Numbered list', 'Ctrl+Shift+7', active.ordered, () => chain().toggleOrderedList().run(), '1.')}
      {b('Quotation', 'Ctrl+Shift+B', active.quote, () => chain().toggleBlockquote().run(), '❝')}
      {b('Table', '', false, () => chain().insertTable({ rows: 3, cols: 3, withHeaderRow: true }).run(), '▦')}
      <span className="relative">
        {b('Link', '', active.link, () => setPicker(picker === 'link' ? 'none' : 'link'), 'Link')}
        {picker === 'link' && (
          <LinkDialog
            initialHref={active.href}
            onSet={(href) => insertAndClose(() => chain().extendMarkRange('link').setLink({ href }).run())}
            onRemove={
              active.link ? () => insertAndClose(() => chain().extendMarkRange('link').unsetLink().run()) : undefined
            }
            onClose={closePicker}
          />
        )}
      </span>
      {active.table && (
        <span role="group" aria-label="Table rows and columns" className="flex gap-1">
          {b('Add row below', '', false, () => chain().addRowAfter().run(), '+Row')}
          {b('Delete row', '', false, () => chain().deleteRow().run(), '−Row')}
          {b('Add column right', '', false, () => chain().addColumnAfter().run(), '+Col')}
          {b('Delete column', '', false, () => chain().deleteColumn().run(), '−Col')}
          {b('Delete table', '', false, () => chain().deleteTable().run(), '×Table')}
        </span>
      )}
      {/* eslint-disable-next-line react-hooks/refs -- b() only passes this callback to the button's onClick, so the ref is read on click, not during render */}
      {b('Image', '', false, () => fileRef.current?.click(), 'Image')}
      <input
        ref={fileRef}
        type="file"
        accept="image/png,image/jpeg,image/gif,image/webp"
        className="hidden"
        aria-hidden="true"
        tabIndex={-1}
        onChange={async (e) => {
          const f = e.target.files?.[0];
          e.target.value = '';
          if (f) await onUploadImage(f);
        }}
      />
      <span className="mx-1 h-5 w-px bg-rule" aria-hidden="true" />
      {b('Undo', 'Ctrl+Z', false, () => chain().undo().run(), '↶')}
      {b('Redo', 'Ctrl+Shift+Z', false, () => chain().redo().run(), '↷')}
      <div className="relative ml-auto flex gap-1">
        <button
          type="button"
          className="btn-quiet py-1"
          aria-expanded={picker === 'kind'}
          onClick={() => setPicker(picker === 'kind' ? 'none' : 'kind')}
          title="Insert a calc block (Ctrl+Alt+K)"
        >
          + Calc block
        </button>
        <button
          type="button"
          className="btn-quiet py-1"
          aria-expanded={picker === 'figure'}
          onClick={() => setPicker(picker === 'figure' ? 'none' : 'figure')}
          title="Insert a figure drawn from a calc block"
        >
          + Figure
        </button>
        <button
          type="button"
          className="btn-quiet py-1"
          aria-expanded={picker === 'value'}
          onClick={() => setPicker(picker === 'value' ? 'none' : 'value')}
          title="Quote a computed value in the text (Ctrl+Alt+V)"
        >
          {'{x}'} Live value
        </button>
        <button
          type="button"
          className="btn-quiet py-1"
          aria-expanded={picker === 'requirement'}
          onClick={() => setPicker(picker === 'requirement' ? 'none' : 'requirement')}
          title="State a requirement on a computed value, checked live"
        >
          ✓ Requirement
        </button>
        {picker === 'kind' && (
          <PickList
            label="Calculation kinds"
            items={[...kinds.values()].map((k) => ({
              key: k.kind,
              title: k.title,
              detail: k.summary,
              keywords: k.kind,
              pick: () => insertAndClose(() => chain().insertCalcBlock({ kind: k.kind, label: k.title }).run()),
            }))}
            onClose={closePicker}
          />
        )}
        {picker === 'figure' && (
          <PickList
            label="Figure kinds"
            onClose={closePicker}
            items={figureKinds.map((k) => {
              const source = store.blocks().find((b) => k.sourceCalcKinds.includes(b.kind));
              return {
                key: k.kind,
                title: k.title,
                detail: source
                  ? `from ${source.label || source.kind}`
                  : `needs a ${k.sourceCalcKinds.join(' or ')} block`,
                keywords: k.sourceCalcKinds.join(' '),
                pick: () =>
                  insertAndClose(() =>
                    chain()
                      .insertFigure({ figureKind: k.kind, blockId: source?.blockId ?? '', caption: '' })
                      .run(),
                  ),
              };
            })}
          />
        )}
        {picker === 'value' && (
          <ValuePicker
            kinds={kinds}
            figures={figuresOf(editor)}
            onPickFigure={(figureId) => {
              chain().insertFigureRef({ figureId }).run();
              setPicker('none');
            }}
            onPick={(blockId, output) => {
              chain().insertLiveValue({ blockId, output }).run();
              setPicker('none');
            }}
            onClose={closePicker}
          />
        )}
        {picker === 'requirement' && (
          <ValuePicker
            kinds={kinds}
            figures={[]}
            numericOnly
            label="Value the requirement checks"
            footer={{
              text: 'Insert the compliance table',
              run: () => {
                chain().insertComplianceTable().run();
                setPicker('none');
              },
            }}
            onPickFigure={() => undefined}
            onPick={(blockId, output) => {
              chain().insertRequirement({ blockId, output }).run();
              setPicker('none');
            }}
            onClose={() => setPicker('none')}
          />
        )}
      </div>
    </div>
  );
}
