import { renderToReactElement } from '@tiptap/static-renderer/pm/react';
import type { TiptapDoc } from '@/lib/memos/memo-schema';
import { memoExtensions } from '@/components/editor/extensions';

/** Read-only rendering of a stored memo document, on the server, from the shared extension list. */
export function MemoReadView({ content }: { content: TiptapDoc }) {
  let rendered: React.ReactNode;
  try {
    rendered = renderToReactElement({ content, extensions: memoExtensions() });
  } catch (err) {
    return (
      <div role="alert" className="rounded-card border border-ember-500 bg-ember-50 p-4 text-note text-ember-700">
        This document could not be displayed: {err instanceof Error ? err.message : 'unknown content'}.
      </div>
    );
  }
  return <div className="memo-prose">{rendered}</div>;
}
