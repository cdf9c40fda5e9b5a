'use client';

import type { CalcKindDescriptor } from '@/lib/calc';
import { formatValue } from '@/lib/format/format-output';
import { useCalcContext } from './calc/calc-context';
import { PickList, type PickItem } from './PickList';

/** Lists the memo's figures, then every block's quotable outputs by label with the current value; keyboard first (see PickList). */
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
  const figureItems: PickItem[] = figures.map((f) => ({
    key: `figure:${f.figureId}`,
    title: `Figure ${f.number}`,
    detail: f.caption || undefined,
    keywords: f.caption,
    group: 'Figures',
    pick: () => onPickFigure(f.figureId),
  }));
  const valueItems: PickItem[] = store.blocks().flatMap((b) => {
    const kind = kinds.get(b.kind);
    const result = store.lastGood(b.blockId);
    return (kind?.outputs ?? [])
      .filter((o) => (numericOnly ? o.type === 'number' || o.type === 'integer' : o.type !== 'rows'))
      .map((o) => {
        const value = result ? formatValue(result.outputs[o.name], o.unit, o.precision) : '…';
        return {
          key: `${b.blockId}:${o.name}`,
          title: o.label,
          detail: <span className="font-mono text-sunline-700">{value}</span>,
          keywords: `${value} ${b.kind}`,
          group: b.label || kind?.title || b.kind,
          pick: () => onPick(b.blockId, o.name),
        };
      });
  });
  const footerItems: PickItem[] = footer
    ? [{ key: 'footer', title: footer.text, group: 'More', pick: footer.run }]
    : [];
  return (
    <PickList
      label={label}
      className="w-96"
      items={[...figureItems, ...valueItems, ...footerItems]}
      empty="Insert a calc block first; its outputs can then be quoted in the text."
      onClose={onClose}
    />
  );
}
