import { describe, expect, it } from 'vitest';
import { getSchema } from '@tiptap/core';
import { Node as ProseMirrorNode } from '@tiptap/pm/model';
import { memoExtensions } from '@/lib/documents/model/memo-extensions';
import { demoMemoContent } from '@/lib/demo/demo-memo';
import { docText, docRangeToTextRange, shownText, textRangeToDocRange, INLINE_OBJECT } from '@/lib/comments/doc-text';
import { locateAnchor } from '@/lib/comments/locate-anchor';
import { buildAnchor } from '@/lib/comments/build-anchor';

/** The plain text of real memo documents (the shared schema) and its mapping to ProseMirror positions. */

const schema = getSchema(memoExtensions());
const docOf = (json: unknown) => ProseMirrorNode.fromJSON(schema, json);

const small = docOf({
  type: 'doc',
  content: [
    { type: 'heading', attrs: { level: 1 }, content: [{ type: 'text', text: 'Drag' }] },
    {
      type: 'paragraph',
      content: [
        { type: 'text', text: 'It decays by ' },
        { type: 'liveValue', attrs: { blockId: 'drag', output: 'decayKmPerDay' } },
        { type: 'text', text: ' a day.' },
      ],
    },
    {
      type: 'paragraph',
      content: [{ type: 'text', text: 'Line one' }, { type: 'hardBreak' }, { type: 'text', text: 'line two' }],
    },
  ],
});

describe('docText', () => {
  it('joins blocks with a line feed, stands U+FFFC for a live value and keeps hard breaks', () => {
    expect(docText(small).text).toBe(`Drag\nIt decays by ${INLINE_OBJECT} a day.\nLine one\nline two`);
  });

  it('maps every character to the document position where ProseMirror holds it', () => {
    const dt = docText(small);
    for (let i = 0; i < dt.text.length; i++) {
      const pos = dt.positions[i];
      if (pos < 0) continue;
      const ch = dt.text[i];
      const node = small.nodeAt(pos);
      if (ch === INLINE_OBJECT) expect(node?.type.name).toBe('liveValue');
      else if (ch === '\n') expect(node?.type.name).toBe('hardBreak');
      else expect(small.textBetween(pos, pos + 1), `char ${i}`).toBe(ch);
    }
  });

  it('round-trips a range between text offsets and document positions', () => {
    const dt = docText(small);
    const from = dt.text.indexOf('decays');
    const to = dt.text.indexOf('a day') + 'a day'.length;
    const range = textRangeToDocRange(dt, { from, to })!;
    expect(small.textBetween(range.from, range.to, '', INLINE_OBJECT)).toBe(`decays by ${INLINE_OBJECT} a day`);
    expect(docRangeToTextRange(dt, range.from, range.to)).toEqual({ from, to });
    // A range that is only a block separator covers nothing.
    const sep = dt.text.indexOf('\n');
    expect(textRangeToDocRange(dt, { from: sep, to: sep + 1 })).toBeNull();
  });

  it('a selection across two blocks maps to text with the separator inside', () => {
    const dt = docText(small);
    const start = small.resolve(1).start() + 2; // "ag" of "Drag"
    const end = dt.positions[dt.text.indexOf('It') + 2];
    const r = docRangeToTextRange(dt, start, end);
    expect(dt.text.slice(r.from, r.to)).toBe('ag\nIt');
  });

  it('anchors a thread in the demo memo and finds it again after a paragraph is inserted above it', () => {
    const json = demoMemoContent();
    const doc = docOf(json);
    const dt = docText(doc);
    const quote = 'the design adopts the 12-day cycle of 175 revolutions';
    const at = dt.text.indexOf(quote);
    expect(at).toBeGreaterThan(0);
    const built = buildAnchor(dt.text, { from: at, to: at + quote.length });
    if (!built.ok) throw new Error(built.reason);
    const range = textRangeToDocRange(dt, built.range)!;
    expect(doc.textBetween(range.from, range.to)).toBe(quote);

    const edited = docOf({
      ...json,
      content: [
        { type: 'paragraph', content: [{ type: 'text', text: 'Issue 2: the launch window moved.' }] },
        ...json.content,
      ],
    });
    const dt2 = docText(edited);
    const found = locateAnchor(dt2.text, built.anchor)!;
    const range2 = textRangeToDocRange(dt2, found)!;
    expect(edited.textBetween(range2.from, range2.to)).toBe(quote);
    // The new paragraph is 33 characters long, plus its node boundaries (2).
    expect(range2.from - range.from).toBe(33 + 2);
  });

  it('writes a live value out as the text it shows, for the quote a thread displays', () => {
    const dt = docText(small);
    const from = dt.text.indexOf('decays');
    const to = dt.text.indexOf('a day') + 'a day'.length;
    const shown = shownText(dt, { from, to }, (pos) =>
      small.nodeAt(pos)?.type.name === 'liveValue' ? '0.012 km' : null,
    );
    expect(shown).toBe('decays by 0.012 km a day');
    // Unknown (a value still computing): the placeholder stays.
    expect(shownText(dt, { from, to }, () => null)).toBe(`decays by ${INLINE_OBJECT} a day`);
  });

  it('finds a passage over three paragraphs again after edits inside and around it', () => {
    const para = (text: string) => ({ type: 'paragraph', content: [{ type: 'text', text }] });
    const before = docOf({
      type: 'doc',
      content: [
        para('Orbit choice.'),
        para('The repeat cycle is 12 days.'),
        { type: 'calcBlock', attrs: { blockId: 'repeat', kind: 'repeat-orbit', label: 'Repeat', inputs: {} } },
        para('It gives 175 revolutions per cycle.'),
        para('The swath closes the gaps at the equator.'),
        para('Launch in spring.'),
      ],
    });
    const dt = docText(before);
    const quote = 'cycle is 12 days.\nIt gives 175 revolutions per cycle.\nThe swath closes';
    const at = dt.text.indexOf(quote);
    expect(at).toBeGreaterThan(0);
    const built = buildAnchor(dt.text, { from: at, to: at + quote.length });
    if (!built.ok) throw new Error(built.reason);

    // A paragraph added above, a word changed in the middle paragraph, the calc block gone, the last paragraph split.
    const after = docOf({
      type: 'doc',
      content: [
        para('Issue 2.'),
        para('Orbit choice.'),
        para('The repeat cycle is 12 days.'),
        para('It gives 175 orbits per cycle.'),
        para('The swath closes'),
        para('the gaps at the equator.'),
        para('Launch in spring.'),
      ],
    });
    const dt2 = docText(after);
    const found = locateAnchor(dt2.text, built.anchor);
    expect(found).not.toBeNull();
    const range = textRangeToDocRange(dt2, found!)!;
    expect(after.textBetween(range.from, range.to, '\n')).toBe(
      'cycle is 12 days.\nIt gives 175 orbits per cycle.\nThe swath closes',
    );
  });
});
