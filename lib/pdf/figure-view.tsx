/** A figure in the PDF: the vega SVG as vector primitives, kept with its numbered caption. */
import { Text, View } from '@react-pdf/renderer';
import type { PreparedFigure } from './prepare-memo-pdf';
import { styles } from './pdf-theme';
import { svgToPdf } from './svg-to-pdf';

export function FigureView({ figure, width }: { figure?: PreparedFigure; width: number }) {
  if (!figure) return <Text style={styles.unavailable}>[figure unavailable: the figure’s stored attributes are malformed]</Text>;
  return (
    <View wrap={false} style={{ marginTop: 4, alignItems: 'center' }}>
      {figure.svg ? svgToPdf(figure.svg, width) : <Text style={styles.unavailable}>{`[figure unavailable: ${figure.error ?? 'no data'}]`}</Text>}
      <Text style={[styles.caption, { alignSelf: 'stretch' }]}>
        <Text style={styles.captionLabel}>{`Figure ${figure.number}. `}</Text>
        {figure.caption}
      </Text>
    </View>
  );
}
