/**
 * The orbit-message kind: a CCSDS OPM or OEM (502.0-B) read into mean elements.
 * Outside checks: the second OPM example of 502.0-B-2 (from memory, see
 * tests/lib/orbit-data/ccsds-examples.ts) in TOD gives back its own osculating
 * Keplerian elements; a state written by us in EME2000 and in TOD imports to the
 * same elements (the frames module rotates one into the other). Round trips
 * (mean → OPM text → import → mean) hold to the printed precision.
 */
import { describe, expect, it } from 'vitest';
import { num, outputsOf, expectFieldError, resultOf } from './helpers';
import { OPM_KEPLERIAN, OPM_G1 } from '../../orbit-data/ccsds-examples';
import { writeStateOem, writeStateOpm } from '@/lib/orbit-data/write-state-messages';
import { writeOpmKvn } from '@/lib/orbit-data/write-orbit-message-kvn';
import { readStateResult } from '@/lib/orbit-data/read-state-result';

const subject = {
  originator: 'Brightwater Orbital',
  creationDate: new Date('2026-12-02T13:00:00Z'),
  objectName: 'TERNLIGHT-1',
  objectId: 'BWO-TL1-DM-001',
  comments: [],
};
const MEAN = {
  semiMajorAxisKm: 7070.0,
  eccentricity: 0.00115,
  inclinationDeg: 98.19,
  raanDeg: 261.5,
  argPerigeeDeg: 90,
  meanAnomalyDeg: 30,
  epoch: '2027-09-15T00:00:00Z',
};

function designState() {
  const r = resultOf('mean-to-osculating', MEAN);
  const read = readStateResult(r);
  if (!read.ok) throw new Error(read.reason);
  return read.state;
}

describe('orbit-message', () => {
  it("reads the 502.0-B-2 TOD example: osculating elements equal the message's own Keplerian block (a 0.01 km, e 1e-6, i and RAAN 1e-4°)", () => {
    const out = outputsOf('orbit-message', { message: OPM_KEPLERIAN });
    expect(out.refFrame).toBe('TOD');
    expect(out.objectName).toBe('EUTELSAT W4');
    expect(out.epoch).toBe('2006-06-03T00:00:00.000Z');
    expect(Math.abs(num(out, 'oscSemiMajorAxisKm') - 41399.5123)).toBeLessThan(0.01);
    expect(Math.abs(num(out, 'oscEccentricity') - 0.020842611)).toBeLessThan(1e-6);
    expect(Math.abs(num(out, 'oscInclinationDeg') - 0.117746)).toBeLessThan(1e-4);
    expect(Math.abs(num(out, 'oscRaanDeg') - 17.604721)).toBeLessThan(1e-4);
    const r = resultOf('orbit-message', { message: OPM_KEPLERIAN });
    expect(r.warnings).toContain('Read but not used: 2 manoeuvres (not applied).');
  });

  it('round trip: mean elements → osculating TOD state → OPM in EME2000 → import gives the mean elements back (a 1e-5 km, e 1e-8, angles 1e-6°)', () => {
    const out = outputsOf('orbit-message', { message: writeStateOpm(subject, designState()) });
    expect(out.refFrame).toBe('EME2000');
    expect(out.epoch).toBe('2027-09-15T00:00:00.000Z');
    expect(Math.abs(num(out, 'meanSemiMajorAxisKm') - MEAN.semiMajorAxisKm)).toBeLessThan(1e-5);
    expect(Math.abs(num(out, 'meanEccentricity') - MEAN.eccentricity)).toBeLessThan(1e-8);
    expect(Math.abs(num(out, 'meanInclinationDeg') - MEAN.inclinationDeg)).toBeLessThan(1e-6);
    expect(Math.abs(num(out, 'meanRaanDeg') - MEAN.raanDeg)).toBeLessThan(1e-6);
    const u = (num(out, 'meanArgPerigeeDeg') + num(out, 'meanMeanAnomalyDeg')) % 360;
    expect(Math.abs(u - 120)).toBeLessThan(1e-5);
    expect(Math.abs(num(out, 'meanAltitudeKm') - (MEAN.semiMajorAxisKm - 6378.137))).toBeLessThan(1e-5);
  });

  it('the same state written in TOD and in EME2000 imports to the same elements (1e-6°), and the two RAANs in the messages differ by the precession since J2000 (0.3°–0.45° in 2027)', () => {
    const s = designState();
    const tod = writeOpmKvn({ ...subject, refFrame: 'TOD' }, s);
    const eme = writeStateOpm(subject, s);
    const a = outputsOf('orbit-message', { message: tod });
    const b = outputsOf('orbit-message', { message: eme });
    for (const k of ['meanInclinationDeg', 'meanRaanDeg', 'oscRaanDeg'])
      expect(Math.abs(num(a, k) - num(b, k))).toBeLessThan(1e-6);
    const emeRaan = Number(/RA_OF_ASC_NODE\s+= (\S+)/.exec(eme)![1]);
    // IAU 1976 general precession in RA of a node near the equinox: about 4612″ per century (ζ + z, Lieske et al. 1977), 27.7 years → 0.355°; nutation adds at most ±0.005°.
    expect(num(a, 'oscRaanDeg') - emeRaan).toBeGreaterThan(0.3);
    expect(num(a, 'oscRaanDeg') - emeRaan).toBeLessThan(0.45);
  });

  it('an OEM gives its first state, its number of states and its span (our one-day check: 1441 states, 24 h)', () => {
    const oem = writeStateOem(subject, designState());
    const out = outputsOf('orbit-message', { message: oem });
    expect(out.states).toBe(1441);
    expect(num(out, 'spanHours')).toBeCloseTo(24, 9);
    expect(Math.abs(num(out, 'meanSemiMajorAxisKm') - MEAN.semiMajorAxisKm)).toBeLessThan(1e-5);
  });

  it('refuses a malformed message naming line and keyword in the message field', () => {
    const message = OPM_G1.replace('REF_FRAME = ITRF2000', 'REF_FRAME = EME2000').replace(
      'X = 6503.514000',
      'X = 6503.514000 [m]',
    );
    expect(expectFieldError('orbit-message', { message }, 'message')).toMatch(
      /line 11, X: unit \[m\] where the standard requires \[km\]/,
    );
    expect(expectFieldError('orbit-message', { message: OPM_G1 }, 'message')).toMatch(/line 8, REF_FRAME/);
  });

  it('refuses a state whose orbit dips below 100 km, naming the line of its epoch', () => {
    const s = {
      epoch: new Date('2027-01-01T00:00:00Z'),
      positionKm: [6500, 0, 0] as [number, number, number],
      velocityKmS: [0, 6.0, 3.0] as [number, number, number],
    };
    expect(
      expectFieldError('orbit-message', { message: writeOpmKvn({ ...subject, refFrame: 'EME2000' }, s) }, 'message'),
    ).toMatch(/line \d+: the state's osculating perigee is .* km above the equatorial radius/);
  });

  it('refuses an empty message as required', () => {
    expectFieldError('orbit-message', { message: '' }, 'message');
  });
});
