/** The memo PDF's look: our palette (tailwind.config.ts), IBM Plex, A4 or US Letter with 20 mm side margins. */
import { StyleSheet } from '@react-pdf/renderer';
import { MONO_STACK, SANS_STACK } from './pdf-fonts';

export const INK = '#1d2430';
export const INK_SOFT = '#4a5262';
export const INK_FAINT = '#7b8291';
export const RULE = '#d9d6cc';
export const PAPER = '#f6f5f1';
export const PAPER_SUNK = '#ecebe5';
export const ORBIT = '#2f4a7a';
export const ORBIT_50 = '#eef2f9';
export const EMBER = '#a23b2a';
export const EMBER_50 = '#f9ecea';
export const SUNLINE_50 = '#fbf4e6';
export const SUNLINE_700 = '#7f5314';

export type PaperSize = 'a4' | 'letter';

export const PAGE_SIZES: Record<PaperSize, { size: 'A4' | 'LETTER'; width: number; height: number }> = {
  a4: { size: 'A4', width: 595.28, height: 841.89 },
  letter: { size: 'LETTER', width: 612, height: 792 },
};

export const MARGIN = { side: 57, top: 70, bottom: 62 };

/** Width of the text block in points. */
export const contentWidth = (paper: PaperSize): number => PAGE_SIZES[paper].width - 2 * MARGIN.side;

export const styles = StyleSheet.create({
  page: {
    fontFamily: SANS_STACK,
    fontSize: 9.5,
    lineHeight: 1.42,
    color: INK,
    paddingTop: MARGIN.top,
    paddingBottom: MARGIN.bottom,
    paddingHorizontal: MARGIN.side,
  },
  paragraph: { marginBottom: 6 },
  heading1: { fontSize: 14, fontWeight: 600, marginTop: 14, marginBottom: 6, color: INK },
  heading2: { fontSize: 11.5, fontWeight: 600, marginTop: 10, marginBottom: 4, color: INK },
  heading3: { fontSize: 10, fontWeight: 600, marginTop: 8, marginBottom: 3, color: INK_SOFT },
  headingNumber: { color: ORBIT },
  sectionTitle: {
    fontSize: 13,
    fontWeight: 600,
    marginBottom: 8,
    paddingBottom: 4,
    borderBottomWidth: 0.8,
    borderBottomColor: ORBIT,
  },
  listRow: { flexDirection: 'row', marginBottom: 2 },
  listMarker: { width: 16, color: INK_SOFT },
  listBody: { flex: 1 },
  blockquote: { borderLeftWidth: 2, borderLeftColor: RULE, paddingLeft: 9, marginBottom: 6, color: INK_SOFT },
  codeBlock: {
    fontFamily: MONO_STACK,
    fontSize: 8.5,
    backgroundColor: PAPER,
    padding: 6,
    marginBottom: 6,
    borderRadius: 2,
  },
  rule: { borderBottomWidth: 0.6, borderBottomColor: RULE, marginVertical: 8 },
  inlineCode: { fontFamily: MONO_STACK, fontSize: 8.5, backgroundColor: PAPER_SUNK },
  link: { color: ORBIT, textDecoration: 'underline' },
  liveValue: { fontWeight: 500 },
  unavailable: { color: EMBER, fontWeight: 500 },
  table: { marginBottom: 8 },
  tableRow: { flexDirection: 'row' },
  tableFirstRow: { borderTopWidth: 0.6, borderTopColor: RULE },
  tableCell: {
    flex: 1,
    borderRightWidth: 0.6,
    borderBottomWidth: 0.6,
    borderColor: RULE,
    paddingHorizontal: 4,
    paddingTop: 3,
    paddingBottom: 1,
  },
  tableHeaderCell: { backgroundColor: PAPER, fontWeight: 600 },
  image: { marginBottom: 8, objectFit: 'contain' },
  caption: { fontSize: 8.5, color: INK_SOFT, marginTop: 3, marginBottom: 10 },
  captionLabel: { fontWeight: 600, color: INK },
  small: { fontSize: 8, color: INK_SOFT },
  mono: { fontFamily: MONO_STACK },
});
