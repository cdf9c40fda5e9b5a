import { withActor, parseWith, searchParamsObject } from '@/lib/api/route-handler';
import { auditQuerySchema, listAuditEvents } from '@/lib/audit/list-audit-events';

export const dynamic = 'force-dynamic';

export const GET = withActor(async ({ req, actor }) => ({ events: await listAuditEvents(actor, parseWith(auditQuerySchema, searchParamsObject(req))) }));
