/** Requirements in the PDF: each in the text with its verdict and margin, and the compliance table of all of them. */
import { Text, View } from '@react-pdf/renderer';
import type { RequirementCheck } from '@/lib/requirements/check-requirements';
import { EMBER, EMBER_50, INK_SOFT, ORBIT, ORBIT_50, styles } from './pdf-theme';

/** ✓ met, ✗ not met, ? undecided — with the word, so that the verdict never rests on a symbol or a colour alone. */
export function verdictText(check: RequirementCheck): string {
  return check.verdict.status === 'pass' ? '✓ met' : check.verdict.status === 'fail' ? '✗ not met' : '? undecided';
}

const verdictColour = (check: RequirementCheck) => (check.verdict.status === 'pass' ? ORBIT : EMBER);

/** One requirement in the text: id, statement, the output's value against the condition, verdict and margin. */
export function RequirementView({ check }: { check: RequirementCheck }) {
  const { requirement: r, verdict } = check;
  return (
    <View
      wrap={false}
      style={{
        borderLeftWidth: 2,
        borderLeftColor: verdictColour(check),
        backgroundColor: verdict.status === 'pass' ? ORBIT_50 : EMBER_50,
        paddingHorizontal: 8,
        paddingVertical: 5,
        marginBottom: 8,
      }}
    >
      <Text>
        <Text style={{ fontWeight: 600 }}>{`${r.requirementId}  `}</Text>
        {r.text || ' '}
      </Text>
      <Text style={{ fontSize: 8.5, color: INK_SOFT, marginTop: 2 }}>
        {`${check.source}: `}
        <Text style={{ fontWeight: 500 }}>{check.valueText}</Text>
        {`  required ${check.conditionText}  `}
        <Text style={{ fontWeight: 600, color: verdictColour(check) }}>{verdictText(check)}</Text>
        {verdict.status === 'undecided' ? `: ${verdict.reason}` : `, margin ${check.marginText}`}
      </Text>
    </View>
  );
}

const COLUMNS: { title: string; flex: number; text: (c: RequirementCheck) => string }[] = [
  { title: 'Requirement', flex: 1.3, text: (c) => c.requirement.requirementId },
  { title: 'Statement', flex: 3, text: (c) => c.requirement.text },
  { title: 'Value', flex: 1.3, text: (c) => c.valueText },
  { title: 'Required', flex: 1.5, text: (c) => c.conditionText },
  { title: 'Margin', flex: 1.2, text: (c) => c.marginText || '—' },
  { title: 'Verdict', flex: 1.4, text: verdictText },
  { title: 'From', flex: 2.2, text: (c) => c.source },
];

/** Up to this many requirements the compliance table is kept on one page. */
const SHORT_TABLE_ROWS = 12;

/** The compliance table: every requirement of the memo in document order. */
export function ComplianceTableView({ checks }: { checks: readonly RequirementCheck[] }) {
  if (checks.length === 0)
    return (
      <Text style={[styles.paragraph, { color: INK_SOFT }]}>
        Requirements compliance: the memo states no requirements.
      </Text>
    );
  const failing = checks.filter((c) => c.verdict.status !== 'pass').length;
  return (
    // A table of a few rows moves to the next page whole (and its heading with it, by the heading's presence rule)
    // rather than leaving its header row alone at the foot of a page; a longer one breaks between rows.
    <View style={{ marginBottom: 8 }} wrap={checks.length > SHORT_TABLE_ROWS}>
      <View style={[styles.table, { marginBottom: 2 }]}>
        {/* fixed: the header row repeats on every page the table runs onto */}
        <View style={styles.tableRow} wrap={false} fixed>
          {COLUMNS.map((col) => (
            <View key={col.title} style={[styles.tableCell, styles.tableHeaderCell, { flex: col.flex }]}>
              <Text style={{ fontSize: 8 }}>{col.title}</Text>
            </View>
          ))}
        </View>
        {checks.map((c) => (
          <View
            key={c.requirement.requirementId}
            style={[styles.tableRow, c.verdict.status === 'pass' ? {} : { backgroundColor: EMBER_50 }]}
            wrap={false}
          >
            {COLUMNS.map((col) => (
              <View key={col.title} style={[styles.tableCell, { flex: col.flex }]}>
                <Text
                  style={[{ fontSize: 8 }, col.title === 'Verdict' ? { fontWeight: 600, color: verdictColour(c) } : {}]}
                >
                  {col.text(c)}
                </Text>
              </View>
            ))}
          </View>
        ))}
      </View>
      <Text style={styles.caption}>
        <Text style={styles.captionLabel}>Requirements compliance. </Text>
        {`${checks.length} requirement${checks.length === 1 ? '' : 's'}, ${failing === 0 ? 'all met' : `${failing} not met or undecided`}. Values are this document's calc results at display precision; margin is the distance inside the limit (negative: outside).`}
      </Text>
    </View>
  );
}
