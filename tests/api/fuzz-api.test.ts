/**
 * Fuzzing over HTTP against the real server with fast-check 4.10.2 (issue 11):
 * thousands of generated request bodies — structured-but-wrong documents
 * (known and unknown node and mark types, junk and near-miss attributes,
 * nesting up to 1 600 levels, hostile links, strings of up to 3 MiB) and wrong
 * JSON types in every field — sent to memo saves, comments, thread actions,
 * transitions, the distribution list and /api/calc (the engine's own junk-input
 * properties are in tests/lib/calc/properties.test.ts). Asserted: no response
 * is a 5xx, and a refused save leaves the memo exactly as it was (version and
 * content). Counts are fixed, traffic is loopback only.
 */
import fc from 'fast-check';
import { beforeAll, describe, expect, inject, it } from 'vitest';
import { HttpSession } from '../../scripts/support/http-session';
import { demoReviewerId } from '../support/delivery-flow';
import { MEMO_MARK_TYPES, MEMO_NODE_TYPES } from '@/lib/documents/model/memo-extensions';
import { listCalcKinds } from '@/lib/calc';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';
import type { Role } from '@/lib/auth/roles';
import { MEMO_TEMPLATES } from '@/lib/templates';

const RUNS = { content: 1500, comments: 400, threadActions: 250, transitions: 400, distribution: 300, calc: 400 };

const demoEmail = (role: Role) => DEMO_USERS.find((u) => u.role === role)!.email;
async function as(role: Role): Promise<HttpSession> {
  const s = new HttpSession(inject('baseUrl'));
  expect(await s.signIn(demoEmail(role), DEMO_PASSWORD), `sign in as ${role}`).toBe(true);
  return s;
}

type MemoBody = { id: number; version: number; content: unknown; title: string };

/** Any JSON value, including deep and wide ones. */
const junk: fc.Arbitrary<unknown> = fc.oneof(
  fc.jsonValue({ maxDepth: 4 }),
  fc.constantFrom(
    null,
    true,
    false,
    0,
    -1,
    1e308,
    '',
    ' ',
    '<script>alert(1)</script>',
    '__proto__',
    'constructor',
    [],
    {},
  ),
  fc.integer({ min: 1, max: 2000 }).map((n) => {
    let v: unknown = 'x';
    for (let i = 0; i < n; i++) v = [v];
    return v;
  }),
);

const HREFS = [
  'javascript:alert(1)',
  'JaVaScRiPt:alert(1)',
  ' javascript:alert(1)',
  'java\nscript:alert(1)',
  'data:text/html,<b>x</b>',
  'vbscript:x',
  'file:///etc/passwd',
  '//evil.example',
  '/memos/1',
  '#',
  '#figures',
  'https://www.esa.int/',
  'http://',
  'mailto:',
  'mailto:ilse.marrow@brightwater.example',
];
const CALC_KINDS = listCalcKinds().map((k) => k.kind);
const nearMissAttrs: fc.Arbitrary<unknown> = fc.oneof(
  fc.record(
    {
      blockId: fc.oneof(fc.constantFrom('b1', 'b1', '', 'b 1', 'x'.repeat(41)), junk),
      kind: fc.oneof(fc.constantFrom(...CALC_KINDS, 'warp-drive'), junk),
      label: fc.oneof(fc.string(), junk),
      inputs: fc.oneof(
        fc.dictionary(
          fc.string({ maxLength: 10 }),
          fc.oneof(
            fc.record({ text: fc.oneof(fc.string(), junk) }),
            fc.record({ ref: fc.record({ blockId: fc.string(), output: fc.string() }) }),
            junk,
          ),
          { maxKeys: 4 },
        ),
        junk,
      ),
    },
    { requiredKeys: [] },
  ),
  fc.record(
    { blockId: fc.oneof(fc.string({ maxLength: 8 }), junk), output: fc.oneof(fc.string({ maxLength: 8 }), junk) },
    { requiredKeys: [] },
  ),
  fc.record(
    {
      figureId: fc.oneof(fc.constantFrom('f1', ''), junk),
      figureKind: fc.oneof(fc.constantFrom('sso-inclination-altitude', 'pie'), junk),
      blockId: fc.oneof(fc.constantFrom('b1', ''), junk),
      caption: fc.oneof(fc.string(), junk),
    },
    { requiredKeys: [] },
  ),
  fc.record(
    {
      src: fc.oneof(
        fc.constantFrom('/api/attachments/1', 'data:image/png;base64,AAAA', 'https://tracker.example/p.png', ''),
        junk,
      ),
      alt: fc.oneof(fc.string(), junk),
      width: junk,
    },
    { requiredKeys: [] },
  ),
  fc.record({ level: fc.oneof(fc.integer({ min: -2, max: 9 }), junk) }),
  fc.record(
    { colspan: junk, rowspan: junk, colwidth: junk, align: fc.oneof(fc.constantFrom('left', 'middle'), junk) },
    { requiredKeys: [] },
  ),
  fc.dictionary(fc.string({ maxLength: 8 }), junk, { maxKeys: 4 }),
  junk,
);
const markArb = fc.record(
  {
    type: fc.oneof(
      { weight: 6, arbitrary: fc.constantFrom(...MEMO_MARK_TYPES) },
      { weight: 1, arbitrary: fc.oneof(fc.string({ maxLength: 10 }), junk) },
    ),
    attrs: fc.oneof(
      fc.record(
        {
          href: fc.oneof({ weight: 4, arbitrary: fc.constantFrom(...HREFS) }, fc.webUrl(), junk),
          target: fc.oneof(fc.constantFrom('_blank', '_self'), junk),
        },
        { requiredKeys: [] },
      ),
      junk,
    ),
    extra: junk,
  },
  { requiredKeys: ['type'] },
);
const nodeTypeArb = fc.oneof(
  { weight: 8, arbitrary: fc.constantFrom(...MEMO_NODE_TYPES) },
  { weight: 1, arbitrary: fc.oneof(fc.string({ maxLength: 12 }), junk) },
);

