/**
 * The orbit-data-message reader against the examples of CCSDS 502.0-B (see
 * ccsds-examples.ts for where each comes from and which is from memory), and the
 * refusals the standard and the engine call for, each naming the line and keyword.
 */
import { describe, expect, it } from 'vitest';
import { readOrbitMessage } from '@/lib/orbit-data/read-orbit-message';
import {
  OrbitMessageError,
  ORBIT_MESSAGE_LIMITS,
  type OrbitEphemerisMessage,
  type OrbitParameterMessage,
} from '@/lib/orbit-data/orbit-message-types';
import { stateToElements } from '@/lib/calc/topics/kepler-state';
import { OEM_G6, OMM_G4, OPM_G1, OPM_KEPLERIAN, removeLine, replaceLine } from './ccsds-examples';

function refusal(text: string): OrbitMessageError {
  try {
    readOrbitMessage(text);
  } catch (e) {
    if (e instanceof OrbitMessageError) return e;
    throw e;
  }
  throw new Error('the message was accepted');
}

const OPM_G1_EME2000 = replaceLine(OPM_G1, 8, 'REF_FRAME = EME2000');

describe('OPM, KVN (502.0-B-3 annex G2 first example)', () => {
  it('refuses the example as published: its REF_FRAME ITRF2000 is an Earth-fixed frame the engine does not convert (line 8)', () => {
    const e = refusal(OPM_G1);
    expect([e.line, e.keyword]).toEqual([8, 'REF_FRAME']);
    expect(e.message).toMatch(/line 8, REF_FRAME: "ITRF2000" is not accepted: only EME2000, TOD, TEME/);
  });

  it('reads it with REF_FRAME EME2000: header, metadata, state and spacecraft parameters as written (exact)', () => {
    const m = readOrbitMessage(OPM_G1_EME2000) as OrbitParameterMessage;
    expect(m.type).toBe('OPM');
    expect(m.header).toMatchObject({ version: '3.0', creationDate: '2022-11-06T09:23:57', originator: 'JAXA' });
    expect(m.metadata).toMatchObject({
      objectName: 'OSPREY 5',
      objectId: '1998-999A',
      refFrame: 'EME2000',
      timeSystem: 'UTC',
    });
    expect(m.state.epochText).toBe('2022-12-18T14:28:15.1172');
    expect(m.state.epoch.toISOString()).toBe('2022-12-18T14:28:15.117Z');
    expect(m.state.positionKm).toEqual([6503.514, 1239.647, -717.49]);
    expect(m.state.velocityKmS).toEqual([-0.87316, 8.74042, -4.191076]);
    expect(m.spacecraft).toEqual({
      massKg: 3000,
      solarRadAreaM2: 18.77,
      solarRadCoeff: 1,
      dragAreaM2: 18.77,
      dragCoeff: 2.5,
    });
    expect(m.keplerian).toBeNull();
  });
});

describe('OPM with Keplerian elements and manoeuvres (502.0-B-2 §3 second example, from memory)', () => {
  it('reads units in brackets, the elements, and lists the two manoeuvres as not applied', () => {
    const m = readOrbitMessage(OPM_KEPLERIAN) as OrbitParameterMessage;
    expect(m.metadata.refFrame).toBe('TOD');
    expect(m.keplerian).toMatchObject({
      semiMajorAxisKm: 41399.5123,
      eccentricity: 0.020842611,
      anomaly: { kind: 'true', deg: 41.922339 },
      gmKm3S2: 398600.4415,
    });
    expect(m.notUsed).toEqual(['2 manoeuvres (not applied)']);
  });

  it("its state vector gives its own Keplerian elements (our state-to-elements with the message's GM): a within 0.01 km, e within 1e-6, angles within 1e-4 deg", () => {
    const m = readOrbitMessage(OPM_KEPLERIAN) as OrbitParameterMessage;
    const k = m.keplerian!;
    const el = stateToElements({ positionKm: m.state.positionKm, velocityKmS: m.state.velocityKmS }, k.gmKm3S2);
    const deg = (r: number) => (r * 180) / Math.PI;
    expect(Math.abs(el.aKm - k.semiMajorAxisKm)).toBeLessThan(0.01);
    expect(Math.abs(el.e - k.eccentricity)).toBeLessThan(1e-6);
    expect(Math.abs(deg(el.iRad) - k.inclinationDeg)).toBeLessThan(1e-4);
    expect(Math.abs(deg(el.raanRad) - k.raanDeg)).toBeLessThan(1e-4);
  });

  it('refuses a Keplerian block without GM, naming GM and the block', () => {
    const e = refusal(OPM_KEPLERIAN.replace(/^GM = .*$/m, ''));
    expect(e.keyword).toBe('GM');
    expect(e.message).toMatch(/all or none/);
  });

  it('refuses a manoeuvre without MAN_DV_3 in the second block', () => {
    const e = refusal(OPM_KEPLERIAN.replace('MAN_DV_3 = 0.00000000 [km/s]', ''));
    expect(e.keyword).toBe('MAN_DV_3');
  });
});

