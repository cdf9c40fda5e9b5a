/**
 * The engine's change log, machine-readable: for each engine version, what changed and which outputs of which
 * kinds it can move. Re-verification of a frozen revision (lib/revisions/reverify-revision.ts) reads it to say
 * which engine change moved each number. Add an entry with every bump of `engineVersion` (constants.ts).
 */

export interface EngineChange {
  /** semantic version that introduced the change, e.g. "2.0.0" */
  version: string;
  /** one plain sentence a reviewer can read in a re-verification report */
  reason: string;
  /** kinds whose outputs can move; '*' = every kind */
  kinds: readonly string[] | '*';
  /** outputs that can move; omitted = every output of those kinds */
  outputs?: readonly string[];
}

const RATE_KINDS = [
  'sso-inclination',
  'node-rate',
  'repeat-orbit',
  'repeat-options',
  'injection-sensitivity',
  'sun-geometry',
  'ground-track',
  'coverage',
  'orbit-trade',
  'propagation-check',
] as const;

export const ENGINE_CHANGES: readonly EngineChange[] = [
  {
    version: '1.1.0',
    reason: 'Propagation check: analytic secular a and i added to the element history.',
    kinds: ['propagation-check'],
    outputs: ['history'],
  },
  {
    version: '2.0.0',
    reason:
      'Secular rates now default to the zonal theory (J2 to second order after Brouwer 1959 plus J4 and J6, Brouwer mean elements) instead of first-order J2: sun-synchronous inclinations rise by about 0.018° at 700 km and rates, periods and drifts move with them (theory "j2" reproduces the old numbers).',
    kinds: RATE_KINDS,
  },
  {
    version: '2.0.0',
    reason:
      "One Earth rotation rate everywhere: 7.2921158553e-5 rad/s (the IAU 1982 GMST rate) replaces WGS-84's rounded 7.292115e-5 in the repeat condition, nodal days and ground-track angles, so repeat ground tracks close (about 75 m per 16-day cycle before).",
    kinds: ['repeat-orbit', 'repeat-options', 'coverage', 'orbit-trade', 'ground-track'],
  },
  {
    version: '2.0.0',
    reason:
      'Propagation check starts from the osculating state of the mean elements (not a circular osculating state about 9 km above the mean orbit), integrates zonal harmonics J2…J6 by default and compares with the analytic rate of the same field.',
    kinds: ['propagation-check'],
  },
  {
    version: '2.0.0',
    reason:
      'Frozen orbits: the mean frozen eccentricity now balances the odd zonals J3…J9 against the even-zonal perigee rotation (Cook 1966, averaged equations), about 15 % above the J2–J3 formula for sun-synchronous orbits (kept as eccentricityJ2J3); perigee and apogee heights are now above the WGS-84 ellipsoid.',
    kinds: ['frozen-orbit'],
  },
  {
    version: '2.0.0',
    reason:
      'Eclipses use the conical shadow by default: the eclipse is the time in the umbra (umbra + penumbra reported beside it) instead of a cylinder of the Earth radius, a change of up to about 0.5 min per orbit at high beta angles; eclipse-free days now mean the Sun is never even partly hidden.',
    kinds: ['sun-geometry', 'orbit-trade'],
  },
  {
    version: '2.0.0',
    reason:
      'Altitude conventions added beside the mean altitude: the altitude at the ascending node and the mean height above the WGS-84 ellipsoid (new outputs).',
    kinds: ['sso-inclination', 'repeat-orbit'],
    outputs: ['meanAltitudeKm', 'altitudeAtAscendingNodeKm', 'meanAltitudeAboveEllipsoidKm'],
  },
  {
    version: '2.0.0',
    reason:
      'Drag decay now defaults to NRLMSISE-00 (Picone et al. 2002) averaged around the orbit over dates, with the solar cycle from the start epoch, integrated to re-entry at 120 km; atmosphere "exponential" keeps the former fixed-table lifetimes.',
    kinds: ['drag-decay'],
  },
];

/** [major, minor, patch] of "nodewright-calc X.Y.Z" or "X.Y.Z"; undefined when the text carries no version. */
export function parseEngineVersion(text: string): [number, number, number] | undefined {
  const m = /(\d+)\.(\d+)\.(\d+)\s*$/.exec(text);
  return m ? [Number(m[1]), Number(m[2]), Number(m[3])] : undefined;
}

function compareVersions(a: [number, number, number], b: [number, number, number]): number {
  return a[0] - b[0] || a[1] - b[1] || a[2] - b[2];
}

/**
 * The engine changes after `fromVersion` up to and including `toVersion` that can move output `output`
 * of kind `kind`, as "version: reason" sentences. An unreadable `fromVersion` counts as older than every change.
 */
export function explainMovedOutput(kind: string, output: string, fromVersion: string, toVersion: string): string[] {
  const from = parseEngineVersion(fromVersion);
  const to = parseEngineVersion(toVersion);
  return ENGINE_CHANGES.filter((c) => {
    const v = parseEngineVersion(c.version);
    if (!v) return false;
    if (from && compareVersions(v, from) <= 0) return false;
    if (to && compareVersions(v, to) > 0) return false;
    const kindMatches = c.kinds === '*' || c.kinds.includes(kind);
    return kindMatches && (!c.outputs || c.outputs.includes(output));
  }).map((c) => `${c.version}: ${c.reason}`);
}
