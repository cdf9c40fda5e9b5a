/**
 * An ephemeris of an osculating state: Cowell integration of two-body + zonal
 * harmonics J2…J_N (the engine's zonal force model, Montenbruck & Gill 2000 §3.2)
 * with DOP853 (Dormand & Prince 1980; Hairer, Nørsett & Wanner 2nd ed. §II.10),
 * sampled at equal steps by integrating from one sample time to the next.
 *
 * Frame: the quasi-inertial frame the start state is given in (the engine's
 * true-of-date equator and equinox of the start epoch); the frame is held fixed
 * over the span, which over a day moves the equinox by about 0.14″ of precession
 * (Vallado 4th ed. §3.7, 50.3″ per year) — below a metre at LEO radius.
 * Units km, s. Not modelled: drag, third bodies, tesseral harmonics.
 */
import { createZonalForceModel } from './zonal-force';
import { integrateAdaptive } from './integrators';
import type { Vec3 } from '../kepler-state';

export interface EphemerisSample {
  /** Seconds since the start state. */
  tSec: number;
  positionKm: Vec3;
  velocityKmS: Vec3;
}

export interface EphemerisOptions {
  spanSec: number;
  stepSec: number;
  /** Highest zonal degree, 2…6 (default 6). */
  zonalDegree?: number;
  /** Relative and absolute tolerance of DOP853 (default 1e-12). */
  tolerance?: number;
}

/** Most samples one call returns (ten days at 60 s). */
export const MAX_EPHEMERIS_SAMPLES = 14_401;

export function propagateEphemeris(
  start: { positionKm: Vec3; velocityKmS: Vec3 },
  o: EphemerisOptions,
): EphemerisSample[] {
  const count = Math.floor(o.spanSec / o.stepSec) + 1;
  if (!(o.stepSec > 0) || !(o.spanSec >= 0) || count > MAX_EPHEMERIS_SAMPLES)
    throw new RangeError(`ephemeris of ${count} samples outside 1…${MAX_EPHEMERIS_SAMPLES}`);
  const force = createZonalForceModel(o.zonalDegree ?? 6);
  const tol = o.tolerance ?? 1e-12;
  let y: Float64Array = Float64Array.from([...start.positionKm, ...start.velocityKmS]);
  const samples: EphemerisSample[] = [
    { tSec: 0, positionKm: [...start.positionKm], velocityKmS: [...start.velocityKmS] },
  ];
  for (let k = 1; k < count; k++) {
    const t0 = (k - 1) * o.stepSec;
    y = integrateAdaptive('dop853', force.derivative, t0, y, t0 + o.stepSec, {
      relTol: tol,
      absTol: tol,
      maxSteps: 100_000,
    }).y;
    samples.push({ tSec: k * o.stepSec, positionKm: [y[0], y[1], y[2]], velocityKmS: [y[3], y[4], y[5]] });
  }
  return samples;
}
