'use client';

import { useEffect, useRef } from 'react';
import type { CalcKindDescriptor } from '@/lib/calc';
import { formatValue } from '@/lib/format/format-output';
import { useCalcContext } from './calc/calc-context';

/** Lists every block and its quotable outputs by label, with the current value. */
export function ValuePicker({
  kinds,
  figures,
  onPick,
  onPickFigure,
  onClose,
  numericOnly = false,
  label = 'Values to quote',
  footer,
}: {
  kinds: ReadonlyMap<string, CalcKindDescriptor>;
  figures: { figureId: string; number: number; caption: string }[];
  onPick: (blockId: string, output: string) => void;
  onPickFigure: (figureId: string) => void;
  onClose: () => void;
  /** Offer only number and integer outputs (what a requirement can compare). */
  numericOnly?: boolean;
  label?: string;
  /** One more action under the list. */
  footer?: { text: string; run: () => void };
}) {
  const { store } = useCalcContext();
  const ref = useRef<HTMLDivElement>(null);
  useEffect(() => {
    ref.current?.querySelector<HTMLButtonElement>('button')?.focus();
    const onKey = (e: KeyboardEvent) => e.key === 'Escape' && onClose();
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [onClose]);
  const blocks = store.blocks();
  return (
    <div ref={ref} className="absolute right-0 top-full z-30 mt-1 max-h-96 w-96 overflow-auto sheet p-2" role="menu" aria-label={label}>
      {figures.length > 0 && (
        <div className="mb-2">
          <p className="px-1 text-micro font-semibold uppercase text-ink-soft">Figures</p>
          {figures.map((f) => (
            <button key={f.figureId} type="button" role="menuitem" className="flex w-full gap-2 rounded-chip px-2 py-1 text-left text-note hover:bg-paper-sunk" onClick={() => onPickFigure(f.figureId)}>
              <span className="font-medium text-orbit-700">Figure {f.number}</span>
              <span className="truncate text-ink-soft">{f.caption}</span>
            </button>
          ))}
        </div>
      )}
      {blocks.length === 0 && <p className="p-2 text-note text-ink-soft">Insert a calc block first; its outputs can then be quoted in the text.</p>}
      {blocks.map((b) => {
        const kind = kinds.get(b.kind);
        const result = store.lastGood(b.blockId);
        const outputs = (kind?.outputs ?? []).filter((o) => (numericOnly ? o.type === 'number' || o.type === 'integer' : o.type !== 'rows'));
        return (
          <div key={b.blockId} className="mb-2">
            <p className="px-1 text-micro font-semibold uppercase text-ink-soft">{b.label || kind?.title || b.kind}</p>
            {outputs.map((o) => (
              <button key={o.name} type="button" role="menuitem" className="flex w-full justify-between gap-2 rounded-chip px-2 py-1 text-left text-note hover:bg-paper-sunk" onClick={() => onPick(b.blockId, o.name)}>
                <span>{o.label}</span>
                <span className="font-mono text-sunline-700">{result ? formatValue(result.outputs[o.name], o.unit, o.precision) : '…'}</span>
              </button>
            ))}
          </div>
        );
      })}
      {footer && (
        <button type="button" role="menuitem" className="mt-1 w-full rounded-chip border-t border-rule px-2 py-1 text-left text-note font-medium text-orbit-700 hover:bg-paper-sunk" onClick={footer.run}>
          {footer.text}
        </button>
      )}
    </div>
  );
}