/** Nodes built from known and unknown types, near-miss attributes, marks, text of every type, and any content. */
const { node: nodeArb } = fc.letrec<{ node: unknown }>((tie) => ({
  node: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    fc.record(
      {
        type: fc.constant('text'),
        text: fc.oneof({ weight: 5, arbitrary: fc.string({ minLength: 1, maxLength: 40 }) }, junk),
        marks: fc.array(markArb, { maxLength: 3 }),
      },
      { requiredKeys: ['type', 'text'] },
    ),
    fc.record(
      {
        type: nodeTypeArb,
        attrs: nearMissAttrs,
        content: fc.oneof({ weight: 5, arbitrary: fc.array(tie('node'), { maxLength: 4 }) }, junk),
        marks: fc.array(markArb, { maxLength: 2 }),
        text: junk,
        style: junk,
      },
      { requiredKeys: ['type'] },
    ),
  ),
}));

/** A document whose paragraph sits `depth` nodes deep (a list level is two nodes: list and item). */
function nested(type: string, depth: number): unknown {
  let n: unknown = { type: 'paragraph', content: [{ type: 'text', text: 'deep' }] };
  if (type === 'bulletList')
    for (let i = 0; i < depth / 2; i++) n = { type, content: [{ type: 'listItem', content: [n] }] };
  else for (let i = 0; i < depth; i++) n = { type, content: [n] };
  return { type: 'doc', content: [n] };
}

/** A template document with one node changed: its type, attributes, marks or content replaced by something generated. */
const TEMPLATE_DOCS = MEMO_TEMPLATES.map((t) => t.build());
const mutatedTemplate = fc
  .record({
    doc: fc.constantFrom(...TEMPLATE_DOCS),
    at: fc.nat(),
    field: fc.constantFrom('type', 'attrs', 'marks', 'content', 'text'),
    value: fc.oneof(nodeArb, junk, nodeTypeArb, fc.array(markArb, { maxLength: 2 }), nearMissAttrs),
  })
  .map(({ doc, at, field, value }) => {
    const copy = structuredClone(doc) as unknown as Record<string, unknown>;
    const all: Record<string, unknown>[] = [];
    const visit = (n: Record<string, unknown>) => {
      all.push(n);
      for (const c of (Array.isArray(n.content) ? n.content : []) as Record<string, unknown>[]) visit(c);
    };
    visit(copy);
    all[1 + (at % (all.length - 1))][field] = value;
    return copy;
  });

const documentArb: fc.Arbitrary<unknown> = fc.oneof(
  {
    weight: 4,
    arbitrary: fc.record({ type: fc.constant('doc'), content: fc.array(nodeArb, { minLength: 1, maxLength: 5 }) }),
  },
  { weight: 4, arbitrary: mutatedTemplate },
  { weight: 1, arbitrary: fc.record({ type: fc.oneof(fc.constant('doc'), junk), content: junk }) },
  {
    weight: 1,
    arbitrary: fc
      .tuple(fc.constantFrom('blockquote', 'bulletList'), fc.integer({ min: 40, max: 1600 }))
      .map(([t, d]) => nested(t, d)),
  },
  {
    weight: 1,
    arbitrary: fc.integer({ min: 1, max: 3 * 1024 * 1024 }).map((n) => ({
      type: 'doc',
      content: [{ type: 'paragraph', content: [{ type: 'text', text: 'x'.repeat(n) }] }],
    })),
  },
  { weight: 1, arbitrary: fc.constantFrom(...TEMPLATE_DOCS) },
  { weight: 1, arbitrary: junk },
);

