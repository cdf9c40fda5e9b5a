/** Repeat ground-track options of a repeat-options block: cycle length against altitude, each labelled revolutions/days. */
import type { FigureKindDefinition, FigureAxis } from '../figure-types';
import { axisTitle, FIGURE_COLOURS, layeredFigure } from '../figure-style';
import { readRows, rowNumber } from '../read-result';

export const repeatOptionsChart: FigureKindDefinition = {
  kind: 'repeat-options',
  title: 'Repeat ground-track options by altitude',
  sourceCalcKinds: ['repeat-options'],
  build(result) {
    const options = readRows(result, 'options').map((row) => {
      const revolutions = rowNumber(row, 'revolutions', 'repeat options');
      const days = rowNumber(row, 'days', 'repeat options');
      return {
        revolutions,
        days,
        altitudeKm: rowNumber(row, 'altitudeKm', 'repeat options'),
        label: `${revolutions}/${days}`,
      };
    });
    const maxDays = Math.max(1, ...options.map((o) => o.days));
    const x: FigureAxis = {
      field: 'altitudeKm',
      type: 'quantitative',
      title: axisTitle('Mean altitude', 'km'),
      scale: { zero: false },
    };
    const y: FigureAxis = {
      field: 'days',
      type: 'quantitative',
      title: axisTitle('Repeat cycle', 'days'),
      scale: { domain: [0, maxDays + 1], nice: false },
      axis: { tickMinStep: 1, format: 'd' },
    };
    return layeredFigure(
      [
        {
          name: 'options',
          mark: { type: 'point', shape: 'circle', size: 26, color: FIGURE_COLOURS.orbit },
          encoding: { x, y },
        },
        {
          name: 'option_labels',
          mark: { type: 'text', align: 'left', dx: 4, dy: -5, fontSize: 7, color: FIGURE_COLOURS.inkSoft },
          encoding: { x, y, text: { field: 'label' } },
        },
      ],
      { values: options },
    );
  },
};
