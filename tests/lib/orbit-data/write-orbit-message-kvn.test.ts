/**
 * Round trip of what Nodewright writes: an OPM and an OEM in KVN read back by
 * our reader give the same numbers to the printed decimals (WRITTEN_DECIMALS),
 * and each written message passes every check of CCSDS 502.0-B the reader applies.
 */
import { describe, expect, it } from 'vitest';
import { readOrbitMessage } from '@/lib/orbit-data/read-orbit-message';
import {
  writeOemKvn,
  writeOpmKvn,
  WRITTEN_DECIMALS,
  type OrbitMessageIdentity,
  type StateToWrite,
} from '@/lib/orbit-data/write-orbit-message-kvn';
import type { OrbitEphemerisMessage, OrbitParameterMessage } from '@/lib/orbit-data/orbit-message-types';

const id: OrbitMessageIdentity = {
  originator: 'Brightwater Orbital',
  creationDate: new Date('2026-12-02T13:00:00.250Z'),
  objectName: 'TERNLIGHT-1',
  objectId: 'BWO-TL1-DM-001',
  refFrame: 'EME2000',
  comments: ['Design orbit of revision A\nsecond line'],
};
const state: StateToWrite = {
  epoch: new Date('2027-09-15T00:00:00.123Z'),
  positionKm: [7077.123456789, -12.3456789, 0.000123456],
  velocityKmS: [0.0123456789012, -1.0123456789012, 7.4512345678912],
};
const half = (decimals: number) => 0.5 * 10 ** -decimals + 1e-12;

describe('writeOpmKvn → readOrbitMessage', () => {
  it('gives back the state to 1 mm and 1 µm/s and the elements to their decimals', () => {
    const text = writeOpmKvn(id, state, {
      semiMajorAxisKm: 7078.1371234567,
      eccentricity: 0.0011512345678912,
      inclinationDeg: 98.1867123456789,
      raanDeg: 342.123456789123,
      argPericenterDeg: 90.0000000004,
      meanAnomalyDeg: 359.9999999991,
      gmKm3S2: 398600.4418,
    });
    const m = readOrbitMessage(text) as OrbitParameterMessage;
    expect(m.state.epoch.toISOString()).toBe('2027-09-15T00:00:00.123Z');
    m.state.positionKm.forEach((x, i) =>
      expect(Math.abs(x - state.positionKm[i])).toBeLessThanOrEqual(half(WRITTEN_DECIMALS.positionKm)),
    );
    m.state.velocityKmS.forEach((v, i) =>
      expect(Math.abs(v - state.velocityKmS[i])).toBeLessThanOrEqual(half(WRITTEN_DECIMALS.velocityKmS)),
    );
    expect(Math.abs(m.keplerian!.eccentricity - 0.0011512345678912)).toBeLessThanOrEqual(
      half(WRITTEN_DECIMALS.eccentricity),
    );
    expect(Math.abs(m.keplerian!.inclinationDeg - 98.1867123456789)).toBeLessThanOrEqual(
      half(WRITTEN_DECIMALS.angleDeg),
    );
    expect(m.keplerian!.anomaly.kind).toBe('mean');
    expect(m.header.originator).toBe('Brightwater Orbital');
    expect(m.metadata).toMatchObject({ objectName: 'TERNLIGHT-1', refFrame: 'EME2000' });
    expect(text).toContain('COMMENT second line');
    expect(text).toMatch(/^X\s+= 7077\.123457 \[km\]$/m);
  });
});

describe('writeOemKvn → readOrbitMessage', () => {
  it('gives back 1441 states (one day at 60 s) with their epochs and numbers to the printed decimals', () => {
    const states: StateToWrite[] = Array.from({ length: 1441 }, (_, k) => {
      const t = k * 60;
      const w = (2 * Math.PI) / 5928;
      return {
        epoch: new Date(Date.UTC(2027, 8, 15) + t * 1000),
        positionKm: [7078.137 * Math.cos(w * t), 7078.137 * Math.sin(w * t) * 0.14, 7078.137 * Math.sin(w * t) * 0.99],
        velocityKmS: [-7.5 * Math.sin(w * t), 7.5 * Math.cos(w * t) * 0.14, 7.5 * Math.cos(w * t) * 0.99],
      };
    });
    const text = writeOemKvn({ ...id, comments: [] }, states);
    const m = readOrbitMessage(text) as OrbitEphemerisMessage;
    expect(m.segments).toHaveLength(1);
    const read = m.segments[0].states;
    expect(read).toHaveLength(1441);
    expect(m.segments[0].metadata).toMatchObject({
      startTime: '2027-09-15T00:00:00.000',
      stopTime: '2027-09-16T00:00:00.000',
    });
    let worst = 0;
    read.forEach((s, k) => {
      expect(s.epoch.getTime()).toBe(states[k].epoch.getTime());
      s.positionKm.forEach((x, i) => (worst = Math.max(worst, Math.abs(x - states[k].positionKm[i]))));
    });
    expect(worst).toBeLessThanOrEqual(half(WRITTEN_DECIMALS.positionKm));
  });
});
