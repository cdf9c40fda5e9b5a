import { beforeAll, describe, expect, it } from 'vitest';
import { ApiError } from '@/lib/api/errors';
import type { Actor } from '@/lib/auth/permissions';
import { auditQuerySchema, listAuditEvents } from '@/lib/audit/list-audit-events';
import { recordAudit } from '@/lib/audit/record-audit';
import { db } from '@/models';
import { freshDatabase, makeMemo, makeUser } from '../../support/factories';

/*
 * The audit trail through its public functions: recordAudit appends (also
 * inside a caller's transaction, and not when that transaction rolls back);
 * listAuditEvents filters, pages newest first, and is for administrators only.
 */

let admin: Actor, analyst: Actor, memoId: number;
const list = (query: Record<string, unknown>) => listAuditEvents(admin, auditQuerySchema.parse(query));

beforeAll(async () => {
  await freshDatabase();
  admin = await makeUser('admin');
  analyst = await makeUser('analyst', 'Audit Analyst');
  memoId = (await makeMemo(analyst)).id;
});

describe('recordAudit', () => {
  it('appends one event with who, what, which memo and revision, and the details', async () => {
    await recordAudit({
      actor: analyst,
      action: 'pdf.download',
      memoId,
      revisionLetter: 'A',
      details: { pdfSha256: 'ab'.repeat(32) },
    });
    const [event] = await list({ action: 'pdf.download', memoId });
    expect(event).toMatchObject({
      actorEmail: analyst.email,
      action: 'pdf.download',
      memoId,
      revisionLetter: 'A',
      details: { pdfSha256: 'ab'.repeat(32) },
    });
    expect(Date.now() - Date.parse(event.at)).toBeLessThan(60_000);
  });

  it('records events without a person (a refused sign-in) with no actor', async () => {
    await recordAudit({ actor: null, action: 'sign-in-refused', details: { email: 'nobody@example.invalid' } });
    const [event] = await list({ action: 'sign-in-refused' });
    expect(event.actorEmail).toBeNull();
  });

  it('writes inside the caller’s transaction: a rolled-back change leaves no event', async () => {
    const sequelize = await db();
    await sequelize
      .transaction(async (transaction) => {
        await recordAudit(
          { actor: analyst, action: 'memo.co-authors', memoId, details: { marker: 'rolled back' } },
          transaction,
        );
        throw new Error('roll back');
      })
      .catch(() => undefined);
    const events = await list({ action: 'memo.co-authors', memoId });
    expect(events.some((e) => e.details?.marker === 'rolled back')).toBe(false);
  });
});

describe('listAuditEvents', () => {
  it('lists newest first and pages with before', async () => {
    for (const n of [1, 2, 3]) await recordAudit({ actor: analyst, action: 'memo.save', memoId, details: { n } });
    const page = await list({ action: 'memo.save', memoId, limit: 2 });
    expect(page.map((e) => e.details?.n)).toEqual([3, 2]);
    const older = await list({ action: 'memo.save', memoId, limit: 2, before: page[1].id });
    expect(older.map((e) => e.details?.n)).toEqual([1]);
  });

  it('filters by part of the actor’s e-mail, case-insensitively', async () => {
    const events = await list({ actor: analyst.email.split('@')[0].toUpperCase() });
    expect(events.length).toBeGreaterThan(0);
    expect(events.every((e) => e.actorEmail === analyst.email)).toBe(true);
  });

  it('refuses an unknown action or a non-numeric memo id by naming the field', () => {
    const r = auditQuerySchema.safeParse({ action: 'memo.delete', memoId: 'x' });
    expect(r.success).toBe(false);
    expect(r.error!.issues.map((i) => i.path.join('.')).sort()).toEqual(['action', 'memoId']);
  });

  it('is for administrators only (403 for every other role)', async () => {
    for (const role of ['analyst', 'reviewer', 'config-manager', 'customer'] as const) {
      const err = await listAuditEvents(await makeUser(role), auditQuerySchema.parse({})).then(
        () => undefined,
        (e: unknown) => e,
      );
      expect(err, role).toBeInstanceOf(ApiError);
      expect((err as ApiError).status).toBe(403);
    }
  });
});
