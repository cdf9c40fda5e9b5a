import { OrbitMessageError, type OrbitDataMessage } from './orbit-message-types';
import { readKvnItems } from './read-kvn-items';
import { readOrbitMessageXml } from './read-orbit-message-xml';
import { buildOrbitParameterMessage } from './build-orbit-parameter-message';
import { buildOrbitEphemerisMessage } from './build-orbit-ephemeris-message';

/**
 * Reads a CCSDS Orbit Parameter Message or Orbit Ephemeris Message (502.0-B),
 * in KVN or XML (told apart by a leading "<"), checking what the standard makes
 * mandatory, the units in brackets, value ranges and epochs, and what the engine
 * accepts (CENTER_NAME EARTH; REF_FRAME EME2000, TOD or TEME; TIME_SYSTEM UTC).
 * Pure: nothing is executed or fetched. Throws OrbitMessageError naming the line
 * and keyword of the first problem.
 */
export function readOrbitMessage(text: string): OrbitDataMessage {
  if (typeof text !== 'string' || text.trim() === '') throw new OrbitMessageError(0, null, 'the message is empty');
  if (text.trimStart().startsWith('<')) {
    const { type, items } = readOrbitMessageXml(text);
    return type === 'OPM' ? buildOrbitParameterMessage(items, 'xml') : buildOrbitEphemerisMessage(items, 'xml');
  }
  const items = readKvnItems(text);
  const first = items.find((i) => i.kind === 'data' || i.keyword !== 'COMMENT') ?? items[0];
  const keyword = first.kind === 'keyword' ? first.keyword : null;
  if (keyword === 'CCSDS_OPM_VERS') return buildOrbitParameterMessage(items, 'kvn');
  if (keyword === 'CCSDS_OEM_VERS') return buildOrbitEphemerisMessage(items, 'kvn');
  throw new OrbitMessageError(
    first.line,
    keyword,
    `${keyword ? `${keyword} starts` : 'this starts'} a message that is not accepted: an OPM starts with CCSDS_OPM_VERS, an OEM with CCSDS_OEM_VERS`,
  );
}
