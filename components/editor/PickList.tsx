'use client';

import { useEffect, useId, useMemo, useRef, useState, type KeyboardEvent, type ReactNode } from 'react';

export type PickItem = {
  key: string;
  /** What the item is called; matched by the filter. */
  title: string;
  /** A line of detail (a summary, a current value); matched by the filter too. */
  detail?: ReactNode;
  /** Extra words the filter matches (the detail as text, a block name). */
  keywords?: string;
  /** A heading the item is listed under (a block's name); matched by the filter. */
  group?: string;
  pick: () => void;
};

/** Every word typed appears somewhere in the item's title, text detail, keywords or group, in any order, any case. */
export function matchesFilter(
  item: Pick<PickItem, 'title' | 'detail' | 'keywords' | 'group'>,
  filter: string,
): boolean {
  const words = filter.toLowerCase().split(/\s+/).filter(Boolean);
  const detail = typeof item.detail === 'string' ? item.detail : '';
  const text = `${item.title} ${detail} ${item.keywords ?? ''} ${item.group ?? ''}`.toLowerCase();
  return words.every((w) => text.includes(w));
}

/**
 * A pop-up list to choose one thing from, built on the WAI-ARIA combobox pattern (ARIA Authoring
 * Practices Guide, "Combobox" with a listbox popup): focus stays in the filter field, the arrows
 * move the active option (announced through aria-activedescendant), Enter chooses it, Escape closes,
 * and typing narrows the list.
 */
export function PickList({
  label,
  items,
  empty,
  onClose,
  className = 'w-80',
}: {
  label: string;
  items: PickItem[];
  empty?: ReactNode;
  onClose: () => void;
  className?: string;
}) {
  const id = useId();
  const [filter, setFilter] = useState('');
  const [active, setActive] = useState(0);
  const inputRef = useRef<HTMLInputElement>(null);
  const shown = useMemo(() => items.filter((i) => matchesFilter(i, filter)), [items, filter]);
  const current = Math.min(active, shown.length - 1);
  const optionId = (i: number) => `${id}-option-${i}`;

  useEffect(() => inputRef.current?.focus(), []);
  useEffect(() => {
    if (current >= 0) document.getElementById(optionId(current))?.scrollIntoView({ block: 'nearest' });
  });

  const onKeyDown = (e: KeyboardEvent<HTMLInputElement>) => {
    const last = shown.length - 1;
    const move: Record<string, () => number> = {
      ArrowDown: () => (current >= last ? 0 : current + 1),
      ArrowUp: () => (current <= 0 ? last : current - 1),
      Home: () => 0,
      End: () => last,
    };
    if (move[e.key]) {
      e.preventDefault();
      setActive(Math.max(0, move[e.key]()));
    } else if (e.key === 'Enter') {
      e.preventDefault();
      if (current >= 0) shown[current].pick();
    } else if (e.key === 'Escape' || e.key === 'Tab') {
      if (e.key === 'Escape') e.preventDefault();
      e.stopPropagation();
      onClose();
    }
  };

  return (
    <div className={`absolute right-0 top-full z-30 mt-1 sheet p-1 ${className}`}>
      <input
        ref={inputRef}
        type="text"
        role="combobox"
        aria-label={`Filter ${label.toLowerCase()}`}
        aria-expanded="true"
        aria-controls={`${id}-list`}
        aria-autocomplete="list"
        aria-activedescendant={current >= 0 ? optionId(current) : undefined}
        className="field mb-1 py-1 text-note"
        placeholder="Type to filter, ↑↓ to move, Enter to choose"
        value={filter}
        onChange={(e) => {
          setFilter(e.target.value);
          setActive(0);
        }}
        onKeyDown={onKeyDown}
      />
      <ul id={`${id}-list`} role="listbox" aria-label={label} className="max-h-80 overflow-auto">
        {shown.map((item, i) => {
          const heading =
            item.group !== undefined && item.group !== (i > 0 ? shown[i - 1].group : undefined)
              ? item.group
              : undefined;
          return (
            <li key={item.key} role="none">
              {heading !== undefined && (
                <p aria-hidden="true" className="px-1 pt-1 text-micro font-semibold uppercase text-ink-soft">
                  {heading}
                </p>
              )}
              <div
                id={optionId(i)}
                role="option"
                aria-selected={i === current}
                aria-label={item.group ? `${item.title}, ${item.group}` : undefined}
                className={`cursor-pointer rounded-chip px-2 py-1.5 ${i === current ? 'bg-orbit-100' : 'hover:bg-paper-sunk'}`}
                onMouseDown={(e) => e.preventDefault()}
                onMouseMove={() => i !== current && setActive(i)}
                onClick={() => item.pick()}
              >
                <span className="block text-note font-medium">{item.title}</span>
                {item.detail !== undefined && <span className="block text-micro text-ink-soft">{item.detail}</span>}
              </div>
            </li>
          );
        })}
      </ul>
      {shown.length === 0 && (
        <p className="p-2 text-note text-ink-soft">{items.length === 0 ? empty : `Nothing matches “${filter}”.`}</p>
      )}
    </div>
  );
}
