import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '@/models';
import type { Actor } from '@/lib/auth/permissions';
import { auditQuerySchema, listAuditEvents } from '@/lib/audit/list-audit-events';
import { freshDatabase, makeMemo, makeUser } from '../../support/factories';

/*
 * What is checked: the audit trail's filters work on what an administrator
 * knows — a person's name (not their id), a document number, an action and
 * a range of UTC days — and each row carries the name, the number and a
 * sentence. Events are written with fixed times so the day bounds are exact.
 */

let admin: Actor, wren: Actor, oscar: Actor;
let memoA: number, memoB: number;

beforeAll(async () => {
  await freshDatabase();
  admin = await makeUser('admin', 'Pell Hargreave');
  wren = await makeUser('analyst', 'Wren Talbot');
  oscar = await makeUser('reviewer', 'Oscar Venn');
  memoA = (await makeMemo(wren, { title: 'Alpha' })).id;
  memoB = (await makeMemo(wren, { title: 'Beta' })).id;
  const at = (iso: string) => new Date(iso);
  await AuditEvent.bulkCreate([
    {
      at: at('2025-11-30T23:59:59Z'),
      actorId: wren.id,
      actorEmail: wren.email,
      action: 'memo.save',
      memoId: memoA,
      revisionLetter: null,
      details: { version: 2 },
    },
    {
      at: at('2025-12-01T00:00:00Z'),
      actorId: oscar.id,
      actorEmail: oscar.email,
      action: 'comment.create',
      memoId: memoA,
      revisionLetter: null,
      details: { quote: 'orbit', excerpt: 'Why?' },
    },
    {
      at: at('2025-12-01T23:59:59Z'),
      actorId: oscar.id,
      actorEmail: oscar.email,
      action: 'memo.approve',
      memoId: memoB,
      revisionLetter: null,
      details: { version: 3, round: 1 },
    },
    {
      at: at('2025-12-02T00:00:00Z'),
      actorId: wren.id,
      actorEmail: wren.email,
      action: 'pdf.download',
      memoId: memoB,
      revisionLetter: null,
      details: { draft: true, version: 3 },
    },
  ]);
});

const list = (q: Record<string, string>) => listAuditEvents(admin, auditQuerySchema.parse(q));

describe('listAuditEvents', () => {
  it('filters by a part of a person’s name, any case', async () => {
    const rows = await list({ person: 'venn' });
    expect(rows.map((r) => r.action)).toEqual(['memo.approve', 'comment.create']);
    expect(rows.every((r) => r.actorName === 'Oscar Venn')).toBe(true);
  });

  it('filters by document number and gives each row the number and a sentence', async () => {
    const { documentNumber } = (await list({ person: 'wren', action: 'pdf.download' }))[0];
    expect(documentNumber).toMatch(/^DM-\d{4}-\d{3}$/);
    const rows = await list({ document: documentNumber!.toLowerCase() });
    expect(rows.map((r) => r.action)).toEqual(['pdf.download', 'memo.approve', 'memo.create']);
    expect(rows.every((r) => r.memoId === memoB)).toBe(true);
    expect(rows.find((r) => r.action === 'pdf.download')!.summary).toBe(
      `Wren Talbot downloaded the draft PDF of ${documentNumber} version 3.`,
    );
  });

  it('filters by UTC days, both ends inclusive (rows come newest recorded first)', async () => {
    expect((await list({ from: '2025-12-01', to: '2025-12-01' })).map((r) => r.action)).toEqual([
      'memo.approve',
      'comment.create',
    ]);
    expect((await list({ from: '2025-12-02', to: '2025-12-02' })).map((r) => r.action)).toEqual(['pdf.download']);
    expect((await list({ to: '2025-11-30' })).map((r) => r.action)).toEqual(['memo.save']);
    // The memos' own creation events are today's: only an open-ended range reaches them.
    expect((await list({ from: '2025-12-02' })).map((r) => r.action)).toEqual([
      'pdf.download',
      'memo.create',
      'memo.create',
    ]);
  });

  it('refuses a range that ends before it starts, and a date that is not one', () => {
    expect(auditQuerySchema.safeParse({ from: '2026-12-02', to: '2026-12-01' }).error?.issues[0]).toMatchObject({
      path: ['to'],
      message: 'the last day comes before the first',
    });
    expect(auditQuerySchema.safeParse({ from: '2026-02-30' }).error?.issues[0].message).toBe('not a calendar date');
    expect(auditQuerySchema.safeParse({ format: 'xlsx' }).error?.issues[0].message).toBe('format must be json or csv');
  });

  it('is for administrators only', async () => {
    await expect(listAuditEvents(wren, auditQuerySchema.parse({}))).rejects.toMatchObject({ code: 'forbidden' });
  });
});
