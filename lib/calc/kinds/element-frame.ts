import { enumField, numberField } from '../fields';
import { REF } from '../references';
import { FRAME_NAMES } from '../frame-names';
import { defineKind } from '../registry';
import { REFERENCE_FRAMES, transformOrbitPlane, type ReferenceFrame } from '../topics/reference-frames';
import { epoch, numOut } from './common';
import { epochDate } from './node-local-time';

/** The simplifications of the frame module, in the words of a model note. */
export const FRAME_ASSUMPTIONS = [
  "No Earth-orientation corrections: the observed offsets of the celestial pole from the IAU-1980 nutation (δΔψ, δΔε, tens of milliarcseconds; −0.052″ and −0.004″ in Vallado's Example 3-15) are left out — about 1.5e-5° in inclination or RAAN, 1.7 m at 7000 km.",
  'TT is taken equal to UTC (TT − UTC ≈ 69 s) and UT1 does not enter (no Earth rotation between these frames): below 1e-4″.',
  'EME2000 is the IAU-76/FK5 mean equator and equinox of J2000.0, without the ≈ 0.02″ frame bias to the GCRF.',
  'TEME uses the equation of the equinoxes Δψ cos ε̄ without the two terms added in 1997 (at most 0.0027″), as SGP4 does.',
];

function signedDifferenceDeg(a: number, b: number): number {
  return ((((a - b + 180) % 360) + 360) % 360) - 180;
}

export const elementFrameKind = defineKind({
  kind: 'element-frame',
  title: 'Orbit plane in another frame',
  summary:
    "Inclination and RAAN of an orbit plane expressed in EME2000 (J2000), true of date or TEME, converted to another of these frames at an epoch — e.g. a launcher's EME2000 elements into the frame of date that the design kinds expect.",
  inputs: {
    epoch: epoch('Epoch (UTC)', '2027-01-01T00:00:00Z'),
    fromFrame: enumField(
      'Frame the elements are given in',
      REFERENCE_FRAMES,
      'EME2000',
      REFERENCE_FRAMES.map((f) => `${f}: ${FRAME_NAMES[f].long}`).join('; '),
    ),
    toFrame: enumField('Frame to express them in', REFERENCE_FRAMES, 'TOD', 'TOD is the frame the design kinds expect'),
    inclinationDeg: numberField('Inclination (in the “from” frame)', 'deg', { min: 0, max: 180, default: 98.2 }),
    raanDeg: numberField('RAAN (in the “from” frame)', 'deg', { min: 0, max: 360, maxExclusive: true, default: 0 }),
  },
  outputs: [
    numOut('inclinationDeg', 'Inclination (in the “to” frame)', 'deg', 5),
    numOut('raanDeg', 'RAAN (in the “to” frame)', 'deg', 5),
    numOut('inclinationChangeDeg', 'Change of inclination (to − from)', 'deg', 5),
    numOut('raanChangeDeg', 'Change of RAAN (to − from)', 'deg', 5),
  ],
  model: {
    method:
      'The orbit normal (sin i sin Ω, −sin i cos Ω, cos i) is rotated between frames and read back: EME2000 → mean of date by IAU-76 precession (ζ, θ, z), → true of date by IAU-1980 nutation (106 terms; Δψ, Δε, mean obliquity ε̄), → TEME by a turn about z of Δψ cos ε̄.',
    assumptions: [
      ...FRAME_ASSUMPTIONS,
      'For an equatorial plane (i = 0° or 180°) the node is undefined and RAAN is reported as 0.',
    ],
    references: [REF.valladoFk5, REF.lieske1977, REF.seidelmannNutation, REF.valladoTeme],
  },
  compute(v) {
    const date = epochDate(v.epoch);
    const out = transformOrbitPlane(
      { inclinationDeg: v.inclinationDeg, raanDeg: v.raanDeg },
      v.fromFrame as ReferenceFrame,
      v.toFrame as ReferenceFrame,
      date,
    );
    const warnings: string[] = [];
    if (Math.abs(Math.sin((out.inclinationDeg * Math.PI) / 180)) < 1e-3)
      warnings.push('The plane is (nearly) equatorial: its node, and so its RAAN, is ill-defined.');
    return {
      outputs: {
        inclinationDeg: out.inclinationDeg,
        raanDeg: out.raanDeg,
        inclinationChangeDeg: out.inclinationDeg - v.inclinationDeg,
        raanChangeDeg: signedDifferenceDeg(out.raanDeg, v.raanDeg),
      },
      warnings,
    };
  },
});
