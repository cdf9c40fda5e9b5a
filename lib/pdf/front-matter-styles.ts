import { StyleSheet } from '@react-pdf/renderer';
import { INK, INK_FAINT, INK_SOFT, ORBIT, PAPER, RULE, SUNLINE_50, SUNLINE_700 } from './pdf-theme';

export const frontStyles = StyleSheet.create({
  titleBlock: { marginTop: 70, marginBottom: 28, paddingLeft: 14, borderLeftWidth: 3, borderLeftColor: ORBIT },
  kicker: { fontSize: 9, color: ORBIT, fontWeight: 600, letterSpacing: 0.8, textTransform: 'uppercase', marginBottom: 10 },
  title: { fontSize: 22, fontWeight: 600, lineHeight: 1.2, color: INK, marginBottom: 22 },
  facts: { marginBottom: 14 },
  factRow: { flexDirection: 'row', paddingVertical: 2.5, borderBottomWidth: 0.5, borderBottomColor: RULE },
  factKey: { width: 90, color: INK_FAINT, fontSize: 9 },
  factValue: { flex: 1, fontSize: 9.5, fontWeight: 500 },
  distribution: { fontSize: 8.5, color: INK_SOFT, fontStyle: 'italic' },
  caution: { marginTop: 10, marginBottom: 14, padding: 9, backgroundColor: SUNLINE_50, borderLeftWidth: 2, borderLeftColor: SUNLINE_700, fontSize: 8.5, color: INK },
  cautionTitle: { fontWeight: 700, color: SUNLINE_700, marginBottom: 2, textTransform: 'uppercase', letterSpacing: 0.6, fontSize: 8 },
  section: { marginBottom: 18 },
  sectionTitle: { fontSize: 11, fontWeight: 600, color: INK, marginBottom: 6, paddingBottom: 3, borderBottomWidth: 0.8, borderBottomColor: ORBIT },
  gridRow: { flexDirection: 'row', borderBottomWidth: 0.5, borderBottomColor: RULE },
  gridHead: { backgroundColor: PAPER },
  gridCell: { paddingVertical: 3, paddingHorizontal: 4, fontSize: 8.5 },
  signRow: { minHeight: 26, alignItems: 'flex-end' },
  signedName: { fontWeight: 600 },
  signedNote: { marginTop: 5, fontSize: 7.5, color: INK_SOFT, lineHeight: 1.35 },
  line: { borderBottomWidth: 0.5, borderBottomColor: INK_FAINT, marginHorizontal: 4, paddingHorizontal: 0 },
});
