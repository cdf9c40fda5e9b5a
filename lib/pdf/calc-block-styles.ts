import { StyleSheet } from '@react-pdf/renderer';
import { MONO_STACK } from './pdf-fonts';
import { EMBER, EMBER_50, INK, INK_FAINT, INK_SOFT, ORBIT, ORBIT_50, PAPER, RULE, SUNLINE_50, SUNLINE_700 } from './pdf-theme';

export const calcStyles = StyleSheet.create({
  box: { borderLeftWidth: 2, borderLeftColor: ORBIT, backgroundColor: '#fbfbf9', paddingHorizontal: 8, marginBottom: 10 },
  boxEnd: { height: 6 },
  boxError: { borderLeftColor: EMBER, backgroundColor: EMBER_50 },
  header: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'flex-end', borderBottomWidth: 0.6, borderBottomColor: RULE, paddingTop: 6, paddingBottom: 3, marginBottom: 4 },
  headerTitle: { fontSize: 10, fontWeight: 600, color: INK, flexShrink: 1 },
  headerMeta: { fontSize: 7.5, color: INK_FAINT, marginLeft: 8, textAlign: 'right' },
  columns: { flexDirection: 'row' },
  column: { flex: 1, marginRight: 10 },
  columnTitle: { fontSize: 7.5, fontWeight: 600, color: ORBIT, textTransform: 'uppercase', letterSpacing: 0.6, marginBottom: 2 },
  kvRow: { flexDirection: 'row', borderBottomWidth: 0.4, borderBottomColor: RULE, paddingVertical: 1.5 },
  kvLabel: { flex: 1, fontSize: 8.5, color: INK_SOFT, paddingRight: 4 },
  kvValue: { fontSize: 8.5, fontWeight: 500, color: INK, textAlign: 'right', maxWidth: '55%' },
  note: { fontSize: 7, color: INK_FAINT, fontStyle: 'italic' },
  rowsBlock: { marginTop: 6 },
  rowsHeader: { flexDirection: 'row', backgroundColor: ORBIT_50, paddingVertical: 1.5 },
  rowsRow: { flexDirection: 'row', borderBottomWidth: 0.4, borderBottomColor: RULE, paddingVertical: 1 },
  rowsCell: { flex: 1, fontSize: 7.5, paddingHorizontal: 2 },
  annexLines: { flexDirection: 'row', paddingTop: 1 },
  // Line height on the cell's own Text: an inherited unitless one is multiplied again when react-pdf lays a page out anew.
  rowsCellCompact: { fontSize: 7, lineHeight: 1.3 },
  annexBlock: { flexDirection: 'row', marginBottom: 8 },
  annexPart: { flex: 1 },
  warning: { fontSize: 8, color: SUNLINE_700, backgroundColor: SUNLINE_50, padding: 3, marginTop: 4 },
  model: { marginTop: 5, fontSize: 7.5, color: INK_SOFT, backgroundColor: PAPER, padding: 4 },
  modelLabel: { fontWeight: 600, color: INK },
  error: { fontSize: 8.5, color: EMBER, fontWeight: 500, marginBottom: 3 },
  textBlock: { marginTop: 5 },
  textBlockTitle: { fontSize: 8, fontWeight: 600, color: INK_SOFT, marginBottom: 2, paddingTop: 3, borderTopWidth: 0.4, borderTopColor: RULE },
  textBlockLine: { fontSize: 6.8, fontFamily: MONO_STACK, color: INK },
  blockFoot: { fontSize: 6.5, color: INK_FAINT, marginTop: 3, paddingBottom: 6, textAlign: 'right' },
});
