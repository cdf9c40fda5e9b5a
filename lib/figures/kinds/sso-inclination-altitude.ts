/**
 * Sun-synchronous inclination against altitude, swept by calling the engine's
 * sso-inclination kind across an altitude band, with the bound block's design
 * point marked.
 */
import { runCalc, type CalcResult } from '@/lib/calc';
import { FigureDataError, type FigureKindDefinition, type FigureAxis } from '../figure-types';
import { axisTitle, FIGURE_COLOURS, layeredFigure } from '../figure-style';
import { readNumber, readOptionalInput } from '../read-result';

const BAND_KM = { min: 400, max: 1000, step: 10, margin: 50 };

export interface SweepPoint {
  altitudeKm: number;
  inclinationDeg: number;
}

/** The altitude band of the sweep: 400–1000 km, widened to keep the design point inside with a margin. */
export function sweepAltitudes(designAltitudeKm: number): number[] {
  const lo = Math.min(BAND_KM.min, Math.floor((designAltitudeKm - BAND_KM.margin) / BAND_KM.step) * BAND_KM.step);
  const hi = Math.max(BAND_KM.max, Math.ceil((designAltitudeKm + BAND_KM.margin) / BAND_KM.step) * BAND_KM.step);
  const out: number[] = [];
  for (let h = Math.max(lo, 100); h <= hi + 1e-9; h += BAND_KM.step) out.push(h);
  return out;
}

/** SSO inclination at each altitude from runCalc (eccentricity held at the design value). */
export function sweepSsoInclination(altitudesKm: readonly number[], eccentricity: number): SweepPoint[] {
  return altitudesKm.map((altitudeKm) => {
    const outcome = runCalc('sso-inclination', { altitudeKm, eccentricity });
    if (!outcome.ok) throw new FigureDataError(`sso-inclination at ${altitudeKm} km: ${outcome.error}`);
    return { altitudeKm, inclinationDeg: readNumber(outcome.result, 'inclinationDeg') };
  });
}

/** Design point of the bound block: an sso-inclination input altitude, or a sun-synchronous repeat orbit's altitude. */
function designPoint(result: CalcResult): SweepPoint {
  if (result.kind === 'repeat-orbit') {
    if (result.outputs.sunSynchronous === false)
      throw new FigureDataError('the repeat orbit is not sun-synchronous (an inclination was given)');
    return { altitudeKm: readNumber(result, 'altitudeKm'), inclinationDeg: readNumber(result, 'inclinationDeg') };
  }
  return {
    altitudeKm: readNumber(result, 'altitudeKm', 'inputs'),
    inclinationDeg: readNumber(result, 'inclinationDeg'),
  };
}

export const ssoInclinationAltitude: FigureKindDefinition = {
  kind: 'sso-inclination-altitude',
  title: 'Sun-synchronous inclination against altitude',
  sourceCalcKinds: ['sso-inclination', 'repeat-orbit'],
  build(result) {
    const design = designPoint(result);
    const eccentricity = readOptionalInput(result, ['eccentricity'], 0);
    const sweep = sweepSsoInclination(sweepAltitudes(design.altitudeKm), eccentricity);
    const x: FigureAxis = {
      field: 'altitudeKm',
      type: 'quantitative',
      title: axisTitle('Mean altitude', 'km'),
      scale: { zero: false, nice: false },
    };
    const y: FigureAxis = {
      field: 'inclinationDeg',
      type: 'quantitative',
      title: axisTitle('Sun-synchronous inclination', 'deg'),
      scale: { zero: false },
    };
    const label = `Design point: ${design.altitudeKm.toFixed(1)} km, ${design.inclinationDeg.toFixed(3)} deg`;
    return layeredFigure([
      {
        name: 'sweep',
        data: { values: sweep },
        mark: { type: 'line', color: FIGURE_COLOURS.orbit },
        encoding: { x, y },
      },
      {
        name: 'design_guides',
        data: { values: [design] },
        mark: { type: 'rule', color: FIGURE_COLOURS.ember, strokeDash: [4, 3], strokeWidth: 1 },
        encoding: { x },
      },
      {
        name: 'design_point',
        data: { values: [design] },
        mark: {
          type: 'point',
          shape: 'diamond',
          size: 90,
          filled: true,
          color: FIGURE_COLOURS.ember,
          stroke: FIGURE_COLOURS.ink,
          strokeWidth: 0.6,
        },
        encoding: { x, y },
      },
      {
        name: 'design_label',
        data: { values: [{ ...design, label }] },
        mark: { type: 'text', align: 'left', dx: 8, dy: -10, fontSize: 9 },
        encoding: { x, y, text: { field: 'label' } },
      },
    ]);
  },
};
