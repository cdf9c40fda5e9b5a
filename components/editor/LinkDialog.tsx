'use client';

import { useEffect, useId, useRef, useState } from 'react';
import { isAllowedLinkHref, LINK_SCHEMES_ALLOWED } from '@/lib/documents/is-allowed-link-href';

/**
 * Asks for a link's address in the page, not in the browser's prompt: the address is checked
 * against the memo's link allow-list before it is set, and a refusal says why in the dialog.
 */
export function LinkDialog({
  initialHref,
  onSet,
  onRemove,
  onClose,
}: {
  initialHref: string;
  onSet: (href: string) => void;
  onRemove?: () => void;
  onClose: () => void;
}) {
  const id = useId();
  const [href, setHref] = useState(initialHref);
  const [problem, setProblem] = useState('');
  const inputRef = useRef<HTMLInputElement>(null);
  useEffect(() => inputRef.current?.select(), []);
  return (
    <form
      role="dialog"
      aria-label="Link"
      className="absolute left-0 top-full z-40 mt-1 w-96 max-w-[calc(100vw-2rem)] space-y-2 sheet p-3"
      onSubmit={(e) => {
        e.preventDefault();
        const target = href.trim();
        if (!isAllowedLinkHref(target))
          return setProblem(
            `“${target || ' '}” cannot be a link in a memo: use an address starting with ${LINK_SCHEMES_ALLOWED}.`,
          );
        onSet(target);
      }}
      onKeyDown={(e) => {
        if (e.key !== 'Escape') return;
        e.preventDefault();
        e.stopPropagation();
        onClose();
      }}
    >
      <label className="label" htmlFor={`${id}-href`}>
        Link address
      </label>
      <input
        ref={inputRef}
        id={`${id}-href`}
        className="field py-1 font-mono text-note"
        placeholder="https://… or mailto:… or #section"
        value={href}
        aria-invalid={Boolean(problem)}
        aria-describedby={problem ? `${id}-problem` : undefined}
        onChange={(e) => {
          setHref(e.target.value);
          setProblem('');
        }}
      />
      {problem && (
        <p id={`${id}-problem`} className="text-note text-ember-700">
          {problem}
        </p>
      )}
      <div className="flex justify-end gap-2">
        {onRemove && (
          <button type="button" className="btn-quiet mr-auto py-1" onClick={onRemove}>
            Remove link
          </button>
        )}
        <button type="button" className="btn-quiet py-1" onClick={onClose}>
          Cancel
        </button>
        <button type="submit" className="btn-primary py-1">
          Set link
        </button>
      </div>
    </form>
  );
}
