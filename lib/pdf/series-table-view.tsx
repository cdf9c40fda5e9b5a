/** A calc block's series (rows output) as a numbered table: caption above, header row repeated on every page it spans. */
import { Text, View } from '@react-pdf/renderer';
import type { CalcOutputField } from '@/lib/calc';
import { displayUnit, formatValue } from '@/lib/format/format-output';
import { calcStyles as s } from './calc-block-styles';
import { seriesCaption, type SeriesTable } from './number-tables';
import type { HeadingPageBook } from './heading-page-book';
import { bookmarkProps, TableCaption } from './page-mark';

/** Rows of one block of the annex layout: blocks stay whole, so two fit a page of either paper size. */
const ANNEX_BLOCK_ROWS = 28;

/** Side-by-side columns of a long table in the annex: narrow tables are set in three or two columns, read down then across. */
const annexAcross = (columns: number): number => (columns <= 3 ? 3 : columns <= 5 ? 2 : 1);

/** Date columns (strings) get more width than number columns. */
const cellWidth = (c: CalcOutputField) => ({ flex: c.type === 'string' ? 1.6 : 1 });

function HeaderRow({ columns, repeat, compact }: { columns: CalcOutputField[]; repeat?: boolean; compact?: boolean }) {
  return (
    <View style={s.rowsHeader} fixed={repeat} minPresenceAhead={1} wrap={false}>
      {columns.map((c) => (
        <Text key={c.name} style={[s.rowsCell, cellWidth(c), compact ? s.rowsCellCompact : {}]}>
          {c.unit ? `${c.label} (${displayUnit(c.unit)})` : c.label}
        </Text>
      ))}
    </View>
  );
}

const ISO_UTC = /^(\d{4}-\d{2}-\d{2})T(\d{2}:\d{2})(:\d{2})?(\.\d+)?Z$/;

/** A series cell; UTC instants as "2027-09-15 06:30" (seconds only when not zero), so a date fits one line of a narrow column. */
export function seriesCell(value: unknown, precision: number): string {
  const m = typeof value === 'string' ? ISO_UTC.exec(value) : null;
  if (m) return `${m[1]} ${m[2]}${m[3] && m[3] !== ':00' ? m[3] : ''}`;
  return formatValue(value, null, precision);
}

function DataRow({ columns, row }: { columns: CalcOutputField[]; row: Record<string, unknown> }) {
  return (
    <View style={s.rowsRow} wrap={false}>
      {columns.map((c) => (
        <Text key={c.name} style={[s.rowsCell, cellWidth(c)]}>
          {seriesCell(row[c.name], c.precision)}
        </Text>
      ))}
    </View>
  );
}

/**
 * The annex's full table: blocks of ANNEX_BLOCK_ROWS rows per column, set side by side and kept whole (each block
 * reads down, then across), so a 361-row ground track takes a few pages instead of a dozen. Each column of a block is
 * one Text of ANNEX_BLOCK_ROWS lines: thousands of cells as separate Text nodes made the layout several times slower.
 * Cells never wrap (dates are shortened, widths fit the longest value), so the lines of a block stay aligned.
 */
function AnnexBlocks({ columns, rows }: { columns: CalcOutputField[]; rows: Record<string, unknown>[] }) {
  const across = annexAcross(columns.length);
  const perBlock = ANNEX_BLOCK_ROWS * across;
  const blocks = Array.from({ length: Math.ceil(rows.length / perBlock) }, (_, b) =>
    rows.slice(b * perBlock, (b + 1) * perBlock),
  );
  return (
    <>
      {blocks.map((block, b) => (
        <View key={b} style={s.annexBlock} wrap={false}>
          {Array.from({ length: across }, (_, k) => block.slice(k * ANNEX_BLOCK_ROWS, (k + 1) * ANNEX_BLOCK_ROWS)).map(
            (part, k) => (
              <View key={k} style={[s.annexPart, k < across - 1 ? { marginRight: 8 } : {}]}>
                {part.length ? <HeaderRow columns={columns} compact /> : null}
                <View style={s.annexLines}>
                  {columns.map((c) => (
                    <Text key={c.name} style={[s.rowsCell, cellWidth(c), s.rowsCellCompact]}>
                      {part.map((row) => seriesCell(row[c.name], c.precision)).join('\n')}
                    </Text>
                  ))}
                </View>
              </View>
            ),
          )}
        </View>
      ))}
    </>
  );
}

/** `annex`: the full table in the appendix (every row); otherwise the body's table, cut to `shown` rows. */
export function SeriesTableView({
  table,
  shown,
  annex,
  book,
}: {
  table: SeriesTable;
  shown: number;
  annex?: boolean;
  book: HeadingPageBook;
}) {
  const columns = table.field.columns ?? [];
  const rows = annex ? table.rows : table.rows.slice(0, shown);
  const count = `${table.rows.length} ${table.rows.length === 1 ? 'row' : 'rows'}`;
  const extent = annex
    ? `all ${count}; cut in Table ${table.number}`
    : rows.length < table.rows.length
      ? `first ${rows.length} of ${count}; all rows in Table ${table.annex}`
      : count;
  const label = annex ? `Table ${table.annex}. ` : `Table ${table.number}. `;
  return (
    <View
      style={s.rowsBlock}
      id={annex ? `tab-${table.annex}` : table.id}
      {...(annex ? bookmarkProps(`Table ${table.annex}  ${seriesCaption(table)}`) : {})}
    >
      <TableCaption id={annex ? `tab-${table.annex}` : table.id} book={book} label={label}>
        {`${seriesCaption(table)} (${extent})${annex ? '' : '.'}`}
      </TableCaption>
      {annex ? (
        <AnnexBlocks columns={columns} rows={rows} />
      ) : (
        <>
          <HeaderRow columns={columns} repeat />
          {rows.map((row, i) => (
            <DataRow key={i} columns={columns} row={row} />
          ))}
        </>
      )}
    </View>
  );
}
