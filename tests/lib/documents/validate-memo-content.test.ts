/**
 * The save-time check of memo documents against the one document schema
 * (ProseMirror schema of lib/documents/model/memo-extensions.ts plus the attribute
 * schemas of lib/documents/model/attribute-schemas.ts). The hostile cases are
 * the ones reproduced against the running server in issue 11 (500 nested
 * blockquotes, 1 500 levels, unknown node and mark types, javascript: and data:
 * links); the accepted cases are every template as written and as the editor
 * serialises it (ProseMirror's toJSON fills in every default attribute).
 */
import { getSchema } from '@tiptap/core';
import { describe, expect, it } from 'vitest';
import { memoExtensions, MEMO_NODE_TYPES } from '@/lib/documents/model/memo-extensions';
import {
  MAX_CONTENT_BYTES,
  MAX_CONTENT_DEPTH,
  MAX_CONTENT_NODES,
  validateMemoContent,
} from '@/lib/documents/validate-memo-content';
import { NODE_ATTRIBUTE_SCHEMAS } from '@/lib/documents/model/attribute-schemas';
import { MEMO_TEMPLATES } from '@/lib/templates';

const rules = { attachmentUrls: new Set(['/api/attachments/7']), linkTargets: 'allow-list' } as const;
/** Stored content about to be rendered: links and image sources are left to the PDF. */
const renderRules = { attachmentUrls: 'any', linkTargets: 'any' } as const;
const para = (...content: unknown[]) => ({ type: 'paragraph', content });
const text = (t: string, marks?: unknown[]) => ({ type: 'text', text: t, ...(marks ? { marks } : {}) });
const doc = (...content: unknown[]) => ({ type: 'doc', content });

function problem(raw: unknown): string {
  const out = validateMemoContent(raw, rules);
  if (out.ok) throw new Error('expected a refusal');
  return out.problem.message;
}

/** `depth` blockquotes inside one another, with a paragraph at the bottom. */
function nestedQuotes(depth: number): unknown {
  let node: unknown = para(text('deep'));
  for (let i = 0; i < depth; i++) node = { type: 'blockquote', content: [node] };
  return doc(node);
}

describe('validateMemoContent: accepted documents', () => {
  const schema = getSchema(memoExtensions());
  for (const t of MEMO_TEMPLATES) {
    it(`template ${t.id} as built and as the editor serialises it`, () => {
      expect(validateMemoContent(t.build(), rules)).toMatchObject({ ok: true });
      const editorJson = schema.nodeFromJSON(t.build()).toJSON();
      expect(validateMemoContent(editorJson, rules)).toMatchObject({ ok: true });
    });
  }

  it('links, images of this memo, tables, lists and code as the editor stores them', () => {
    const rich = doc(
      para(
        text('see '),
        text('the ESA page', [
          {
            type: 'link',
            attrs: {
              href: 'https://www.esa.int/',
              target: '_blank',
              rel: 'noopener noreferrer nofollow',
              class: null,
              title: null,
            },
          },
        ]),
        text(' or '),
        text('mail', [{ type: 'link', attrs: { href: 'mailto:ilse.marrow@brightwater.example' } }]),
        text(' or '),
        text('§2', [{ type: 'link', attrs: { href: '#section-2' } }, { type: 'bold' }]),
      ),
      {
        type: 'image',
        attrs: {
          src: '/api/attachments/7',
          alt: 'plot',
          title: null,
          caption: 'Test card of the imager, as delivered',
          width: null,
          height: null,
        },
      },
      {
        type: 'table',
        content: [
          {
            type: 'tableRow',
            content: [
              {
                type: 'tableHeader',
                attrs: { colspan: 1, rowspan: 1, colwidth: null, align: 'left' },
                content: [para(text('a'))],
              },
            ],
          },
        ],
      },
      {
        type: 'orderedList',
        attrs: { start: 3, type: null },
        content: [{ type: 'listItem', content: [para(text('x'))] }],
      },
      { type: 'codeBlock', attrs: { language: null }, content: [text('a = 7078 km')] },
      { type: 'heading', attrs: { level: 2 }, content: [text('Drag')] },
    );
    expect(validateMemoContent(rich, rules)).toMatchObject({ ok: true });
    expect(validateMemoContent(schema.nodeFromJSON(rich).toJSON(), rules)).toMatchObject({ ok: true });
  });

  it('attributes the editor fills from pasted HTML, as it stores them (numbers, other text, NaN as null)', () => {
    const pasted = doc(
      {
        type: 'orderedList',
        attrs: { start: null, type: 'disc' },
        content: [{ type: 'listItem', content: [para(text('x'))] }],
      },
      { type: 'codeBlock', attrs: { language: 'shell session' }, content: [text('ls')] },
      {
        type: 'table',
        content: [
          {
            type: 'tableRow',
            content: [
              {
                type: 'tableCell',
                attrs: { colspan: 'two', rowspan: 2, colwidth: [120, null], align: null },
                content: [para(text('a'))],
              },
            ],
          },
        ],
      },
      { type: 'image', attrs: { src: '/api/attachments/7', alt: null, title: null, width: '100%', height: 240 } },
      para(
        text('old site', [
          {
            type: 'link',
            attrs: {
              href: 'http://example.org/a',
              target: '_self',
              rel: 'external',
              class: 'plain',
              title: 'An old page',
            },
          },
        ]),
      ),
    );
    expect(validateMemoContent(pasted, rules)).toMatchObject({ ok: true });
  });

  it(`depth ${MAX_CONTENT_DEPTH} is accepted, one more is refused`, () => {
    // nestedQuotes(n): paragraph at depth n + 1, its text at n + 2
    expect(validateMemoContent(nestedQuotes(MAX_CONTENT_DEPTH - 2), rules)).toMatchObject({ ok: true });
    expect(problem(nestedQuotes(MAX_CONTENT_DEPTH - 1))).toMatch(
      /nested more than 50 levels deep at content\[0\](\.content\[0\]){50}$/,
    );
  });

  it('every node type of MEMO_NODE_TYPES has an attribute schema (compile-time record, checked at run time too)', () => {
    expect(Object.keys(NODE_ATTRIBUTE_SCHEMAS).sort()).toEqual([...MEMO_NODE_TYPES].sort());
  });
});