describe('OEM, KVN (502.0-B-3 annex G6)', () => {
  it('refuses the example as published: a Mars-centred ephemeris (line 8, CENTER_NAME)', () => {
    const e = refusal(OEM_G6);
    expect([e.line, e.keyword]).toEqual([8, 'CENTER_NAME']);
    expect(e.message).toMatch(/only EARTH/);
  });

  it('with CENTER_NAME EARTH it reads on to the first data line and refuses its state: 3303 km from the centre is inside the Earth (line 21, X)', () => {
    const earth = OEM_G6.replace(/MARS BARYCENTER/g, 'EARTH');
    const e = refusal(earth);
    expect([e.line, e.keyword]).toEqual([21, 'X']);
    expect(e.message).toMatch(/inside the Earth/);
  });

  it('reads both segments, metadata and epochs when its states are scaled to an Earth orbit (positions × 3; structure as published)', () => {
    const earth = OEM_G6.replace(/MARS BARYCENTER/g, 'EARTH').replace(
      /^(\S+T\S+) (\S+) (\S+) (\S+)/gm,
      (_, t, x, y, z) => `${t} ${Number(x) * 3} ${Number(y) * 3} ${Number(z) * 3}`,
    );
    const m = readOrbitMessage(earth) as OrbitEphemerisMessage;
    expect(m.segments).toHaveLength(2);
    expect(m.segments[0].metadata).toMatchObject({
      objectName: 'MARS GLOBAL SURVEYOR',
      startTime: '2019-12-18T12:00:00.331',
      interpolation: 'HERMITE',
      interpolationDegree: 7,
      useableStopTime: '2019-12-28T21:23:00.331',
    });
    expect(m.segments.map((s) => s.states.length)).toEqual([4, 4]);
    expect(m.segments[1].states[0].velocityKmS).toEqual([7.33702, -3.495867, -1.041945]);
    expect(m.segments[0].states[1].epoch.toISOString()).toBe('2019-12-18T12:01:00.331Z');
  });

  it('refuses epochs that do not increase, naming the line', () => {
    const earth = OEM_G6.replace(/MARS BARYCENTER/g, 'EARTH').replace(
      /^(\S+T\S+) (\S+) (\S+) (\S+)/gm,
      (_, t, x, y, z) => `${t} ${Number(x) * 3} ${Number(y) * 3} ${Number(z) * 3}`,
    );
    const swapped = replaceLine(earth, 23, earth.split('\n')[23]);
    const e = refusal(swapped);
    expect([e.line, e.keyword]).toEqual([24, 'EPOCH']);
  });
});

