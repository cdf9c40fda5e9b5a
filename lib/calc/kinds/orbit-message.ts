import { stringField } from '../fields';
import { REF } from '../references';
import { defineKind } from '../registry';
import { CalcInputError, type CalcOutputField } from '../types';
import { EARTH_RADIUS_KM } from '../constants';
import { meanElementsOfState } from '../topics/mean-elements-of-state';
import { readOrbitMessage } from '../../orbit-data/read-orbit-message';
import { ORBIT_MESSAGE_LIMITS, OrbitMessageError, type EpochState } from '../../orbit-data/orbit-message-types';
import { numOut, theory, THEORY_OUTPUT, theoryNotes } from './common';
import { elementOutputs, elementValues, elementWarnings, MEAN_OSCULATING_REFERENCES } from './mean-to-osculating';

const text = (name: string, label: string): CalcOutputField => ({
  name,
  label,
  unit: null,
  precision: 0,
  type: 'string',
});
const vector = (name: string, label: string, unit: string, precision: number): CalcOutputField => ({
  name,
  label,
  unit,
  precision,
  type: 'vector',
});

/**
 * Import of a CCSDS Orbit Parameter Message or Orbit Ephemeris Message (502.0-B,
 * KVN or XML) as the input of a memo: the message is read and checked
 * (lib/orbit-data), its state — the OPM's, or the first of the OEM's first segment —
 * is rotated to true of date at its epoch and turned into mean elements of the
 * engine's theory, which other blocks can be fed from.
 */
export const orbitMessageKind = defineKind({
  kind: 'orbit-message',
  title: 'Orbit data message (CCSDS OPM / OEM)',
  summary:
    "Mean elements of the state in a pasted or uploaded CCSDS OPM or OEM (KVN or XML): the launcher's or flight dynamics' orbit as input to the memo.",
  inputs: {
    message: stringField('Orbit data message (OPM or OEM, KVN or XML)', {
      maxLength: ORBIT_MESSAGE_LIMITS.maxChars,
      multiline: true,
      help: 'Paste the message or upload its file. CENTER_NAME EARTH, REF_FRAME EME2000, TOD or TEME, TIME_SYSTEM UTC.',
    }),
    theory: theory(),
  },
  outputs: [
    text('messageType', 'Message'),
    text('objectName', 'Object name'),
    text('objectId', 'Object ID'),
    text('epoch', 'Epoch of the state (UTC)'),
    text('refFrame', 'Frame of the message'),
    vector('positionKm', 'Position (true-of-date equatorial)', 'km', 4),
    vector('velocityKmS', 'Velocity (true-of-date equatorial)', 'km/s', 7),
    ...elementOutputs('osc', 'Osculating'),
    ...elementOutputs('mean', 'Mean'),
    numOut('meanAltitudeKm', 'Mean altitude (mean a − equatorial radius)', 'km', 3),
    { name: 'states', label: 'States in the message', unit: null, precision: 0, type: 'integer' },
    numOut('spanHours', 'Span of the ephemeris', 'h', 3),
    THEORY_OUTPUT,
  ],
  model: {
    method:
      "CCSDS OPM/OEM read and checked (mandatory keywords, units, ranges, epochs); the state (OPM) or the first state of the first segment (OEM) rotated from the message's frame to true of date at its epoch (IAU-76/80 precession and nutation), converted to osculating elements and to mean elements by removing the first-order J2 short-period terms.",
    assumptions: [
      'Accepted: CENTER_NAME EARTH; REF_FRAME EME2000, TOD or TEME; TIME_SYSTEM UTC (other frames and time systems are refused, not converted). Covariance, manoeuvres and spacecraft parameters are read but not used.',
      'An OEM gives its first state; later states are counted, not fitted. Epochs are kept to the millisecond; UT1 = UTC in the frame rotation.',
      'Mean elements as in osculating-to-mean: first-order J2 short-period terms only (second-order and J3–J6 short-period terms, tens of metres in a in LEO, stay in the mean elements); elliptic orbits with e below 0.5 and perigee above 100 km.',
      "Frame: the outputs are true of date (equator and equinox of the epoch), the frame the engine's kinds take.",
    ],
    references: [REF.ccsdsOdm, ...MEAN_OSCULATING_REFERENCES],
  },
  compute(v) {
    let message;
    try {
      message = readOrbitMessage(v.message);
    } catch (e) {
      if (e instanceof OrbitMessageError) throw new CalcInputError('message', e.message);
      throw e;
    }
    let state: EpochState;
    let states = 1;
    let spanHours = 0;
    let meta;
    if (message.type === 'OPM') {
      state = message.state;
      meta = message.metadata;
    } else {
      const first = message.segments[0];
      state = first.states[0];
      meta = first.metadata;
      const all = message.segments.flatMap((s) => s.states);
      states = all.length;
      spanHours = (all[all.length - 1].epoch.getTime() - all[0].epoch.getTime()) / 3_600_000;
    }
    const el = meanElementsOfState(state, meta.refFrame, state.epoch, 'message', `line ${state.line}`);
    const notUsed = message.notUsed.map((n) => `Read but not used: ${n}.`);
    return {
      outputs: {
        messageType: `${message.type} (${message.encoding.toUpperCase()}, version ${message.header.version})`,
        objectName: meta.objectName,
        objectId: meta.objectId,
        epoch: state.epoch.toISOString(),
        refFrame: meta.refFrame,
        positionKm: el.trueOfDate.positionKm,
        velocityKmS: el.trueOfDate.velocityKmS,
        ...elementValues('osc', el.osculating),
        ...elementValues('mean', el.mean),
        meanAltitudeKm: el.mean.aKm - EARTH_RADIUS_KM,
        states,
        spanHours,
        theory: v.theory,
      },
      warnings: [...elementWarnings(el.mean), ...notUsed],
      modelNotes: theoryNotes(v.theory),
    };
  },
});
