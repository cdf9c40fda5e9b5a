import { Op, fn, col, where as sqlWhere, type WhereOptions } from 'sequelize';
import { z } from 'zod';
import { AuditEvent, db, Memo, User } from '@/models';
import { assertGlobal, type Actor } from '@/lib/auth/permissions';
import { AUDIT_ACTIONS } from './record-audit';
import { describeAuditEvent } from './describe-audit-event';

const day = z
  .string()
  .trim()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'use a date as YYYY-MM-DD')
  .refine(
    (v) => !Number.isNaN(Date.parse(`${v}T00:00:00Z`)) && new Date(`${v}T00:00:00Z`).toISOString().startsWith(v),
    'not a calendar date',
  );

/** GET /api/audit and the audit page: filters (all optional, combined with AND), paging by id, output format. */
export const auditQuerySchema = z
  .strictObject({
    action: z.enum(AUDIT_ACTIONS, { error: 'unknown action' }).optional(),
    /** Part of a person's name or e-mail address, any case. */
    person: z.string().trim().max(320).optional(),
    /** Earlier name of `person` (matched the same way). */
    actor: z.string().trim().max(320).optional(),
    /** Part of a document number, any case. */
    document: z.string().trim().max(100).optional(),
    memoId: z.coerce.number({ error: 'memoId must be a number' }).int().positive().optional(),
    /** First and last day (UTC, inclusive). */
    from: day.optional(),
    to: day.optional(),
    before: z.coerce.number().int().positive().optional(),
    limit: z.coerce.number().int().min(1).max(5000).default(100),
    format: z.enum(['json', 'csv'], { error: 'format must be json or csv' }).default('json'),
  })
  .refine((q) => !q.from || !q.to || q.from <= q.to, { message: 'the last day comes before the first', path: ['to'] });
export type AuditQuery = z.infer<typeof auditQuerySchema>;

export interface AuditRow {
  id: number;
  at: string;
  actorEmail: string | null;
  /** The person's name now (null for events without a signed-in person). */
  actorName: string | null;
  action: string;
  memoId: number | null;
  documentNumber: string | null;
  revisionLetter: string | null;
  details: Record<string, unknown> | null;
  /** The event as a sentence. */
  summary: string;
}

/** Column contains text, any case, on SQLite and PostgreSQL alike (`%` and `_` typed by the admin act as LIKE's wildcards). */
const containsAnyCase = (column: string, text: string) =>
  sqlWhere(fn('lower', col(column)), { [Op.like]: `%${text.toLowerCase()}%` });

/**
 * Newest first, filtered; administrators only. `before` pages by id. Person
 * and document are matched by name and number (the trail stores ids):
 * the matching people and memos are looked up first.
 */
export async function listAuditEvents(actor: Actor, query: AuditQuery): Promise<AuditRow[]> {
  assertGlobal(actor, 'audit.view');
  await db();
  const and: WhereOptions[] = [];
  if (query.action) and.push({ action: query.action });
  const person = query.person || query.actor;
  if (person) {
    const people = await User.findAll({
      where: { [Op.or]: [containsAnyCase('name', person), containsAnyCase('email', person)] },
      attributes: ['id'],
    });
    and.push({ [Op.or]: [{ actorId: people.map((p) => p.id) }, containsAnyCase('actor_email', person)] });
  }
  if (query.document) {
    const memos = await Memo.findAll({ where: containsAnyCase('document_number', query.document), attributes: ['id'] });
    and.push({ memoId: memos.map((m) => m.id) });
  }
  if (query.memoId) and.push({ memoId: query.memoId });
  if (query.from) and.push({ at: { [Op.gte]: new Date(`${query.from}T00:00:00Z`) } });
  if (query.to) and.push({ at: { [Op.lt]: new Date(new Date(`${query.to}T00:00:00Z`).getTime() + 86_400_000) } });
  if (query.before) and.push({ id: { [Op.lt]: query.before } });
  const rows = await AuditEvent.findAll({ where: { [Op.and]: and }, order: [['id', 'DESC']], limit: query.limit });

  const [users, memos] = await Promise.all([
    User.findAll({
      where: { id: [...new Set(rows.map((r) => r.actorId).filter((id): id is number => id !== null))] },
      attributes: ['id', 'name'],
    }),
    Memo.findAll({
      where: { id: [...new Set(rows.map((r) => r.memoId).filter((id): id is number => id !== null))] },
      attributes: ['id', 'documentNumber'],
    }),
  ]);
  const nameOf = new Map(users.map((u) => [u.id, u.name]));
  const numberOf = new Map(memos.map((m) => [m.id, m.documentNumber]));
  return rows.map((r) => {
    const view = {
      id: r.id,
      at: new Date(r.at).toISOString(),
      actorEmail: r.actorEmail,
      actorName: r.actorId !== null ? (nameOf.get(r.actorId) ?? null) : null,
      action: r.action,
      memoId: r.memoId,
      documentNumber: r.memoId !== null ? (numberOf.get(r.memoId) ?? null) : null,
      revisionLetter: r.revisionLetter,
      details: r.details,
    };
    return { ...view, summary: describeAuditEvent(view) };
  });
}