describe('what is refused, with line and keyword', () => {
  it('an OMM (502.0-B-3 annex G4): not an OPM or OEM', () => {
    const e = refusal(OMM_G4);
    expect([e.line, e.keyword]).toEqual([1, 'CCSDS_OMM_VERS']);
  });

  it.each([
    [
      'a missing mandatory header keyword',
      removeLine(OPM_G1_EME2000, 3),
      'ORIGINATOR',
      /missing: it is mandatory in the OPM header/,
    ],
    ['a missing mandatory metadata keyword', removeLine(OPM_G1_EME2000, 6), 'OBJECT_ID', /missing/],
    ['a missing state component', removeLine(OPM_G1_EME2000, 15), 'Y_DOT', /missing/],
    [
      'a unit other than the standard one',
      replaceLine(OPM_G1_EME2000, 11, 'X = 6503514.0 [m]'),
      'X',
      /line 11, X: unit \[m\] where the standard requires \[km\]/,
    ],
    [
      'a value that is not a number',
      replaceLine(OPM_G1_EME2000, 12, 'Y = 12,39.647'),
      'Y',
      /line 12, Y: "12,39.647" is not a number/,
    ],
    [
      'a malformed epoch',
      replaceLine(OPM_G1_EME2000, 10, 'EPOCH = 2022-12-18 14:28:15'),
      'EPOCH',
      /line 10, EPOCH: .* is not a CCSDS epoch/,
    ],
    [
      'an impossible date',
      replaceLine(OPM_G1_EME2000, 10, 'EPOCH = 2022-02-30T00:00:00'),
      'EPOCH',
      /not a calendar date/,
    ],
    [
      'a keyword twice',
      replaceLine(OPM_G1_EME2000, 13, 'X = 1.0'),
      'X',
      /line 13, X: appears a second time \(first on line 11\)/,
    ],
    [
      'a keyword the OPM does not have',
      replaceLine(OPM_G1_EME2000, 17, 'WET_MASS = 3000'),
      'WET_MASS',
      /not a keyword of the OPM/,
    ],
    [
      'a header keyword after the metadata',
      replaceLine(OPM_G1_EME2000, 17, 'MESSAGE_ID = 42'),
      'MESSAGE_ID',
      /belongs in the header/,
    ],
    ['TIME_SYSTEM TAI (not converted)', replaceLine(OPM_G1_EME2000, 9, 'TIME_SYSTEM = TAI'), 'TIME_SYSTEM', /only UTC/],
    ['REF_FRAME GCRF', replaceLine(OPM_G1_EME2000, 8, 'REF_FRAME = GCRF'), 'REF_FRAME', /only EME2000, TOD, TEME/],
    ['a negative mass', replaceLine(OPM_G1_EME2000, 17, 'MASS = -3 [kg]'), 'MASS', /below the accepted range/],
    [
      'a line that is neither keyword nor data',
      replaceLine(OPM_G1_EME2000, 4, 'GEOCENTRIC, CARTESIAN'),
      null,
      /expected "KEYWORD = value"/,
    ],
    [
      'a lower-case keyword',
      replaceLine(OPM_G1_EME2000, 17, 'mass = 3000'),
      null,
      /not a keyword: keywords are upper-case/,
    ],
  ])('%s', (_what, text, keyword, message) => {
    const e = refusal(text);
    expect(e.keyword).toBe(keyword);
    expect(e.line).toBeGreaterThan(0);
    expect(e.message).toMatch(message);
  });

  it('a message over the size limit, before anything is parsed', () => {
    const e = refusal(`CCSDS_OPM_VERS = 2.0\n${'COMMENT x\n'.repeat(ORBIT_MESSAGE_LIMITS.maxChars / 10)}`);
    expect(e.line).toBe(0);
    expect(e.message).toMatch(/at most 400000 are accepted/);
  });

  it('an empty message', () => {
    expect(refusal('  \n ').message).toMatch(/empty/);
  });
});

/** The OPM of annex G2 in the NDM/XML encoding (CCSDS 505.0-B element names, written from memory), REF_FRAME EME2000. */
const OPM_XML = `<?xml version="1.0" encoding="UTF-8"?>
<opm id="CCSDS_OPM_VERS" version="2.0">
  <header>
    <CREATION_DATE>2022-11-06T09:23:57</CREATION_DATE>
    <ORIGINATOR>JAXA</ORIGINATOR>
  </header>
  <body>
    <segment>
      <metadata>
        <OBJECT_NAME>OSPREY 5</OBJECT_NAME>
        <OBJECT_ID>1998-999A</OBJECT_ID>
        <CENTER_NAME>EARTH</CENTER_NAME>
        <REF_FRAME>EME2000</REF_FRAME>
        <TIME_SYSTEM>UTC</TIME_SYSTEM>
      </metadata>
      <data>
        <stateVector>
          <EPOCH>2022-12-18T14:28:15.1172</EPOCH>
          <X units="km">6503.514000</X>
          <Y units="km">1239.647000</Y>
          <Z units="km">-717.490000</Z>
          <X_DOT units="km/s">-0.873160</X_DOT>
          <Y_DOT units="km/s">8.740420</Y_DOT>
          <Z_DOT units="km/s">-4.191076</Z_DOT>
        </stateVector>
        <spacecraftParameters>
          <MASS units="kg">3000.000000</MASS>
        </spacecraftParameters>
      </data>
    </segment>
  </body>
</opm>
`;

