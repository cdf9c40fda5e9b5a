import { OrbitMessageError, type EpochState, type KvnEntry, type Vec3 } from './orbit-message-types';
import { readKvnNumber, readNumberText, type NumberRule } from './read-kvn-number';
import { parseCcsdsEpoch } from './parse-ccsds-epoch';

/** WGS-84 polar radius [km] (NIMA TR8350.2): no Earth orbit state lies closer to the centre. */
const MIN_RADIUS_KM = 6356.752;
/** About the Earth's Hill-sphere radius: farther out a state is not an Earth orbit. */
const MAX_RADIUS_KM = 1_500_000;
/** Faster than this no Earth-bound state moves (escape speed at the surface is 11.2 km/s). */
const MAX_SPEED_KM_S = 20;

const POSITION: NumberRule = { unit: 'km', min: -MAX_RADIUS_KM, max: MAX_RADIUS_KM };
const VELOCITY: NumberRule = { unit: 'km/s', min: -MAX_SPEED_KM_S, max: MAX_SPEED_KM_S };

/** Checks the size of a position and velocity, naming the line and the keyword of its first component. */
function checkStateSize(
  positionKm: Vec3,
  velocityKmS: Vec3,
  line: number,
  positionKeyword: string,
  velocityKeyword: string,
): void {
  const r = Math.hypot(...positionKm);
  if (r < MIN_RADIUS_KM)
    throw new OrbitMessageError(
      line,
      positionKeyword,
      `the position is ${r.toFixed(3)} km from the Earth's centre, inside the Earth (polar radius ${MIN_RADIUS_KM} km)`,
    );
  if (r > MAX_RADIUS_KM)
    throw new OrbitMessageError(
      line,
      positionKeyword,
      `the position is ${r.toFixed(0)} km from the Earth's centre, beyond ${MAX_RADIUS_KM} km`,
    );
  const v = Math.hypot(...velocityKmS);
  if (v > MAX_SPEED_KM_S)
    throw new OrbitMessageError(
      line,
      velocityKeyword,
      `the speed is ${v.toFixed(3)} km/s, above ${MAX_SPEED_KM_S} km/s`,
    );
}

/** The OPM state vector block: EPOCH, X, Y, Z [km], X_DOT, Y_DOT, Z_DOT [km/s], all mandatory (502.0-B-3 table 3-3). */
export function readOpmState(get: (keyword: string) => KvnEntry): EpochState {
  const epoch = get('EPOCH');
  const positionKm = (['X', 'Y', 'Z'] as const).map((k) => readKvnNumber(get(k), POSITION)) as Vec3;
  const velocityKmS = (['X_DOT', 'Y_DOT', 'Z_DOT'] as const).map((k) => readKvnNumber(get(k), VELOCITY)) as Vec3;
  checkStateSize(positionKm, velocityKmS, get('X').line, 'X', 'X_DOT');
  return {
    epochText: epoch.value,
    epoch: parseCcsdsEpoch(epoch.value, epoch.line, 'EPOCH'),
    positionKm,
    velocityKmS,
    line: epoch.line,
  };
}

/**
 * An OEM ephemeris data line: epoch, X, Y, Z [km], X_DOT, Y_DOT, Z_DOT [km/s],
 * optionally X_DDOT, Y_DDOT, Z_DDOT [km/s²] (read and not used) — 502.0-B-3 §5 (clause from memory; the layout as in its annex G6 example).
 */
export function readOemDataLine(line: number, fields: string[]): EpochState {
  if (fields.length !== 7 && fields.length !== 10) {
    throw new OrbitMessageError(
      line,
      null,
      `an ephemeris data line has an epoch and 6 numbers (or 9 with accelerations); this one has ${fields.length} fields`,
    );
  }
  const names = ['X', 'Y', 'Z', 'X_DOT', 'Y_DOT', 'Z_DOT', 'X_DDOT', 'Y_DDOT', 'Z_DDOT'];
  const numbers = fields.slice(1).map((f, i) => readNumberText(f, line, names[i]));
  const positionKm = numbers.slice(0, 3) as Vec3;
  const velocityKmS = numbers.slice(3, 6) as Vec3;
  checkStateSize(positionKm, velocityKmS, line, 'X', 'X_DOT');
  return { epochText: fields[0], epoch: parseCcsdsEpoch(fields[0], line, 'EPOCH'), positionKm, velocityKmS, line };
}
