import { EARTH_MU_KM3_S2, engineVersion } from '../calc/constants';
import { stateToElements } from '../calc/topics/kepler-state';
import { toDeg } from '../calc/topics/angles';
import { frameRotation, transformState } from '../calc/topics/reference-frames';
import { propagateEphemeris } from '../calc/topics/propagation/propagate-ephemeris';
import type { Vec3 } from './orbit-message-types';
import type { DatedState } from './read-state-result';
import { writeOemKvn, writeOpmKvn, type OrbitMessageIdentity } from './write-orbit-message-kvn';

/** Who and what a message describes; the frame is always EME2000 (the state is rotated from true of date). */
export type MessageSubject = Omit<OrbitMessageIdentity, 'refFrame'>;

/** The ephemeris delivered with a frozen revision: one day of states every 60 s. */
export const DESIGN_OEM_SPAN_SEC = 86_400;
export const DESIGN_OEM_STEP_SEC = 60;

/** Lines that say, in every message we write, what the numbers are and where they come from (checkable sources only). */
export const MESSAGE_PROVENANCE = [
  `Computed by Nodewright (${engineVersion}) for preliminary design: verify with high-fidelity tools before use.`,
  'Frame: EME2000, rotated from true of date at the epoch with the IAU 1976 precession and IAU 1980 nutation models (Vallado, Fundamentals of Astrodynamics and Applications, 4th ed., 2013), UT1 = UTC.',
];

const rotate = (m: number[][], v: Vec3): Vec3 =>
  [0, 1, 2].map((r) => m[r][0] * v[0] + m[r][1] * v[1] + m[r][2] * v[2]) as Vec3;

/**
 * The OPM of a dated true-of-date state: the state rotated to EME2000 at its
 * epoch, with its osculating Keplerian elements in EME2000 (Vallado RV2COE,
 * GM of EGM-96 as the engine's constants) — CCSDS 502.0-B.
 */
export function writeStateOpm(subject: MessageSubject, state: DatedState): string {
  const eme = transformState(
    { positionKm: state.positionKm, velocityKmS: state.velocityKmS },
    'TOD',
    'EME2000',
    state.epoch,
  );
  const positionKm = [...eme.positionKm] as Vec3;
  const velocityKmS = [...eme.velocityKmS] as Vec3;
  const el = stateToElements({ positionKm, velocityKmS });
  return writeOpmKvn(
    { ...subject, refFrame: 'EME2000', comments: [...subject.comments, ...MESSAGE_PROVENANCE] },
    { epoch: state.epoch, positionKm, velocityKmS },
    {
      semiMajorAxisKm: el.aKm,
      eccentricity: el.e,
      inclinationDeg: toDeg(el.iRad),
      raanDeg: toDeg(el.raanRad),
      argPericenterDeg: toDeg(el.argPerigeeRad),
      meanAnomalyDeg: toDeg(el.meanAnomalyRad),
      gmKm3S2: EARTH_MU_KM3_S2,
    },
  );
}

/**
 * The OEM of the numerical check of a dated state: Cowell propagation with
 * zonal harmonics J2…J6 and DOP853 (propagate-ephemeris) over DESIGN_OEM_SPAN_SEC
 * every DESIGN_OEM_STEP_SEC in the true-of-date frame of the epoch, each state
 * rotated to EME2000 with the rotation at the epoch.
 */
export function writeStateOem(subject: MessageSubject, state: DatedState): string {
  const samples = propagateEphemeris(state, { spanSec: DESIGN_OEM_SPAN_SEC, stepSec: DESIGN_OEM_STEP_SEC });
  const m = frameRotation('TOD', 'EME2000', state.epoch);
  const comments = [
    ...subject.comments,
    'States: Cowell propagation of the design state with zonal harmonics J2 to J6 (EGM-96) and the Dormand-Prince 8(5,3) integrator (Hairer, Norsett and Wanner, Solving Ordinary Differential Equations I, 2nd ed.); no drag, third bodies or tesseral harmonics.',
    ...MESSAGE_PROVENANCE,
  ];
  return writeOemKvn(
    { ...subject, refFrame: 'EME2000', comments },
    samples.map((s) => ({
      epoch: new Date(state.epoch.getTime() + s.tSec * 1000),
      positionKm: rotate(m, s.positionKm),
      velocityKmS: rotate(m, s.velocityKmS),
    })),
  );
}
