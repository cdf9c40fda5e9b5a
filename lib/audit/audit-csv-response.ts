import { auditEventsCsv } from './audit-events-csv';
import type { AuditRow } from './list-audit-events';

/** The audit rows as a CSV download named after the time of export (`nodewright-audit-20261202T1241Z.csv`). */
export function auditCsvResponse(rows: AuditRow[], now = new Date()): Response {
  const stamp = now.toISOString().slice(0, 16).replace(/[-:]/g, '');
  return new Response(auditEventsCsv(rows), {
    headers: {
      'content-type': 'text/csv; charset=utf-8; header=present',
      'content-disposition': `attachment; filename="nodewright-audit-${stamp}Z.csv"`,
      'cache-control': 'no-store',
    },
  });
}
