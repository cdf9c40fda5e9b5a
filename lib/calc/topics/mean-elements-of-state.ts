/**
 * Mean elements of an osculating state given in a named frame at an epoch: the
 * state is rotated to the engine's frame (true of date at the epoch, see
 * reference-frames), turned into osculating elements (Vallado 4th ed. RV2COE),
 * then into mean elements by removing the first-order J2 short-period terms
 * (meanOsculating: Kozai 1959, Brouwer 1959, Lyddane 1963).
 * Units km, km/s, rad. Valid for elliptic orbits with e ≤ 0.5 and perigee at least
 * 100 km above the equatorial radius (the range of the mean ↔ osculating kinds).
 */
import { EARTH_RADIUS_KM } from '../constants';
import { CalcInputError } from '../types';
import { stateToElements, type KeplerElements, type StateVector, type Vec3 } from './kepler-state';
import { osculatingToMean } from './mean-osculating';
import { transformState, type ReferenceFrame } from './reference-frames';

export const MIN_PERIGEE_ALTITUDE_KM = 100;
export const MAX_ECCENTRICITY = 0.5;

export interface StateElements {
  /** The state in the true-of-date frame of its epoch. */
  trueOfDate: StateVector;
  osculating: KeplerElements;
  mean: KeplerElements;
}

/** `field` names the input blamed when the state is outside the valid range (with `where`, e.g. "line 12"). */
export function meanElementsOfState(
  state: { positionKm: Vec3; velocityKmS: Vec3 },
  frame: ReferenceFrame,
  epochUtc: Date,
  field: string,
  where: string,
): StateElements {
  const tod = frame === 'TOD' ? state : transformState(state, frame, 'TOD', epochUtc);
  const trueOfDate: StateVector = {
    positionKm: [...tod.positionKm] as Vec3,
    velocityKmS: [...tod.velocityKmS] as Vec3,
  };
  const osculating = stateToElements(trueOfDate);
  if (!(osculating.aKm > 0) || !(osculating.e < MAX_ECCENTRICITY)) {
    throw new CalcInputError(
      field,
      `${where}: the state's osculating orbit has e = ${osculating.e.toFixed(4)}${osculating.aKm > 0 ? '' : ' (not elliptic)'}; mean elements are computed for e below ${MAX_ECCENTRICITY}`,
    );
  }
  const perigeeAltitudeKm = osculating.aKm * (1 - osculating.e) - EARTH_RADIUS_KM;
  if (perigeeAltitudeKm < MIN_PERIGEE_ALTITUDE_KM) {
    throw new CalcInputError(
      field,
      `${where}: the state's osculating perigee is ${perigeeAltitudeKm.toFixed(1)} km above the equatorial radius; mean elements are computed for perigees above ${MIN_PERIGEE_ALTITUDE_KM} km`,
    );
  }
  return { trueOfDate, osculating, mean: osculatingToMean(osculating) };
}
