import type { AuditRow } from './list-audit-events';

/**
 * Characters that make a spreadsheet read a cell as a formula when they come
 * first: = + - @, and tab and carriage return (CWE-1236, "Improper
 * Neutralization of Formula Elements in a CSV File"; OWASP, "CSV Injection").
 * Such a cell gets a leading apostrophe, which spreadsheets take as "text".
 */
const FORMULA_START = /^[=+\-@\t\r]/;

/** One CSV field: formula-guarded, then always quoted with inner quotes doubled (RFC 4180 §2, rules 5–7). */
export function csvField(value: string | number | null | undefined): string {
  const text = value === null || value === undefined ? '' : String(value);
  const guarded = FORMULA_START.test(text) ? `'${text}` : text;
  return `"${guarded.replace(/"/g, '""')}"`;
}

const HEADER = [
  'Event',
  'Time (UTC)',
  'Person',
  'E-mail',
  'Action',
  'Document',
  'Revision',
  'What happened',
  'Details (JSON)',
];

/** The audit rows as CSV: a header line, CRLF line ends (RFC 4180 §2, rule 1), UTF-8 with a byte-order mark so spreadsheets read the names right. */
export function auditEventsCsv(rows: AuditRow[]): string {
  const lines = [
    HEADER,
    ...rows.map((r) => [
      r.id,
      r.at,
      r.actorName,
      r.actorEmail,
      r.action,
      r.documentNumber,
      r.revisionLetter,
      r.summary,
      r.details ? JSON.stringify(r.details) : '',
    ]),
  ];
  return `\uFEFF${lines.map((cells) => cells.map(csvField).join(',')).join('\r\n')}\r\n`;
}
