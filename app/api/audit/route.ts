import { withActor, parseWith, searchParamsObject } from '@/lib/api/route-handler';
import { auditQuerySchema, listAuditEvents } from '@/lib/audit/list-audit-events';
import { auditCsvResponse } from '@/lib/audit/audit-csv-response';

export const dynamic = 'force-dynamic';

/** GET ?action=&person=&document=&from=&to=&memoId=&before=&limit=&format=json|csv */
export const GET = withActor(async ({ req, actor }) => {
  const query = parseWith(auditQuerySchema, searchParamsObject(req));
  const events = await listAuditEvents(actor, query);
  return query.format === 'csv' ? auditCsvResponse(events) : { events };
});