describe('XML encoding', () => {
  it('reads the same OPM as the KVN form', () => {
    const xml = readOrbitMessage(OPM_XML) as OrbitParameterMessage;
    const kvn = readOrbitMessage(OPM_G1_EME2000) as OrbitParameterMessage;
    expect(xml.encoding).toBe('xml');
    expect(xml.state).toEqual({ ...kvn.state, line: 18 });
    expect(xml.metadata).toEqual({ ...kvn.metadata, comments: [] });
  });

  it('names the line of the element: a wrong unit on <Y> (line 20)', () => {
    const e = refusal(OPM_XML.replace('<Y units="km">', '<Y units="m">'));
    expect([e.line, e.keyword]).toEqual([20, 'Y']);
  });

  it('refuses a DOCTYPE (entity expansion) before parsing', () => {
    const bomb = OPM_XML.replace(
      '<opm',
      '<!DOCTYPE opm [<!ENTITY a "aaaaaaaaaa"><!ENTITY b "&a;&a;&a;&a;">]>\n<opm',
    ).replace('JAXA', '&b;');
    const e = refusal(bomb);
    expect(e.line).toBe(2);
    expect(e.message).toMatch(/DOCTYPE/);
  });

  it("refuses deep nesting: by our depth limit with its line, and past the parser's own limit as a refusal, never an unexpected error", () => {
    const nested = OPM_XML.replace('<X units="km">6503.514000</X>', '<X><a><b><c><d>1</d></c></b></a></X>');
    const e = refusal(nested);
    expect([e.line, e.keyword]).toEqual([19, 'b']);
    const n = 50_000;
    expect(refusal(`<opm version="2.0">${'<a>'.repeat(n)}1${'</a>'.repeat(n)}</opm>`).message).toMatch(
      /could not be read|nested/,
    );
  });

  it('refuses XML that is not well formed, naming the line', () => {
    const e = refusal(OPM_XML.replace('</ORIGINATOR>', '</ORIGINATR>'));
    expect(e.line).toBe(5);
    expect(e.message).toMatch(/not well formed/);
  });

  it('reads an OEM with two states and a missing mandatory STOP_TIME is named', () => {
    const oem = `<oem id="CCSDS_OEM_VERS" version="2.0"><header><CREATION_DATE>2026-01-01T00:00:00</CREATION_DATE><ORIGINATOR>X</ORIGINATOR></header>
<body><segment><metadata><OBJECT_NAME>T</OBJECT_NAME><OBJECT_ID>2026-001A</OBJECT_ID><CENTER_NAME>EARTH</CENTER_NAME><REF_FRAME>EME2000</REF_FRAME><TIME_SYSTEM>UTC</TIME_SYSTEM>
<START_TIME>2026-01-01T00:00:00</START_TIME><STOP_TIME>2026-01-01T00:01:00</STOP_TIME></metadata>
<data><stateVector><EPOCH>2026-01-01T00:00:00</EPOCH><X>7000</X><Y>0</Y><Z>0</Z><X_DOT>0</X_DOT><Y_DOT>7.5</Y_DOT><Z_DOT>0</Z_DOT></stateVector>
<stateVector><EPOCH>2026-01-01T00:01:00</EPOCH><X>6998</X><Y>450</Y><Z>0</Z><X_DOT>-0.5</X_DOT><Y_DOT>7.48</Y_DOT><Z_DOT>0</Z_DOT></stateVector></data></segment></body></oem>`;
    const m = readOrbitMessage(oem) as OrbitEphemerisMessage;
    expect(m.segments[0].states.map((s) => s.positionKm[0])).toEqual([7000, 6998]);
    const e = refusal(oem.replace('<STOP_TIME>2026-01-01T00:01:00</STOP_TIME>', ''));
    expect(e.keyword).toBe('STOP_TIME');
  });
});
