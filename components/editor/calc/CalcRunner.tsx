'use client';

import { useEffect, useMemo, useReducer, useState } from 'react';
import useSWR from 'swr';
import type { Editor } from '@tiptap/core';
import type { CalcKindDescriptor, CalcResult } from '@/lib/calc';
import { editorDocumentIndex } from '@/lib/documents/model/document-index-plugin';
import { orderCalcBlocks } from '@/lib/documents/order-calc-blocks';
import { resolveBlockInputs } from '@/lib/documents/resolve-block-inputs';
import { calcRequestKey, stableStringify } from '@/lib/documents/calc-request-key';
import type { CalcBlockAttrs } from '@/lib/documents/calc-nodes';
import { postJson } from '@/lib/client/fetch-json';
import type { CalcStore } from './calc-store';

/** Debounce for input changes before the server recomputes (common practice for typing, no source). */
const RECOMPUTE_DEBOUNCE_MS = 350;

class CalcRequestError extends Error {
  constructor(
    message: string,
    readonly fields: Record<string, string>,
  ) {
    super(message);
  }
}

/** A heavy kind refused for now (the person's job limit, 429, or a busy server, 503) is asked again after the server's Retry-After, a few times. */
const CALC_ATTEMPTS = 3;

async function fetchCalc(key: string): Promise<CalcResult> {
  const rest = key.slice('calc:'.length);
  const colon = rest.indexOf(':');
  const kind = rest.slice(0, colon);
  const inputs = JSON.parse(rest.slice(colon + 1)) as Record<string, unknown>;
  for (let attempt = 1; ; attempt++) {
    const res = await postJson<CalcResult>('/api/calc', { kind, inputs });
    if (res.ok) return res.data;
    const wait = res.body.retryAfterSeconds;
    if (typeof wait !== 'number' || attempt >= CALC_ATTEMPTS) throw new CalcRequestError(res.error, res.fields);
    await new Promise((resolve) => setTimeout(resolve, wait * 1000));
  }
}

function useDebounced<T>(value: T, ms: number): T {
  const [v, setV] = useState(value);
  useEffect(() => {
    const t = setTimeout(() => setV(value), ms);
    return () => clearTimeout(t);
  }, [value, ms]);
  return v;
}

/** The calc blocks of the editor's document, re-read from the editor's document index when the document changes. */
function useDocumentBlocks(editor: Editor | null): CalcBlockAttrs[] {
  const [blocks, setBlocks] = useState<CalcBlockAttrs[]>(() =>
    editor ? editorDocumentIndex(editor.state).calc.blocks : [],
  );
  useEffect(() => {
    if (!editor) return;
    let last = '';
    const read = () => {
      const next = editorDocumentIndex(editor.state).calc.blocks;
      const text = stableStringify(next);
      if (text !== last) {
        last = text;
        setBlocks(next);
      }
    };
    read();
    let timer: ReturnType<typeof setTimeout> | undefined;
    const onUpdate = () => {
      clearTimeout(timer);
      timer = setTimeout(read, 60);
    };
    editor.on('update', onUpdate);
    return () => {
      clearTimeout(timer);
      editor.off('update', onUpdate);
    };
  }, [editor]);
  return blocks;
}

/**
 * Keeps every calc block's result current: blocks are computed in dependency
 * order on the server (POST /api/calc through SWR, keyed by kind and the
 * resolved inputs), a block waits for the blocks it reads from, and a
 * reference cycle is refused with a message naming its blocks.
 */
