'use client';

import { useEffect, useRef, useState } from 'react';
import { NodeViewWrapper, type ReactNodeViewProps } from '@tiptap/react';
import useSWR from 'swr';
import type { FigureAttrs } from '@/lib/figures/figure-nodes';
import { editorDocumentIndex } from '@/lib/documents/model/document-index-plugin';
import type { MemoFigure } from '@/lib/figures/get-memo-figure';
import { swrFetcher } from '@/lib/client/fetch-json';
import { swrKeys } from '@/lib/client/swr-keys';
import { useCalcContext, useBlockState } from '../calc/calc-context';
import { useFigureContext } from '../calc/figure-context';
import { PreliminaryCaution } from './PreliminaryCaution';

/** Renders a Vega-Lite spec as SVG in the browser (vega, vega-lite and vega-interpreter are loaded on first use). */
function VegaSvg({ spec, label }: { spec: object; label: string }) {
  const ref = useRef<HTMLDivElement>(null);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    let view: { finalize: () => void } | undefined;
    let cancelled = false;
    (async () => {
      const [vega, vegaLite, { expressionInterpreter }] = await Promise.all([
        import('vega'),
        import('vega-lite'),
        import('vega-interpreter'),
      ]);
      if (cancelled || !ref.current) return;
      const compiled = vegaLite.compile(spec as Parameters<typeof vegaLite.compile>[0]).spec;
      // The page's CSP allows no eval: vega keeps each expression's syntax tree ({ast: true}) and
      // vega-interpreter evaluates it, instead of compiling it with `new Function` (vega docs, "Expression Interpreter").
      const v = new vega.View(vega.parse(compiled, undefined, { ast: true }), {
        renderer: 'svg',
        container: ref.current,
        hover: false,
        expr: expressionInterpreter,
      });
      view = v;
      await v.runAsync();
    })().catch((err: unknown) => setError(err instanceof Error ? err.message : String(err)));
    return () => {
      cancelled = true;
      view?.finalize();
    };
  }, [spec]);
  if (error)
    return (
      <p role="alert" className="text-note text-ember-700">
        The figure could not be drawn: {error}
      </p>
    );
  // vega takes over its container's role and aria-label (graphics-document, and no label without a spec
  // description), so the accessible name sits on a wrapper of its own.
  return (
    <div role="img" aria-label={label} className="figure-svg overflow-x-auto [&_svg]:max-w-full">
      <div ref={ref} />
    </div>
  );
}

/** A figure in the editor: a chart of one calc block's results, drawn from the server's spec. */
export function FigureView(props: ReactNodeViewProps) {
  const { node, updateAttributes, editor, selected, deleteNode } = props;
  const attrs = node.attrs as FigureAttrs;
  const { store } = useCalcContext();
  const { memoId, savedVersion, figureKinds } = useFigureContext();
  const bound = useBlockState(attrs.blockId);
  const editable = editor.isEditable;
  const kind = figureKinds.find((k) => k.kind === attrs.figureKind);
  const candidates = store.blocks().filter((b) => !kind || kind.sourceCalcKinds.includes(b.kind));
  const stamp =
    bound?.status === 'ok'
      ? bound.result.engineVersion + JSON.stringify(bound.result.inputs)
      : (bound?.status ?? 'none');
  const { data, error, isLoading } = useSWR<MemoFigure>(
    attrs.figureId
      ? `${swrKeys.memoFigure(memoId, attrs.figureId)}?v=${savedVersion}&r=${encodeURIComponent(stamp)}`
      : null,
    swrFetcher,
    {
      keepPreviousData: true,
      revalidateOnFocus: false,
    },
  );
  // Numbered by document order from the editor's document index, as the server and the PDF number it.
  const number = editorDocumentIndex(editor.state).figureNumbers.get(attrs.figureId) ?? 0;

  return (
    <NodeViewWrapper
      as="figure"
      className={`my-4 rounded-card border bg-paper-raised p-3 ${selected ? 'border-orbit-500 ring-2 ring-orbit-100' : 'border-rule'}`}
      data-figure-id={attrs.figureId}
      contentEditable={false}
    >
      {editable && (
        <div className="mb-2 flex flex-wrap items-center gap-2 text-note" data-drag-handle>
          <span aria-hidden="true" className="cursor-grab select-none font-mono text-ink-faint">
            ⠿
          </span>
          <label className="sr-only" htmlFor={`fk-${attrs.figureId}`}>
            Figure kind
          </label>
          <select
            id={`fk-${attrs.figureId}`}
            className="field w-auto py-0.5 text-note"
            value={attrs.figureKind}
            onChange={(e) => updateAttributes({ figureKind: e.target.value })}
          >
            {figureKinds.map((k) => (
              <option key={k.kind} value={k.kind}>
                {k.title}
              </option>
            ))}
          </select>
          <label className="text-micro uppercase text-ink-soft" htmlFor={`fb-${attrs.figureId}`}>
            from
          </label>
          <select
            id={`fb-${attrs.figureId}`}
            className="field w-auto py-0.5 text-note"
            value={attrs.blockId}
            onChange={(e) => updateAttributes({ blockId: e.target.value })}
          >
            <option value="">— choose a block —</option>
            {candidates.map((b) => (
              <option key={b.blockId} value={b.blockId}>
                {b.label || b.kind}
              </option>
            ))}
          </select>
          <button type="button" className="btn-quiet ml-auto py-0.5" onClick={() => deleteNode()}>
            Remove
          </button>
        </div>
      )}
      <div className={isLoading && !data ? 'min-h-40 animate-pulse rounded-card bg-paper-sunk' : ''}>
        {data?.spec ? <VegaSvg spec={data.spec} label={`Figure ${number}: ${attrs.caption}`} /> : null}
        {data && !data.spec && (
          <p role="alert" className="text-note text-ember-700">
            This figure cannot be drawn: {data.error}
          </p>
        )}
        {error && (
          <p role="alert" className="text-note text-ember-700">
            The figure is not available yet: {error.message}
            {editable ? ' (it appears once the memo is saved)' : ''}
          </p>
        )}
      </div>
      <figcaption className="mt-2 flex items-baseline gap-2 text-note">
        <span className="font-semibold">Figure {number}.</span>
        {editable ? (
          <input
            aria-label={`Caption of figure ${number}`}
            className="flex-1 rounded-chip border border-transparent bg-transparent px-1 hover:border-rule focus:border-orbit-500"
            value={attrs.caption}
            placeholder="Caption"
            onChange={(e) => updateAttributes({ caption: e.target.value })}
          />
        ) : (
          <span>{attrs.caption}</span>
        )}
      </figcaption>
      <PreliminaryCaution />
    </NodeViewWrapper>
  );
}
