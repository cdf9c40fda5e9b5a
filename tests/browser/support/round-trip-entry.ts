import { Editor, type JSONContent } from '@tiptap/core';
import { memoExtensions } from '@/lib/documents/model/memo-extensions';

/**
 * Bundled for Chromium by tests/browser/document-html-round-trip.test.ts:
 * the memo schema (no React views) writing a document to HTML with
 * getHTML() and reading it back with setContent(), as copy and paste do.
 */
function roundTrip(doc: JSONContent): { html: string; first: JSONContent; again: JSONContent } {
  const writer = new Editor({ extensions: memoExtensions(), content: doc });
  const html = writer.getHTML();
  const reader = new Editor({ extensions: memoExtensions() });
  reader.commands.setContent(html);
  const result = { html, first: writer.getJSON(), again: reader.getJSON() };
  writer.destroy();
  reader.destroy();
  return result;
}

(window as unknown as { roundTrip: typeof roundTrip }).roundTrip = roundTrip;
