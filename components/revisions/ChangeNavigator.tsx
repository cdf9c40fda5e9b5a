'use client';

import { useCallback, useEffect, useState } from 'react';

/** Keys that move between changes (outside text fields): N next, P previous; also Alt+↓ / Alt+↑. */
const NEXT = (e: KeyboardEvent) =>
  (!e.ctrlKey && !e.metaKey && !e.altKey && e.key.toLowerCase() === 'n') || (e.altKey && e.key === 'ArrowDown');
const PREVIOUS = (e: KeyboardEvent) =>
  (!e.ctrlKey && !e.metaKey && !e.altKey && e.key.toLowerCase() === 'p') || (e.altKey && e.key === 'ArrowUp');
const typing = (t: EventTarget | null) =>
  t instanceof HTMLElement && (t.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(t.tagName));

/**
 * Steps through the comparison's changes (every element marked
 * `data-change`, in page order): Previous and Next buttons, and N / P or
 * Alt+↑ / Alt+↓ on the keyboard. The change reached is scrolled to the
 * middle of the window, outlined and focused, so a screen reader reads it.
 */
export function ChangeNavigator({ total }: { total: number }) {
  const [at, setAt] = useState(-1);
  const go = useCallback(
    (step: 1 | -1) => {
      const changes = [...document.querySelectorAll<HTMLElement>('[data-change]')];
      if (changes.length === 0) return;
      const next = at < 0 ? (step === 1 ? 0 : changes.length - 1) : (at + step + changes.length) % changes.length;
      changes.forEach((c) => c.removeAttribute('data-change-current'));
      const el = changes[next];
      el.setAttribute('data-change-current', '');
      if (!el.hasAttribute('tabindex')) el.setAttribute('tabindex', '-1');
      el.scrollIntoView({ block: 'center' });
      el.focus({ preventScroll: true });
      setAt(next);
    },
    [at],
  );
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (typing(e.target)) return;
      if (NEXT(e)) {
        e.preventDefault();
        go(1);
      } else if (PREVIOUS(e)) {
        e.preventDefault();
        go(-1);
      }
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [go]);
  if (total === 0) return null;
  return (
    <nav
      aria-label="Changes"
      className="sticky top-0 z-20 flex flex-wrap items-center gap-2 border-b border-rule bg-paper/95 py-2 text-note backdrop-blur"
    >
      <button type="button" className="btn-quiet py-1" onClick={() => go(-1)} aria-keyshortcuts="P Alt+ArrowUp">
        <span aria-hidden="true">↑</span> Previous change
      </button>
      <button type="button" className="btn-quiet py-1" onClick={() => go(1)} aria-keyshortcuts="N Alt+ArrowDown">
        <span aria-hidden="true">↓</span> Next change
      </button>
      <span role="status" aria-live="polite" className="text-ink-soft" data-change-position>
        {at < 0 ? `${total} change${total === 1 ? '' : 's'}` : `Change ${at + 1} of ${total}`}
      </span>
      <span className="hidden text-micro text-ink-faint sm:inline">Keys: N next, P previous</span>
    </nav>
  );
}
