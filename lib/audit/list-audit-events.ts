import { Op, type WhereOptions } from 'sequelize';
import { z } from 'zod';
import { AuditEvent, db } from '@/models';
import { assertGlobal, type Actor } from '@/lib/auth/permissions';
import { AUDIT_ACTIONS } from './record-audit';

export const auditQuerySchema = z.strictObject({
  action: z.enum(AUDIT_ACTIONS, { error: 'unknown action' }).optional(),
  actor: z.string().trim().max(320).optional(),
  memoId: z.coerce.number({ error: 'memoId must be a number' }).int().positive().optional(),
  before: z.coerce.number().int().positive().optional(),
  limit: z.coerce.number().int().min(1).max(500).default(100),
});
export type AuditQuery = z.infer<typeof auditQuerySchema>;

export interface AuditRow {
  id: number;
  at: string;
  actorEmail: string | null;
  action: string;
  memoId: number | null;
  revisionLetter: string | null;
  details: Record<string, unknown> | null;
}

/** Newest first, filtered; administrators only. `before` pages by id. */
export async function listAuditEvents(actor: Actor, query: AuditQuery): Promise<AuditRow[]> {
  assertGlobal(actor, 'audit.view');
  await db();
  const where: WhereOptions = {};
  if (query.action) Object.assign(where, { action: query.action });
  if (query.actor) Object.assign(where, { actorEmail: { [Op.like]: `%${query.actor.toLowerCase()}%` } });
  if (query.memoId) Object.assign(where, { memoId: query.memoId });
  if (query.before) Object.assign(where, { id: { [Op.lt]: query.before } });
  const rows = await AuditEvent.findAll({ where, order: [['id', 'DESC']], limit: query.limit });
  return rows.map((r) => ({ id: r.id, at: new Date(r.at).toISOString(), actorEmail: r.actorEmail, action: r.action, memoId: r.memoId, revisionLetter: r.revisionLetter, details: r.details }));
}
