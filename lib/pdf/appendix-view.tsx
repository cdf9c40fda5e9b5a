/**
 * Appendices generated from the engine: the full series tables cut in the body (when there are any), then every
 * constant with value, unit and source and every method used in the memo with its references.
 */
import { StyleSheet, Text, View } from '@react-pdf/renderer';
import { engineVersion, getCalcKind, listConstants } from '@/lib/calc';
import type { BlockEvaluation } from '@/lib/documents/evaluate-document';
import { displayUnit, superscriptExponent } from '@/lib/format/format-output';
import type { HeadingPageBook } from './heading-page-book';
import type { SeriesTable } from './number-tables';
import { bookmarkProps, PageMark } from './page-mark';
import { INK, INK_SOFT, ORBIT, PAPER, RULE } from './pdf-theme';
import { SeriesTableView } from './series-table-view';

const s = StyleSheet.create({
  title: {
    fontSize: 13,
    fontWeight: 600,
    color: INK,
    marginBottom: 8,
    paddingBottom: 4,
    borderBottomWidth: 0.8,
    borderBottomColor: ORBIT,
  },
  subtitle: { fontSize: 10.5, fontWeight: 600, marginTop: 10, marginBottom: 4 },
  row: { flexDirection: 'row', borderBottomWidth: 0.5, borderBottomColor: RULE, paddingVertical: 2 },
  head: { backgroundColor: PAPER, fontWeight: 600 },
  cell: { fontSize: 8, paddingHorizontal: 3 },
  method: { marginBottom: 7 },
  methodTitle: { fontSize: 9, fontWeight: 600 },
  small: { fontSize: 8, color: INK_SOFT },
});

/** Significant digits a constant is printed with: the twelve of the most precise published values the engine holds (EGM-96 zonals). */
export const CONSTANT_DIGITS = 12;

/**
 * A constant at its display precision: at most CONSTANT_DIGITS significant digits, trailing zeros dropped, so a
 * published value keeps its own digits ("398600.4418", "1.08262668355 × 10⁻³") and a derived one loses only its
 * binary floating-point tail (1/298.257223563 → "3.35281066475 × 10⁻³", not 3.3528106647474805 × 10⁻³).
 */
export function formatConstant(value: number): string {
  const rounded = Number(value.toPrecision(CONSTANT_DIGITS));
  const abs = Math.abs(rounded);
  if (abs !== 0 && (abs < 1e-2 || abs >= 1e7)) {
    const [mantissa, exponent] = rounded.toExponential().split('e');
    return `${mantissa}\u00a0×\u00a010${superscriptExponent(exponent)}`;
  }
  return String(rounded);
}

/** The methods used by the memo's evaluated blocks, one entry per calc kind in document order. */
export function methodsUsed(
  evaluations: ReadonlyMap<string, BlockEvaluation>,
): { kind: string; title: string; method: string; references: string[] }[] {
  const seen = new Map<string, { kind: string; title: string; method: string; references: string[] }>();
  for (const e of evaluations.values()) {
    if (e.status !== 'ok' || seen.has(e.result.kind)) continue;
    seen.set(e.result.kind, {
      kind: e.result.kind,
      title: getCalcKind(e.result.kind)?.title ?? 'Calculation',
      method: e.result.model.method,
      references: e.result.model.references,
    });
  }
  return [...seen.values()];
}

export const appendixAnchor = (letter: string): string => `app-${letter}`;

/** Title of an appendix, with its bookmark's parent View given by the caller. */
function AppendixTitle({ letter, title, book }: { letter: string; title: string; book: HeadingPageBook }) {
  return (
    <View wrap={false} minPresenceAhead={60}>
      <PageMark id={appendixAnchor(letter)} book={book} />
      <Text style={s.title}>{`Appendix ${letter}  ${title}`}</Text>
    </View>
  );
}

export const ANNEX_TITLE = 'Full series tables';
export const CONSTANTS_TITLE = 'Constants and models';

/** Every series the body cuts to its first rows, here with all its rows, so the chosen case can be found in it. */
export function AnnexView({ tables, letter, book }: { tables: SeriesTable[]; letter: string; book: HeadingPageBook }) {
  return (
    <View break {...bookmarkProps(`Appendix ${letter}  ${ANNEX_TITLE}`)}>
      <AppendixTitle letter={letter} title={ANNEX_TITLE} book={book} />
      <Text style={[s.small, { marginBottom: 6 }]}>
        Series that the body of the memo shows only in part, here with every row, at the same display precision.
      </Text>
      {tables.map((t) => (
        <SeriesTableView key={t.id} table={t} shown={t.rows.length} annex book={book} />
      ))}
    </View>
  );
}

export function AppendixView({
  evaluations,
  letter,
  book,
}: {
  evaluations: ReadonlyMap<string, BlockEvaluation>;
  letter: string;
  book: HeadingPageBook;
}) {
  const constants = listConstants();
  const methods = methodsUsed(evaluations);
  return (
    <View break {...bookmarkProps(`Appendix ${letter}  ${CONSTANTS_TITLE}`)}>
      <AppendixTitle letter={letter} title={CONSTANTS_TITLE} book={book} />
      <Text style={s.small}>{`Generated from the calc engine at render time: ${engineVersion}.`}</Text>
      <View {...bookmarkProps('Constants')}>
        <Text style={s.subtitle} minPresenceAhead={40}>
          Constants
        </Text>
        <View style={[s.row, s.head]} fixed minPresenceAhead={1} wrap={false}>
          <Text style={[s.cell, { flex: 2 }]}>Constant</Text>
          <Text style={[s.cell, { flex: 0.8 }]}>Symbol</Text>
          <Text style={[s.cell, { flex: 2.6 }]}>Value</Text>
          <Text style={[s.cell, { flex: 0.9 }]}>Unit</Text>
          <Text style={[s.cell, { flex: 3.2 }]}>Source</Text>
        </View>
        {constants.map((c) => (
          <View key={c.name} style={s.row} wrap={false}>
            <Text style={[s.cell, { flex: 2 }]}>{c.name}</Text>
            <Text style={[s.cell, { flex: 0.8 }]}>{c.symbol}</Text>
            <Text style={[s.cell, { flex: 2.6 }]}>{formatConstant(c.value)}</Text>
            <Text style={[s.cell, { flex: 0.9 }]}>{displayUnit(c.unit)}</Text>
            <Text style={[s.cell, { flex: 3.2, color: INK_SOFT }]}>{c.source}</Text>
          </View>
        ))}
      </View>
      <View {...bookmarkProps('Methods used in this memo')}>
        <Text style={s.subtitle} minPresenceAhead={40}>
          Methods used in this memo
        </Text>
        {methods.length === 0 ? <Text style={s.small}>No calc block in this memo has a result.</Text> : null}
        {methods.map((m) => (
          <View key={m.kind} style={s.method} wrap={false}>
            <Text style={s.methodTitle}>{m.title}</Text>
            <Text style={{ fontSize: 8.5 }}>{m.method}</Text>
            {m.references.map((r, i) => (
              <Text key={i} style={s.small}>{`[${i + 1}] ${r}`}</Text>
            ))}
          </View>
        ))}
      </View>
    </View>
  );
}
