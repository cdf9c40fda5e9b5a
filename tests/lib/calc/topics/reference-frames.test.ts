import * as Astronomy from 'astronomy-engine';
import { describe, expect, it } from 'vitest';
import {
  frameRotation,
  nutation1980,
  precessionAngles1976,
  precessionMatrix1976,
  REFERENCE_FRAMES,
  transformOrbitPlane,
  transformState,
  type ReferenceFrame,
} from '@/lib/calc/topics/reference-frames';

type Vec3 = [number, number, number];
const ARCSEC = Math.PI / 180 / 3600;

/**
 * Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. (2013),
 * Example 3-15 and Table 3-6 (the GPS satellite on 2004-04-06 07:51:28.386009 UTC),
 * the columns computed without the EOP nutation corrections (δΔψ = δΔε = 0).
 * Numbers read from several independent public test suites that quote the table
 * (they agree digit for digit), not from a copy of the book.
 */
const EX_3_15 = {
  epoch: new Date(Date.UTC(2004, 3, 6, 7, 51, 28, 386)),
  jdTt: 2453101.828154745,
  teme: {
    positionKm: [5094.1801621, 6127.6446595, 6380.3445327] as Vec3,
    velocityKmS: [-4.746131487, 0.785818041, 5.531931288] as Vec3,
  },
  tod: {
    positionKm: [5094.5147804, 6127.3664612, 6380.3445327] as Vec3,
    velocityKmS: [-4.746088567, 0.786077222, 5.531931288] as Vec3,
  },
  j2000: {
    positionKm: [5102.5096, 6123.01152, 6378.1363] as Vec3,
    velocityKmS: [-4.7432196, 0.7905366, 5.53375619] as Vec3,
  },
  precessionDeg: { zeta: 0.0273055, theta: 0.0237306, z: 0.0273059 },
};

function maxDiff(a: readonly number[], b: readonly number[]): number {
  return Math.max(...a.map((x, i) => Math.abs(x - b[i])));
}

describe('IAU-1980 nutation and IAU-76 precession', () => {
  it('Δψ, Δε at TT = MJD 53736.0 equal the IAU SOFA test program value for nut80 (t_sofa_c.c) to 1e-15 rad — checks all 106 coefficients', () => {
    const { dPsi, dEps } = nutation1980((2400000.5 + 53736.0 - 2451545.0) / 36525);
    expect(Math.abs(dPsi - -0.9643658353226563966e-5)).toBeLessThan(1e-15);
    expect(Math.abs(dEps - 0.4060051006879713322e-4)).toBeLessThan(1e-15);
  });

  it('the precession matrix at TT = MJD 50123.9999 equals the IAU SOFA test value for pmat76 to 1e-12', () => {
    const m = precessionMatrix1976((2400000.5 + 50123.9999 - 2451545.0) / 36525);
    const sofa = [
      [0.9999995504328350733, 0.8696632209480960785e-3, 0.3779153474959888345e-3],
      [-0.8696632209485112192e-3, 0.9999996218428560614, -0.1643284776111886407e-6],
      [-0.3779153474950335077e-3, -0.1643306746147366896e-6, 0.9999999285899790119],
    ];
    for (let i = 0; i < 3; i++) expect(maxDiff(m[i], sofa[i])).toBeLessThan(1e-12);
  });

  it('Vallado Example 3-15: precession angles ζ, θ, z = 0.0273055°, 0.0237306°, 0.0273059° (to the printed 1e-7°)', () => {
    const p = precessionAngles1976((EX_3_15.jdTt - 2451545) / 36525);
    const deg = 180 / Math.PI;
    expect(Math.abs(p.zeta * deg - EX_3_15.precessionDeg.zeta)).toBeLessThan(1e-7);
    expect(Math.abs(p.theta * deg - EX_3_15.precessionDeg.theta)).toBeLessThan(1e-7);
    expect(Math.abs(p.z * deg - EX_3_15.precessionDeg.z)).toBeLessThan(1e-7);
  });
});

