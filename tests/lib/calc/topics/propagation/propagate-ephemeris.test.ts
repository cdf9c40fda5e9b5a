/**
 * The ephemeris of the frozen revisions' OEM. Checks from physics rather than from
 * the code's own formulas: in an axially symmetric, conservative field (two-body +
 * zonal harmonics) the energy and the polar component of the angular momentum are
 * conserved (Montenbruck & Gill 2000 §3.2; Vallado 4th ed. §9.6), here to 1e-10
 * relative over one day; sampling every 60 s gives the same end state as one call
 * over the day within 1 m (both DOP853 at 1e-12).
 */
import { describe, expect, it } from 'vitest';
import { propagateEphemeris } from '@/lib/calc/topics/propagation/propagate-ephemeris';
import { createZonalForceModel } from '@/lib/calc/topics/propagation/zonal-force';
import { integrateAdaptive } from '@/lib/calc/topics/propagation/integrators';

const start = {
  positionKm: [7070.0, 0, 0] as [number, number, number],
  velocityKmS: [0, -1.0679, 7.4325] as [number, number, number],
};

describe('propagateEphemeris', () => {
  const samples = propagateEphemeris(start, { spanSec: 86_400, stepSec: 60 });

  it('gives 1441 samples at 0, 60, … 86 400 s, the first being the start state', () => {
    expect(samples).toHaveLength(1441);
    expect(samples[1440].tSec).toBe(86_400);
    expect(samples[0].positionKm).toEqual(start.positionKm);
  });

  it('conserves energy and h_z to 1e-10 relative over the day', () => {
    const force = createZonalForceModel(6);
    const y = (s: (typeof samples)[number]) => Float64Array.from([...s.positionKm, ...s.velocityKmS]);
    const hz = (s: (typeof samples)[number]) => s.positionKm[0] * s.velocityKmS[1] - s.positionKm[1] * s.velocityKmS[0];
    const e0 = force.energy(y(samples[0]));
    const h0 = hz(samples[0]);
    for (const s of samples) {
      expect(Math.abs((force.energy(y(s)) - e0) / e0)).toBeLessThan(1e-10);
      expect(Math.abs((hz(s) - h0) / h0)).toBeLessThan(1e-10);
    }
  });

  it('ends within 1 m of one integration over the whole day', () => {
    const force = createZonalForceModel(6);
    const one = integrateAdaptive(
      'dop853',
      force.derivative,
      0,
      Float64Array.from([...start.positionKm, ...start.velocityKmS]),
      86_400,
      { relTol: 1e-12, absTol: 1e-12, maxSteps: 1e6 },
    ).y;
    const end = samples[1440].positionKm;
    expect(Math.hypot(end[0] - one[0], end[1] - one[1], end[2] - one[2])).toBeLessThan(1e-3);
  });

  it('refuses more samples than it may give', () => {
    expect(() => propagateEphemeris(start, { spanSec: 86_400 * 20, stepSec: 60 })).toThrow(RangeError);
  });
});
