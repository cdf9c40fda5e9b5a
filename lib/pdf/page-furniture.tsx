/** What every page carries: running header and footer ("page X of Y") and, on an unfrozen memo, the DRAFT marking. */
import { StyleSheet, Text, View } from '@react-pdf/renderer';
import { DRAFT_BAND } from './pdf-text';
import { EMBER, EMBER_50, INK_FAINT, INK_SOFT, MARGIN, PAGE_SIZES, RULE, type PaperSize } from './pdf-theme';

const s = StyleSheet.create({
  header: {
    position: 'absolute',
    top: 28,
    left: MARGIN.side,
    right: MARGIN.side,
    flexDirection: 'row',
    justifyContent: 'space-between',
    borderBottomWidth: 0.5,
    borderBottomColor: RULE,
    paddingBottom: 4,
    fontSize: 7.5,
    color: INK_SOFT,
  },
  footer: {
    position: 'absolute',
    left: MARGIN.side,
    right: MARGIN.side,
    flexDirection: 'row',
    justifyContent: 'space-between',
    borderTopWidth: 0.5,
    borderTopColor: RULE,
    paddingTop: 4,
    fontSize: 7.5,
    color: INK_FAINT,
  },
  draftBand: {
    position: 'absolute',
    top: 46,
    left: MARGIN.side,
    right: MARGIN.side,
    backgroundColor: EMBER_50,
    color: EMBER,
    fontSize: 7.5,
    fontWeight: 600,
    textAlign: 'center',
    paddingVertical: 2,
    letterSpacing: 0.5,
  },
  watermark: {
    position: 'absolute',
    left: 0,
    right: 0,
    textAlign: 'center',
    fontSize: 110,
    fontWeight: 700,
    color: EMBER,
    opacity: 0.07,
    transform: 'rotate(-32deg)',
  },
});

export interface FurnitureProps {
  documentNumber: string;
  revisionLabel: string;
  title: string;
  organisation: string;
  draft: boolean;
  paper: PaperSize;
}

/** The faint diagonal DRAFT across every page; placed after the content so that shaded boxes do not hide it. */
export function DraftWatermark({ paper }: { paper: PaperSize }) {
  return (
    <Text style={[s.watermark, { top: PAGE_SIZES[paper].height / 2 - 70 }]} fixed>
      DRAFT
    </Text>
  );
}

/** Offsets from the top only: absolute boxes placed from the bottom came out of react-pdf's layout with non-finite positions on some pages. */
export function PageFurniture(p: FurnitureProps) {
  return (
    <>
      <View style={s.header} fixed>
        <Text>{`${p.documentNumber} · ${p.revisionLabel}`}</Text>
        <Text>{p.organisation}</Text>
      </View>
      {p.draft ? (
        <Text style={s.draftBand} fixed>
          {DRAFT_BAND}
        </Text>
      ) : null}
      <View style={[s.footer, { top: PAGE_SIZES[p.paper].height - 44 }]} fixed>
        <Text style={{ maxWidth: '75%' }}>{p.title}</Text>
        <Text render={({ pageNumber, totalPages }) => `page ${pageNumber} of ${totalPages}`} />
      </View>
    </>
  );
}
