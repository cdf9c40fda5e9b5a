import type { FigureSpec } from './figure-types';

/**
 * Renders a figure spec to an SVG document on the server: vega-lite compile →
 * vega View with the headless renderer → toSVG (text widths are vega's
 * estimates; no canvas package is needed). vega and vega-lite are loaded
 * with import() because vega-canvas uses top-level await, which a
 * CommonJS-compiled caller (tsx scripts) cannot require().
 */
export async function renderFigureSvg(spec: FigureSpec): Promise<string> {
  const [{ compile }, { parse, View }] = await Promise.all([import('vega-lite'), import('vega')]);
  const view = new View(parse(compile(spec).spec), { renderer: 'none' });
  try {
    return await view.toSVG();
  } finally {
    view.finalize();
  }
}