describe('frame rotations', () => {
  it('Vallado Example 3-15: TEME → EME2000 within 0.1 m and 1e-7 km/s of the published J2000 vector (printed to 0.1 m)', () => {
    const out = transformState(EX_3_15.teme, 'TEME', 'EME2000', EX_3_15.epoch);
    expect(maxDiff(out.positionKm, EX_3_15.j2000.positionKm)).toBeLessThan(1e-4);
    expect(maxDiff(out.velocityKmS, EX_3_15.j2000.velocityKmS)).toBeLessThan(1e-7);
  });

  it("Vallado Example 3-15: TEME → TOD within 0.1 m; the 7 cm left is the two 1997 equation-of-equinoxes terms that the book's TOD carries and SGP4's TEME leaves out (Vallado et al. 2006)", () => {
    const out = transformState(EX_3_15.teme, 'TEME', 'TOD', EX_3_15.epoch);
    expect(maxDiff(out.positionKm, EX_3_15.tod.positionKm)).toBeLessThan(1e-4);
    expect(maxDiff(out.velocityKmS, EX_3_15.tod.velocityKmS)).toBeLessThan(1e-7);
    // The residual is a turn about z of 0.00264″ sin Ω + 0.000063″ sin 2Ω (Ω: Moon's node, ≈ 1.85 mas on this date), not noise:
    const r = Math.hypot(EX_3_15.tod.positionKm[0], EX_3_15.tod.positionKm[1]);
    const residual = Math.hypot(
      out.positionKm[0] - EX_3_15.tod.positionKm[0],
      out.positionKm[1] - EX_3_15.tod.positionKm[1],
    );
    expect(residual / r / ARCSEC).toBeGreaterThan(0.0015);
    expect(residual / r / ARCSEC).toBeLessThan(0.0022);
  });

  it('EME2000 → TOD agrees with astronomy-engine 2.1.19 Rotation_EQJ_EQD (IAU 2006 precession + IAU 2000B nutation) within 0.25″, 1950–2080', () => {
    // The two models differ by design: IAU 2006 vs 1976 precession rate (≈ 0.3″/century), the 23 mas frame bias, 2000B vs 1980 nutation (tens of mas).
    for (const year of [1950, 1990, 2000, 2004, 2010, 2026, 2040, 2050, 2080]) {
      const date = new Date(Date.UTC(year, 5, 15, 6));
      const ours = frameRotation('EME2000', 'TOD', date);
      const theirs = Astronomy.Rotation_EQJ_EQD(date).rot; // column-major: theirs[j][i] is row i, column j
      for (let i = 0; i < 3; i++)
        for (let j = 0; j < 3; j++) expect(Math.abs(ours[i][j] - theirs[j][i])).toBeLessThan(0.25 * ARCSEC);
    }
  });

  it('is the identity for one frame, orthonormal, and from→to is the transpose of to→from', () => {
    const date = new Date('2026-06-01T00:00:00Z');
    for (const from of REFERENCE_FRAMES) {
      for (const to of REFERENCE_FRAMES) {
        const m = frameRotation(from, to, date);
        const back = frameRotation(to, from, date);
        for (let i = 0; i < 3; i++) {
          for (let j = 0; j < 3; j++) {
            expect(Math.abs(m[i][j] - back[j][i])).toBeLessThan(1e-15);
            const dot = m[i][0] * m[j][0] + m[i][1] * m[j][1] + m[i][2] * m[j][2];
            expect(Math.abs(dot - (i === j ? 1 : 0))).toBeLessThan(1e-14);
            if (from === to) expect(m[i][j]).toBe(i === j ? 1 : 0);
          }
        }
      }
    }
  });

  it('refuses an invalid epoch', () => {
    expect(() => frameRotation('EME2000', 'TOD', new Date(Number.NaN))).toThrow(/epochUtc/);
  });
});