/** A save body: mostly well-formed around the document, sometimes wrong in any field. */
const saveBodyArb = (baseVersion: () => number) =>
  fc
    .record({
      content: documentArb,
      baseVersion: fc.oneof({ weight: 8, arbitrary: fc.constant('current') }, fc.oneof(fc.integer(), junk)),
      title: fc.option(fc.oneof(fc.string({ maxLength: 400 }), junk), { nil: undefined }),
      extra: fc.option(junk, { nil: undefined }),
    })
    .map(({ content, baseVersion: b, title, extra }) => ({
      content,
      baseVersion: b === 'current' ? baseVersion() : b,
      ...(title === undefined ? {} : { title }),
      ...(extra === undefined ? {} : { extra }),
    }));

/**
 * fc.assert, reporting the counterexample through JSON.stringify, cut short: fast-check's own printer
 * recurses and overflows the stack on the 2 000-level values generated here.
 */
async function holds<Ts extends unknown[]>(property: fc.IAsyncProperty<Ts>, numRuns: number): Promise<void> {
  const out = await fc.check(property, { numRuns });
  if (!out.failed) return;
  let example: string;
  try {
    example = JSON.stringify(out.counterexample).slice(0, 2000);
  } catch {
    example = '(too deep to print)';
  }
  throw new Error(
    `property failed after ${out.numRuns} runs (seed ${out.seed}, path "${out.counterexamplePath}"): ${String(out.errorInstance)}\ncounterexample: ${example}`,
  );
}

const expectNo5xx = (status: number, what: string) => expect(status, what).toBeLessThan(500);

let analyst: HttpSession;
let reviewer: HttpSession;
let cm: HttpSession;
let memo: MemoBody;
let reviewerId: number;

beforeAll(async () => {
  [analyst, reviewer, cm] = await Promise.all([as('analyst'), as('reviewer'), as('config-manager')]);
  const created = await analyst.json<{ id: number }>('/api/memos', {
    method: 'POST',
    body: JSON.stringify({ title: 'Fuzzing target', templateId: 'sso-design-rationale' }),
  });
  expect(created.status).toBe(201);
  memo = (await analyst.json<MemoBody>(`/api/memos/${created.body.id}`)).body;
  reviewerId = await demoReviewerId(analyst);
});

