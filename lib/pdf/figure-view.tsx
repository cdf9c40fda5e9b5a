/** A figure in the PDF: the vega SVG as vector primitives, kept with its numbered caption. */
import { Text, View } from '@react-pdf/renderer';
import type { HeadingPageBook } from './heading-page-book';
import { PageMark } from './page-mark';
import type { PreparedFigure } from './prepare-memo-pdf';
import { styles } from './pdf-theme';
import { svgToPdf } from './svg-to-pdf';

export const figureAnchor = (number: number): string => `fig-${number}`;

export function FigureView({ figure, width, book }: { figure?: PreparedFigure; width: number; book: HeadingPageBook }) {
  if (!figure)
    return <Text style={styles.unavailable}>[figure unavailable: the figure’s stored attributes are malformed]</Text>;
  const anchor = figureAnchor(figure.number);
  // The mark that records the figure's page, for the list of figures, stands just before it, outside the figure: inside,
  // it would make react-pdf lay the whole figure out again each time it is placed. Its minPresenceAhead keeps it on
  // the figure's page (no break may fall right after it).
  return (
    <>
      <PageMark id={anchor} book={book} minPresenceAhead={1} />
      <View wrap={false} style={{ marginTop: 4, alignItems: 'center' }} id={anchor}>
        {figure.svg ? (
          svgToPdf(figure.svg, width)
        ) : (
          <Text style={styles.unavailable}>{`[figure unavailable: ${figure.error ?? 'no data'}]`}</Text>
        )}
        <Text style={[styles.caption, { alignSelf: 'stretch' }]}>
          <Text style={styles.captionLabel}>{`Figure ${figure.number}. `}</Text>
          {figure.caption}
        </Text>
      </View>
    </>
  );
}