describe('orbit plane between frames', () => {
  /** Inclination and RAAN read from a state's angular momentum r × v — an independent route through transformState. */
  function planeOf(r: Vec3, v: Vec3): { inclinationDeg: number; raanDeg: number } {
    const h = [r[1] * v[2] - r[2] * v[1], r[2] * v[0] - r[0] * v[2], r[0] * v[1] - r[1] * v[0]];
    const n = Math.hypot(...h);
    const raan = (Math.atan2(h[0], -h[1]) * 180) / Math.PI;
    return { inclinationDeg: (Math.acos(h[2] / n) * 180) / Math.PI, raanDeg: raan < 0 ? raan + 360 : raan };
  }

  /** A circular-orbit state at argument of latitude u on the plane (i, Ω). */
  function circularState(iDeg: number, raanDeg: number, uDeg: number): { positionKm: Vec3; velocityKmS: Vec3 } {
    const [i, o, u] = [iDeg, raanDeg, uDeg].map((d) => (d * Math.PI) / 180);
    const rKm = 7078;
    const vKmS = Math.sqrt(398600.4418 / rKm);
    const p = [Math.cos(o), Math.sin(o), 0];
    const q = [-Math.sin(o) * Math.cos(i), Math.cos(o) * Math.cos(i), Math.sin(i)];
    const pos = [0, 1, 2].map((k) => rKm * (Math.cos(u) * p[k] + Math.sin(u) * q[k])) as Vec3;
    const vel = [0, 1, 2].map((k) => vKmS * (-Math.sin(u) * p[k] + Math.cos(u) * q[k])) as Vec3;
    return { positionKm: pos, velocityKmS: vel };
  }

  it('equals the plane of the rotated state vector (r × v) for every pair of frames (1e-9°)', () => {
    const date = new Date('2027-03-01T10:30:00Z');
    for (const [iDeg, raanDeg] of [
      [98.2, 10],
      [98.2, 200],
      [51.6, 123.4],
      [5, 359],
    ]) {
      for (const from of REFERENCE_FRAMES) {
        for (const to of REFERENCE_FRAMES) {
          const state = circularState(iDeg, raanDeg, 37);
          const rotated = transformState(state, from as ReferenceFrame, to as ReferenceFrame, date);
          const expected = planeOf(rotated.positionKm, rotated.velocityKmS);
          const got = transformOrbitPlane({ inclinationDeg: iDeg, raanDeg }, from, to, date);
          expect(Math.abs(got.inclinationDeg - expected.inclinationDeg)).toBeLessThan(1e-9);
          expect(Math.abs(((got.raanDeg - expected.raanDeg + 540) % 360) - 180)).toBeLessThan(1e-9);
        }
      }
    }
  });

  it('an SSO plane typed in EME2000 moves by about 0.14° in inclination at most by 2027: the precession that breaks sun-synchronism if ignored', () => {
    // θ_A over 27 years ≈ 2004.3″ × 0.27 = 541″ = 0.150°: the largest change of inclination precession can make.
    let largest = 0;
    for (let raan = 0; raan < 360; raan += 5) {
      const tod = transformOrbitPlane(
        { inclinationDeg: 98.2, raanDeg: raan },
        'EME2000',
        'TOD',
        new Date('2027-01-01T00:00:00Z'),
      );
      largest = Math.max(largest, Math.abs(tod.inclinationDeg - 98.2));
    }
    expect(largest).toBeGreaterThan(0.14);
    expect(largest).toBeLessThan(0.16);
  });

  it('round-trips EME2000 → TEME → EME2000 to 1e-10°', () => {
    const date = new Date('2030-07-01T00:00:00Z');
    const teme = transformOrbitPlane({ inclinationDeg: 97.8, raanDeg: 301.5 }, 'EME2000', 'TEME', date);
    const back = transformOrbitPlane(teme, 'TEME', 'EME2000', date);
    expect(Math.abs(back.inclinationDeg - 97.8)).toBeLessThan(1e-10);
    expect(Math.abs(back.raanDeg - 301.5)).toBeLessThan(1e-10);
  });
});