export function CalcRunner({
  editor,
  store,
  kinds,
  canCompute,
}: {
  editor: Editor | null;
  store: CalcStore;
  kinds: ReadonlyMap<string, CalcKindDescriptor>;
  canCompute: boolean;
}) {
  const blocks = useDocumentBlocks(editor);
  const [, rerender] = useReducer((x: number) => x + 1, 0);
  useEffect(() => store.subscribeAll(rerender), [store]);
  useEffect(
    () => store.setPresent(blocks.map((b) => ({ blockId: b.blockId, label: b.label, kind: b.kind }))),
    [blocks, store],
  );

  const plan = useMemo(() => orderCalcBlocks(blocks), [blocks]);
  const byId = useMemo(() => new Map(blocks.map((b) => [b.blockId, b])), [blocks]);
  const results = new Map<string, CalcResult | undefined>(blocks.map((b) => [b.blockId, store.result(b.blockId)]));

  return (
    <>
      {plan.order.map((id) => (
        <BlockRunner
          key={id}
          block={byId.get(id)!}
          kind={kinds.get(byId.get(id)!.kind)}
          results={results}
          byId={byId}
          store={store}
          canCompute={canCompute}
        />
      ))}
      {[...plan.cyclic].map(([id, message]) => (
        <CycleReporter key={id} blockId={id} message={message} store={store} />
      ))}
    </>
  );
}

function CycleReporter({ blockId, message, store }: { blockId: string; message: string; store: CalcStore }) {
  useEffect(
    () => store.set(blockId, { status: 'error', error: message, fields: { _: message } }),
    [blockId, message, store],
  );
  return null;
}

function BlockRunner(props: {
  block: CalcBlockAttrs;
  kind: CalcKindDescriptor | undefined;
  results: ReadonlyMap<string, CalcResult | undefined>;
  byId: ReadonlyMap<string, CalcBlockAttrs>;
  store: CalcStore;
  canCompute: boolean;
}) {
  const { block, kind, results, byId, store, canCompute } = props;
  const resolved = kind ? resolveBlockInputs(block, kind, results, byId) : null;
  const requestKey = resolved?.ok ? calcRequestKey(block.kind, resolved.inputs) : null;
  const debouncedKey = useDebounced(requestKey, RECOMPUTE_DEBOUNCE_MS);
  const activeKey = requestKey !== null && debouncedKey === requestKey ? requestKey : null;
  // No keepPreviousData: with it, a key whose result is only in the page's fallback (the
  // server's initial results) returned the previous key's result as current and was never
  // fetched — a re-fed input kept the typed value's numbers. The block's result is the
  // result for exactly this key; while none is there the store keeps the last good one, greyed.
  const swr = useSWR<CalcResult, CalcRequestError>(canCompute ? activeKey : null, fetchCalc, {
    revalidateOnFocus: false,
    revalidateOnReconnect: false,
    shouldRetryOnError: false,
    dedupingInterval: 60_000,
    revalidateIfStale: false,
  });
  // Readers who may not compute still get the server's initial result for the exact key.
  const fallback = useSWR<CalcResult>(!canCompute ? requestKey : null, null, {
    revalidateOnMount: false,
    revalidateIfStale: false,
  });

  const waitingMessage = !kind ? `unknown calc kind "${block.kind}"` : resolved && !resolved.ok ? resolved.error : null;
  const waitingFields =
    resolved && !resolved.ok ? resolved.fields : kind ? {} : { kind: `unknown calc kind "${block.kind}"` };
  const data = canCompute ? swr.data : fallback.data;
  const isCurrent = canCompute
    ? activeKey !== null && !swr.isValidating && swr.data !== undefined && !swr.error
    : data !== undefined;
  const errorText = swr.error?.message;
  const errorFields = swr.error?.fields;
  const fieldsText = JSON.stringify(waitingFields);

  useEffect(() => {
    const lastGood = store.lastGood(block.blockId) ?? data;
    if (waitingMessage)
      store.set(block.blockId, {
        status: 'waiting',
        message: waitingMessage,
        fields: JSON.parse(fieldsText),
        lastGood,
      });
    else if (errorText && activeKey !== null && !swr.isValidating)
      store.set(block.blockId, { status: 'error', error: errorText, fields: errorFields ?? {}, lastGood });
    else if (isCurrent && data) store.set(block.blockId, { status: 'ok', result: data });
    else if (!canCompute && !data)
      store.set(block.blockId, { status: 'error', error: 'No result is available in this view.', fields: {} });
    else store.set(block.blockId, { status: 'pending', lastGood });
  }, [
    block.blockId,
    store,
    waitingMessage,
    fieldsText,
    errorText,
    errorFields,
    isCurrent,
    data,
    activeKey,
    swr.isValidating,
    canCompute,
  ]);

  return null;
}
