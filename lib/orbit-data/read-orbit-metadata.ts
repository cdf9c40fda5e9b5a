import {
  ACCEPTED_REF_FRAMES,
  OrbitMessageError,
  type OrbitMessageFrame,
  type OrbitMessageMetadata,
} from './orbit-message-types';
import { requireEntry, type KeywordSection } from './collect-keywords';

export const METADATA_KEYWORDS = [
  'OBJECT_NAME',
  'OBJECT_ID',
  'CENTER_NAME',
  'REF_FRAME',
  'REF_FRAME_EPOCH',
  'TIME_SYSTEM',
] as const;

/**
 * Reads and checks the metadata common to OPM and OEM (502.0-B-3 tables 3-2, 5-2):
 * OBJECT_NAME, OBJECT_ID, CENTER_NAME, REF_FRAME and TIME_SYSTEM are mandatory.
 * The engine models Earth orbits only, so CENTER_NAME must be EARTH; REF_FRAME
 * must be EME2000, TOD or TEME (the frames it converts between; ITRF, GCRF, ICRF …
 * are refused rather than silently treated as one of them); TIME_SYSTEM must be UTC
 * (TAI, TT, GPS … are refused, not converted). REF_FRAME_EPOCH is accepted only
 * for EME2000, where the epoch is part of the frame's definition and so ignored:
 * a TOD or TEME state is taken in the frame of its own epoch.
 */
export function readOrbitMetadata(section: KeywordSection, messageType: string): OrbitMessageMetadata {
  const name = requireEntry(section, 'OBJECT_NAME', messageType);
  const id = requireEntry(section, 'OBJECT_ID', messageType);
  const center = requireEntry(section, 'CENTER_NAME', messageType);
  if (center.value.toUpperCase() !== 'EARTH')
    throw new OrbitMessageError(
      center.line,
      'CENTER_NAME',
      `"${center.value.slice(0, 40)}" is not accepted: only EARTH (the engine models Earth orbits)`,
    );
  const frame = requireEntry(section, 'REF_FRAME', messageType);
  if (!(ACCEPTED_REF_FRAMES as readonly string[]).includes(frame.value)) {
    throw new OrbitMessageError(
      frame.line,
      'REF_FRAME',
      `"${frame.value.slice(0, 40)}" is not accepted: only ${ACCEPTED_REF_FRAMES.join(', ')}`,
    );
  }
  const refFrame = frame.value as OrbitMessageFrame;
  const frameEpoch = section.entries.get('REF_FRAME_EPOCH');
  if (frameEpoch && refFrame !== 'EME2000') {
    throw new OrbitMessageError(
      frameEpoch.line,
      'REF_FRAME_EPOCH',
      `is not accepted with ${refFrame}: give the states in the ${refFrame} frame of their own epoch`,
    );
  }
  const time = requireEntry(section, 'TIME_SYSTEM', messageType);
  if (time.value !== 'UTC')
    throw new OrbitMessageError(
      time.line,
      'TIME_SYSTEM',
      `"${time.value.slice(0, 20)}" is not accepted: only UTC (other time systems are not converted)`,
    );
  return {
    objectName: name.value,
    objectId: id.value,
    centerName: 'EARTH',
    refFrame,
    timeSystem: 'UTC',
    comments: section.comments,
  };
}
