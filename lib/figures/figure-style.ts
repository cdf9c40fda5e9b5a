/**
 * Nodewright's figure look: the product palette (tailwind.config.ts), IBM Plex
 * type, and series styles that stay distinct in greyscale print — every series
 * differs in dash pattern and point shape as well as in colour.
 */
import type { Config } from 'vega-lite';
import type { FigureLayer, FigureSpec } from './figure-types';

export const FIGURE_COLOURS = {
  ink: '#1d2430',
  inkSoft: '#4a5262',
  inkFaint: '#7b8291',
  rule: '#d9d6cc',
  orbit: '#2f4a7a',
  sunline: '#b7791f',
  moss: '#4d7c3a',
  ember: '#a23b2a',
  land: '#8d919a',
} as const;

export const FIGURE_FONT = 'IBM Plex Sans';

/** Plot area of a single-panel figure in CSS pixels (the PDF scales the SVG to the text width). */
export const PLOT_WIDTH = 440;
export const PLOT_HEIGHT = 220;

export interface SeriesStyle {
  colour: string;
  dash: number[];
  shape: 'circle' | 'square' | 'triangle-up' | 'diamond' | 'cross';
}

/** Series styles in order of use. */
export const SERIES_STYLES: readonly SeriesStyle[] = [
  { colour: FIGURE_COLOURS.orbit, dash: [], shape: 'circle' },
  { colour: FIGURE_COLOURS.ember, dash: [6, 3], shape: 'square' },
  { colour: FIGURE_COLOURS.moss, dash: [2, 2], shape: 'triangle-up' },
  { colour: FIGURE_COLOURS.sunline, dash: [8, 3, 2, 3], shape: 'diamond' },
];

/** Colour, dash and shape scales (domain → range) for series named in `names`. */
export function seriesScales(
  names: readonly string[],
  firstStyle = 0,
): { colour: string[]; dash: number[][]; shape: string[] } {
  const styles = names.map((_, i) => SERIES_STYLES[(i + firstStyle) % SERIES_STYLES.length]);
  return { colour: styles.map((s) => s.colour), dash: styles.map((s) => s.dash), shape: styles.map((s) => s.shape) };
}

/** Shared Vega-Lite config: fonts, axis and legend styling, white background for print. */
export function figureConfig(): Config {
  return {
    background: '#ffffff',
    font: FIGURE_FONT,
    view: { stroke: FIGURE_COLOURS.inkFaint, strokeWidth: 0.6 },
    axis: {
      labelColor: FIGURE_COLOURS.inkSoft,
      labelFontSize: 9,
      titleColor: FIGURE_COLOURS.ink,
      titleFontSize: 10,
      titleFontWeight: 500,
      domainColor: FIGURE_COLOURS.inkSoft,
      tickColor: FIGURE_COLOURS.inkSoft,
      gridColor: FIGURE_COLOURS.rule,
      gridWidth: 0.6,
    },
    legend: {
      orient: 'bottom',
      direction: 'horizontal',
      labelFontSize: 9,
      labelColor: FIGURE_COLOURS.ink,
      title: null,
      symbolStrokeWidth: 1.6,
      symbolSize: 60,
      columnPadding: 14,
    },
    line: { strokeWidth: 1.6 },
    point: { filled: true, size: 30 },
    text: { font: FIGURE_FONT, fontSize: 8, color: FIGURE_COLOURS.ink },
  };
}

/** Axis title with its unit: "Mean altitude (km)". */
export const axisTitle = (label: string, unit: string | null): string => (unit ? `${label} (${unit})` : label);

const SCHEMA = 'https://vega.github.io/schema/vega-lite/v6.json';

/** A single-panel figure of layers, at the standard plot size with our config. */
export function layeredFigure(layer: FigureLayer[], data?: { values: unknown[] }): FigureSpec {
  return {
    $schema: SCHEMA,
    width: PLOT_WIDTH,
    height: PLOT_HEIGHT,
    config: figureConfig(),
    ...(data ? { data } : {}),
    layer,
  };
}

/** Panels stacked over a shared horizontal axis, each of the given height; series scales kept per panel. */
export function stackedFigure(panels: FigureLayer[][], panelHeight: number): FigureSpec {
  return {
    $schema: SCHEMA,
    config: figureConfig(),
    spacing: 12,
    resolve: {
      scale: { color: 'independent', strokeDash: 'independent', shape: 'independent' },
      legend: { color: 'independent', strokeDash: 'independent', shape: 'independent' },
    },
    vconcat: panels.map((layer) => ({ width: PLOT_WIDTH, height: panelHeight, layer })),
  };
}