describe('fuzzing over HTTP: no 5xx, refused saves change nothing', () => {
  it(`PATCH /api/memos/:id with ${RUNS.content} generated bodies`, async () => {
    const seen = { saved: 0, refused: 0 };
    await holds(
      fc.asyncProperty(
        saveBodyArb(() => memo.version),
        async (body) => {
          const res = await analyst.json<MemoBody & { error?: string }>(`/api/memos/${memo.id}`, {
            method: 'PATCH',
            body: JSON.stringify(body),
          });
          expectNo5xx(res.status, JSON.stringify(body).slice(0, 300));
          if (res.status === 200) {
            seen.saved++;
            memo = res.body;
            return;
          }
          seen.refused++;
          expect(res.body.error, 'a refusal says why').toBeTruthy();
          const now = await analyst.json<MemoBody>(`/api/memos/${memo.id}`);
          expect(now.body.version).toBe(memo.version);
          expect(now.body.title).toBe(memo.title);
          expect(now.body.content).toEqual(memo.content);
        },
      ),
      RUNS.content,
    );
    // Both paths were taken: some generated documents are valid (templates), most are refused.
    expect(seen.saved).toBeGreaterThan(0);
    expect(seen.refused).toBeGreaterThan(RUNS.content / 2);
    // The memo still renders after everything it was sent.
    expect((await analyst.request(`/api/memos/${memo.id}/pdf`)).status).toBe(200);
  });

  it(`POST /api/memos/:id/comments (${RUNS.comments}) and PATCH /api/comments/:id (${RUNS.threadActions})`, async () => {
    const anchor = fc.record(
      {
        quote: fc.oneof(fc.constantFrom('sun-synchronous', 'TERNLIGHT-1', ''), fc.string({ maxLength: 2100 }), junk),
        prefix: fc.oneof(fc.string({ maxLength: 220 }), junk),
        suffix: fc.oneof(fc.string({ maxLength: 220 }), junk),
        extra: junk,
      },
      { requiredKeys: [] },
    );
    const body = fc.oneof(
      fc.record(
        { body: fc.oneof(fc.string({ maxLength: 4100 }), junk), anchor: fc.oneof(anchor, junk), extra: junk },
        { requiredKeys: [] },
      ),
      junk,
    );
    const threadIds: number[] = [];
    await holds(
      fc.asyncProperty(body, fc.boolean(), async (b, asReviewer) => {
        const res = await (asReviewer ? reviewer : analyst).json<{ id?: number }>(`/api/memos/${memo.id}/comments`, {
          method: 'POST',
          body: JSON.stringify(b),
        });
        expectNo5xx(res.status, JSON.stringify(b).slice(0, 300));
        if (res.status === 201 && typeof res.body.id === 'number') threadIds.push(res.body.id);
      }),
      RUNS.comments,
    );
    const action = fc.oneof(
      fc.record(
        {
          action: fc.oneof(fc.constantFrom('reply', 'resolve', 'reopen', 'delete'), junk),
          body: fc.oneof(fc.string({ maxLength: 4100 }), junk),
          extra: junk,
        },
        { requiredKeys: [] },
      ),
      junk,
    );
    const threadId = fc.oneof(
      fc.constantFrom(...(threadIds.length ? threadIds : [1])),
      fc.constantFrom('0', '-1', 'abc', '1e3', '99999999999999', '%00'),
    );
    await holds(
      fc.asyncProperty(threadId, action, async (id, a) => {
        const res = await analyst.json(`/api/comments/${id}`, { method: 'PATCH', body: JSON.stringify(a) });
        expectNo5xx(res.status, JSON.stringify(a).slice(0, 300));
      }),
      RUNS.threadActions,
    );
  });

  it(`POST /api/memos/:id/transitions (${RUNS.transitions}) by every staff role`, async () => {
    const created = await analyst.json<{ id: number }>('/api/memos', {
      method: 'POST',
      body: JSON.stringify({ title: 'Fuzzing transitions' }),
    });
    const target = created.body.id;
    const body = fc.oneof(
      fc.record(
        {
          action: fc.oneof(
            fc.constantFrom('submit', 'approve', 'request-changes', 'freeze', 'reopen', 'publish'),
            junk,
          ),
          note: fc.oneof(fc.string({ maxLength: 4100 }), junk),
          reviewerIds: fc.oneof(
            fc.array(fc.oneof(fc.constant(reviewerId), fc.integer(), junk), { maxLength: 12 }),
            junk,
          ),
          changeSummary: fc.oneof(fc.string({ maxLength: 2100 }), junk),
        },
        { requiredKeys: [] },
      ),
      junk,
    );
    await holds(
      fc.asyncProperty(
        body,
        fc.constantFrom(analyst, reviewer, cm),
        fc.oneof({ weight: 9, arbitrary: fc.constant(String(target)) }, fc.constantFrom('0', 'x', '99999999')),
        async (b, who, id) => {
          const res = await who.json(`/api/memos/${id}/transitions`, { method: 'POST', body: JSON.stringify(b) });
          expectNo5xx(res.status, JSON.stringify(b).slice(0, 300));
        },
      ),
      RUNS.transitions,
    );
  });

  it(`POST and DELETE on the distribution list (${RUNS.distribution})`, async () => {
    const body = fc.oneof(
      fc.record(
        {
          userId: fc.oneof(fc.integer(), junk),
          email: fc.oneof(fc.emailAddress(), fc.string({ maxLength: 300 }), junk),
          name: fc.oneof(fc.string({ maxLength: 300 }), junk),
        },
        { requiredKeys: [] },
      ),
      junk,
    );
    await holds(
      fc.asyncProperty(
        body,
        fc.oneof(fc.integer({ min: -5, max: 50 }).map(String), fc.constantFrom('x', '1.5', '99999999999999')),
        async (b, userId) => {
          const add = await cm.json(`/api/memos/${memo.id}/distribution`, { method: 'POST', body: JSON.stringify(b) });
          expectNo5xx(add.status, JSON.stringify(b).slice(0, 300));
          const remove = await cm.json(`/api/memos/${memo.id}/distribution/${userId}`, { method: 'DELETE' });
          expectNo5xx(remove.status, `DELETE distribution/${userId}`);
        },
      ),
      RUNS.distribution,
    );
  });

  it(`POST /api/calc (${RUNS.calc})`, async () => {
    const body = fc.oneof(
      fc.record(
        {
          kind: fc.oneof(fc.constantFrom(...CALC_KINDS), fc.string({ maxLength: 20 }), junk),
          inputs: fc.oneof(fc.dictionary(fc.string({ maxLength: 16 }), junk, { maxKeys: 6 }), junk),
          extra: junk,
        },
        { requiredKeys: [] },
      ),
      junk,
    );
    await holds(
      fc.asyncProperty(body, async (b) => {
        const res = await analyst.json(`/api/calc`, { method: 'POST', body: JSON.stringify(b) });
        expectNo5xx(res.status, JSON.stringify(b).slice(0, 300));
      }),
      RUNS.calc,
    );
  });
});
