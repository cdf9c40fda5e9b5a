import { describe, expect, it } from 'vitest';
import { auditEventsCsv, csvField } from '@/lib/audit/audit-events-csv';
import type { AuditRow } from '@/lib/audit/list-audit-events';

/*
 * Checked against RFC 4180 §2 (fields with commas, quotes or line breaks are
 * enclosed in double quotes; a quote inside is doubled; records end in CRLF)
 * and against the formula characters of CWE-1236 / OWASP "CSV Injection"
 * (= + - @, tab, carriage return at the start of a cell): such a cell must
 * start with an apostrophe in the file.
 */

/** A minimal RFC 4180 reader, independent of the writer: quoted fields only (the writer quotes every field). */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let i = 0;
  while (i < text.length) {
    expect(text[i]).toBe('"');
    let field = '';
    i += 1;
    for (;;) {
      if (text[i] === '"' && text[i + 1] === '"') {
        field += '"';
        i += 2;
        continue;
      }
      if (text[i] === '"') {
        i += 1;
        break;
      }
      field += text[i];
      i += 1;
    }
    row.push(field);
    if (text[i] === ',') {
      i += 1;
      continue;
    }
    expect(text.slice(i, i + 2)).toBe('\r\n');
    i += 2;
    rows.push(row);
    row = [];
  }
  return rows;
}

const row = (over: Partial<AuditRow>): AuditRow => ({
  id: 7,
  at: '2026-12-02T12:41:05.000Z',
  actorEmail: 'tobias.quenby@brightwater.example',
  actorName: 'Tobias Quenby',
  action: 'memo.approve',
  memoId: 3,
  documentNumber: 'BWO-TL1-DM-001',
  revisionLetter: null,
  details: { note: 'Sound.' },
  summary: 'Tobias Quenby approved BWO-TL1-DM-001.',
  ...over,
});

describe('csvField', () => {
  it.each([
    ['=HYPERLINK("http://x.example","y")', `"'=HYPERLINK(""http://x.example"",""y"")"`],
    ['+1+2', `"'+1+2"`],
    ['-2+3', `"'-2+3"`],
    ['@SUM(A1)', `"'@SUM(A1)"`],
    ['\t=1', `"'\t=1"`],
    ['\r=1', `"'\r=1"`],
  ])('neutralises the formula cell %j', (input, expected) => {
    expect(csvField(input)).toBe(expected);
  });

  it('quotes commas, quotes and line breaks, and leaves other text as it is', () => {
    expect(csvField('a, b')).toBe('"a, b"');
    expect(csvField('say "sound"')).toBe('"say ""sound"""');
    expect(csvField('two\nlines')).toBe('"two\nlines"');
    expect(csvField('ΔV = 28 m/s')).toBe('"ΔV = 28 m/s"');
    expect(csvField(null)).toBe('""');
    expect(csvField(42)).toBe('"42"');
  });
});

describe('auditEventsCsv', () => {
  it('writes a header and one record per event that an independent RFC 4180 reader reads back', () => {
    const csv = auditEventsCsv([
      row({}),
      row({
        id: 6,
        actorName: '=cmd|" /C calc"!A0',
        summary: 'A note, with "quotes"\nand a line break',
        details: null,
        documentNumber: null,
        memoId: null,
      }),
    ]);
    expect(csv.startsWith('\uFEFF')).toBe(true);
    const rows = parseCsv(csv.slice(1));
    expect(rows).toHaveLength(3);
    expect(rows[0]).toEqual([
      'Event',
      'Time (UTC)',
      'Person',
      'E-mail',
      'Action',
      'Document',
      'Revision',
      'What happened',
      'Details (JSON)',
    ]);
    expect(rows[1]).toEqual([
      '7',
      '2026-12-02T12:41:05.000Z',
      'Tobias Quenby',
      'tobias.quenby@brightwater.example',
      'memo.approve',
      'BWO-TL1-DM-001',
      '',
      'Tobias Quenby approved BWO-TL1-DM-001.',
      '{"note":"Sound."}',
    ]);
    expect(rows[2][2]).toBe(`'=cmd|" /C calc"!A0`);
    expect(rows[2][7]).toBe('A note, with "quotes"\nand a line break');
    expect(rows[2][8]).toBe('');
  });
});