describe('validateMemoContent: hostile and malformed documents are refused with what and where', () => {
  it('500 nested blockquotes (the 17 KB document that crashed the PDF renderer)', () => {
    expect(problem(nestedQuotes(500))).toMatch(/^content is nested more than 50 levels deep at content\[0\]/);
  });

  it('1 500 and 100 000 levels: refused without exhausting the stack', () => {
    expect(problem(nestedQuotes(1500))).toMatch(/nested more than 50 levels/);
    let deep: unknown = { type: 'text', text: 'x' };
    for (let i = 0; i < 100_000; i++) deep = { type: 'paragraph', content: [deep] };
    expect(problem(doc(deep))).toMatch(/nested more than 50 levels/);
    // deep JSON inside attributes rather than content
    let attr: unknown = 1;
    for (let i = 0; i < 100_000; i++) attr = { a: attr };
    expect(problem(doc({ type: 'calcBlock', attrs: { blockId: 'b1', kind: 'node-rate', inputs: attr } }))).toBe(
      'attrs nested too deeply at content[0]',
    );
  });

  it('unknown node and mark types name the type and the path', () => {
    expect(
      problem(
        doc(para(text('a')), para(text('b')), para(text('c')), { type: 'blockquote', content: [{ type: 'foo' }] }),
      ),
    ).toBe('unknown node type "foo" at content[3].content[0]');
    expect(problem(doc(para(text('a', [{ type: 'blink' }]))))).toBe(
      'unknown mark type "blink" at content[0].content[0].marks[0]',
    );
    expect(problem(doc(para(text('a', [{ type: 'bold' }, { type: 'bold' }]))))).toMatch(/mark "bold" appears twice/);
  });

  it('javascript:, data: and disguised schemes in links are refused, naming the link', () => {
    const link = (href: string) => doc(para(text('click', [{ type: 'link', attrs: { href } }])));
    expect(problem(link('javascript:alert(document.cookie)'))).toBe(
      'link to "javascript:alert(document.cookie)" at content[0].content[0].marks[0] is not allowed: only http, https, mailto and #anchor links are',
    );
    expect(problem(link('data:text/html,<script>alert(1)</script>'))).toMatch(/^link to "data:text\/html/);
    for (const href of [
      'JaVaScRiPt:alert(1)',
      ' javascript:alert(1)',
      'java\tscript:alert(1)',
      'vbscript:x',
      'file:///etc/passwd',
      '/memos/3',
      'http://',
      '#',
      'mailto:',
    ]) {
      expect(problem(link(href)), href).toMatch(/^link .* is not allowed/);
    }
  });

  it('stored content about to be rendered: other link schemes and foreign images pass (the PDF prints them as text / unavailable), depth and types do not', () => {
    const legacy = doc(para(text('x', [{ type: 'link', attrs: { href: 'javascript:alert(1)' } }])), {
      type: 'image',
      attrs: { src: 'https://tracker.example/p.png' },
    });
    expect(validateMemoContent(legacy, renderRules)).toMatchObject({ ok: true });
    expect(validateMemoContent(nestedQuotes(500), renderRules)).toMatchObject({ ok: false });
    expect(validateMemoContent(doc({ type: 'foo' }), renderRules)).toMatchObject({
      ok: false,
      problem: { message: 'unknown node type "foo" at content[0]' },
    });
  });

  it('content that breaks the schema: wrong nesting, text in the wrong place, empty text, unknown fields', () => {
    expect(problem(doc(text('bare')))).toMatch(/^"doc" may not contain \[text\] \(the document\)/);
    expect(problem(doc(para(para(text('x')))))).toMatch(/^"paragraph" may not contain \[paragraph\] at content\[0\]/);
    expect(problem(doc({ type: 'bulletList', content: [para(text('x'))] }))).toMatch(
      /"bulletList" may not contain \[paragraph\] at content\[0\]/,
    );
    expect(problem(doc(para(text(''))))).toBe('text node without text at content[0].content[0]');
    expect(problem(doc({ ...para(text('x')), style: 'color:red' }))).toBe(
      'unknown field "style" on a "paragraph" node at content[0]',
    );
    expect(problem(doc({ type: 'horizontalRule', content: [para(text('x'))] }))).toMatch(
      /"horizontalRule" may not contain/,
    );
    expect(problem(doc({ type: 'heading', attrs: { level: 7 }, content: [text('x')] }))).toMatch(
      /invalid attribute of "heading" at content\[0\]: level/,
    );
    expect(problem({ type: 'paragraph' })).toMatch(/must be a document/);
    expect(problem(doc(para(), 'x'))).toBe('expected a node (an object with a type) at content[1]');
    expect(problem({ type: 'doc', content: 'x' })).toMatch(/content must be a list/);
  });

  it('attributes of our own nodes: calc block, live value, figure, figure reference, image', () => {
    const calc = (attrs: unknown) => doc({ type: 'calcBlock', attrs });
    expect(problem(calc({ blockId: 'b 1', kind: 'node-rate' }))).toMatch(
      /invalid attribute of "calcBlock" at content\[0\]: blockId: block id must be/,
    );
    expect(problem(calc({ blockId: 'b1', kind: 'warp-drive' }))).toMatch(/kind: unknown calc kind "warp-drive"/);
    expect(problem(calc({ blockId: 'b1', kind: 'node-rate', inputs: { altitudeKm: { text: 7 } } }))).toMatch(
      /inputs\.altitudeKm/,
    );
    expect(problem(calc({ blockId: 'b1', kind: 'node-rate', script: 'x' }))).toMatch(
      /invalid attribute of "calcBlock".*script/,
    );
    expect(
      problem(
        doc(
          { type: 'calcBlock', attrs: { blockId: 'b1', kind: 'node-rate' } },
          { type: 'calcBlock', attrs: { blockId: 'b1', kind: 'node-rate' } },
        ),
      ),
    ).toBe('id "b1" at content[1] is already used at content[0]');
    expect(problem(doc(para({ type: 'liveValue', attrs: { blockId: 'b1', output: { x: 1 } } })))).toMatch(
      /"liveValue" at content\[0\]\.content\[0\]: output/,
    );
    expect(problem(doc({ type: 'figure', attrs: { figureId: 'f1', figureKind: 'pie-chart', blockId: 'b1' } }))).toMatch(
      /unknown figure kind "pie-chart"/,
    );
    expect(problem(doc(para({ type: 'figureRef', attrs: { figureId: '<script>' } })))).toMatch(/"figureRef"/);
    expect(problem(doc({ type: 'image', attrs: { src: '/api/attachments/8' } }))).toBe(
      'image source "/api/attachments/8" at content[0] is not an image uploaded to this memo',
    );
    expect(problem(doc({ type: 'image', attrs: { src: 'data:image/png;base64,AAAA' } }))).toMatch(
      /not an image uploaded to this memo/,
    );
  });

  it(`size limits: more than ${MAX_CONTENT_NODES} nodes, more than 2 MiB`, () => {
    const many = doc(...Array.from({ length: MAX_CONTENT_NODES / 2 }, () => para(text('x'))));
    expect(problem(many)).toBe(`the document has more than ${MAX_CONTENT_NODES} nodes`);
    const big = doc(para(text('x'.repeat(MAX_CONTENT_BYTES))));
    expect(problem(big)).toMatch(/^the document is 2\.0 MiB as JSON; at most 2 MiB$/);
  });

  it('wrong JSON types anywhere never throw', () => {
    for (const raw of [
      null,
      undefined,
      1,
      'doc',
      [],
      [doc()],
      { type: 'doc' },
      { type: 'doc', content: [null] },
      { type: 'doc', content: [{ type: 7 }] },
      doc(para({ type: 'text', text: 5 })),
      doc({ type: 'paragraph', marks: 'bold' }),
      doc({ type: 'paragraph', attrs: [] }),
      doc(para(text('x', [null]))),
    ]) {
      const out = validateMemoContent(raw, rules);
      expect(out.ok, JSON.stringify(raw)).toBe(false);
    }
  });
});
