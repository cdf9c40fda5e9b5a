import {
  ORBIT_MESSAGE_LIMITS,
  OrbitMessageError,
  type EpochState,
  type KvnItem,
  type OemSegment,
  type OrbitEphemerisMessage,
  type OrbitMessageEncoding,
} from './orbit-message-types';
import { collectKeywords, requireEntry } from './collect-keywords';
import { checkVersionFirst, HEADER_KEYWORDS, readMessageHeader } from './read-message-header';
import { METADATA_KEYWORDS, readOrbitMetadata } from './read-orbit-metadata';
import { readOemDataLine } from './read-epoch-state';
import { parseCcsdsEpoch } from './parse-ccsds-epoch';
import { readNumberText } from './read-kvn-number';

const OEM_METADATA = new Set<string>([
  ...METADATA_KEYWORDS,
  'START_TIME',
  'USEABLE_START_TIME',
  'USEABLE_STOP_TIME',
  'STOP_TIME',
  'INTERPOLATION',
  'INTERPOLATION_DEGREE',
]);

/**
 * Builds and checks an OEM from its items (KVN lines or XML elements mapped to
 * them), CCSDS 502.0-B-3 §5: a header, then one or more segments, each a
 * metadata block between META_START and META_STOP (OBJECT_NAME, OBJECT_ID,
 * CENTER_NAME, REF_FRAME, TIME_SYSTEM, START_TIME, STOP_TIME mandatory) followed
 * by ephemeris data lines, optionally by a covariance block between
 * COVARIANCE_START and COVARIANCE_STOP (checked for numbers, not used). Within a
 * segment the epochs increase and lie between START_TIME and STOP_TIME.
 */
export function buildOrbitEphemerisMessage(items: KvnItem[], encoding: OrbitMessageEncoding): OrbitEphemerisMessage {
  checkVersionFirst(items, 'CCSDS_OEM_VERS');
  const firstMeta = items.findIndex((i) => i.kind === 'keyword' && i.keyword === 'META_START');
  const headerItems = firstMeta < 0 ? items : items.slice(0, firstMeta);
  const [header] = collectKeywords(
    headerItems,
    [{ name: 'header', keywords: HEADER_KEYWORDS('CCSDS_OEM_VERS') }],
    'OEM',
  );
  const messageHeader = readMessageHeader(header, 'CCSDS_OEM_VERS', 'OEM');
  if (firstMeta < 0)
    throw new OrbitMessageError(
      items.at(-1)?.line ?? 0,
      'META_START',
      'is missing: an OEM has at least one segment starting with META_START',
    );

  const segments: OemSegment[] = [];
  const notUsed: string[] = [];
  let stateCount = 0;
  let i = firstMeta;
  while (i < items.length) {
    const start = items[i];
    if (start.kind !== 'keyword' || start.keyword !== 'META_START')
      throw new OrbitMessageError(start.line, start.kind === 'keyword' ? start.keyword : null, 'expected META_START');
    if (segments.length >= ORBIT_MESSAGE_LIMITS.maxSegments)
      throw new OrbitMessageError(start.line, 'META_START', `more than ${ORBIT_MESSAGE_LIMITS.maxSegments} segments`);
    const stop = items.findIndex(
      (it, k) => k > i && it.kind === 'keyword' && (it.keyword === 'META_STOP' || it.keyword === 'META_START'),
    );
    if (stop < 0 || (items[stop] as { keyword: string }).keyword !== 'META_STOP')
      throw new OrbitMessageError(
        start.line,
        'META_STOP',
        `is missing: the metadata from line ${start.line} is not closed`,
      );
    const metaItems = items.slice(i + 1, stop);
    const [meta] = collectKeywords(
      metaItems.length ? metaItems : [],
      [{ name: 'segment metadata', keywords: OEM_METADATA }],
      'OEM',
    );
    if (meta.line === 0) meta.line = start.line;
    const metadata = readOrbitMetadata(meta, 'OEM');
    const startTime = requireEntry(meta, 'START_TIME', 'OEM');
    const stopTime = requireEntry(meta, 'STOP_TIME', 'OEM');
    const startDate = parseCcsdsEpoch(startTime.value, startTime.line, 'START_TIME');
    const stopDate = parseCcsdsEpoch(stopTime.value, stopTime.line, 'STOP_TIME');
    if (stopDate < startDate)
      throw new OrbitMessageError(stopTime.line, 'STOP_TIME', `is before START_TIME (line ${startTime.line})`);
    for (const k of ['USEABLE_START_TIME', 'USEABLE_STOP_TIME']) {
      const entry = meta.entries.get(k);
      if (entry) {
        const d = parseCcsdsEpoch(entry.value, entry.line, k);
        if (d < startDate || d > stopDate)
          throw new OrbitMessageError(entry.line, k, 'lies outside START_TIME … STOP_TIME');
      }
    }
    const degree = meta.entries.get('INTERPOLATION_DEGREE');
    const interpolationDegree = degree ? readNumberText(degree.value, degree.line, 'INTERPOLATION_DEGREE') : null;
    if (
      degree &&
      interpolationDegree !== null &&
      (!Number.isInteger(interpolationDegree) || interpolationDegree < 1 || interpolationDegree > 32)
    ) {
      throw new OrbitMessageError(degree.line, 'INTERPOLATION_DEGREE', 'must be an integer from 1 to 32');
    }

    const states: EpochState[] = [];
    let k = stop + 1;
    let inCovariance = false;
    let covarianceLine = 0;
    for (; k < items.length; k++) {
      const item = items[k];
      if (item.kind === 'keyword') {
        if (item.keyword === 'META_START' && !inCovariance) break;
        if (item.keyword === 'COMMENT') continue;
        if (item.keyword === 'COVARIANCE_START' && !inCovariance) {
          inCovariance = true;
          covarianceLine = item.line;
          continue;
        }
        if (item.keyword === 'COVARIANCE_STOP' && inCovariance) {
          inCovariance = false;
          notUsed.push(`covariance of the segment at line ${start.line} (not used)`);
          continue;
        }
        if (
          inCovariance &&
          (item.keyword === 'EPOCH' || item.keyword === 'COV_REF_FRAME' || /^C[XYZ]/.test(item.keyword))
        ) {
          // EPOCH and COV_REF_FRAME lines (KVN), or each term as an element (XML).
          if (item.keyword === 'EPOCH') parseCcsdsEpoch(item.value, item.line, 'EPOCH');
          else if (item.keyword !== 'COV_REF_FRAME') readNumberText(item.value, item.line, item.keyword);
          continue;
        }
        throw new OrbitMessageError(
          item.line,
          item.keyword,
          inCovariance ? 'is not a keyword of an OEM covariance block' : 'cannot stand among the ephemeris data lines',
        );
      }
      if (inCovariance) {
        item.fields.forEach((f) => readNumberText(f, item.line, 'covariance'));
        continue;
      }
      const state = readOemDataLine(item.line, item.fields);
      const previous = states.at(-1);
      if (previous && state.epoch.getTime() <= previous.epoch.getTime())
        throw new OrbitMessageError(
          item.line,
          'EPOCH',
          `${state.epochText} does not follow ${previous.epochText} (line ${previous.line}): epochs must increase`,
        );
      if (state.epoch < startDate || state.epoch > stopDate)
        throw new OrbitMessageError(
          item.line,
          'EPOCH',
          `${state.epochText} lies outside START_TIME … STOP_TIME of this segment`,
        );
      if (++stateCount > ORBIT_MESSAGE_LIMITS.maxStates)
        throw new OrbitMessageError(item.line, null, `more than ${ORBIT_MESSAGE_LIMITS.maxStates} ephemeris lines`);
      states.push(state);
    }
    if (inCovariance)
      throw new OrbitMessageError(
        covarianceLine,
        'COVARIANCE_STOP',
        `is missing: the covariance block from line ${covarianceLine} is not closed`,
      );
    if (states.length === 0)
      throw new OrbitMessageError(items[stop].line, null, 'the segment has no ephemeris data lines after META_STOP');
    segments.push({
      metadata: {
        ...metadata,
        startTime: startTime.value,
        stopTime: stopTime.value,
        useableStartTime: meta.entries.get('USEABLE_START_TIME')?.value ?? null,
        useableStopTime: meta.entries.get('USEABLE_STOP_TIME')?.value ?? null,
        interpolation: meta.entries.get('INTERPOLATION')?.value ?? null,
        interpolationDegree,
      },
      states,
      line: start.line,
    });
    i = k;
  }
  return { type: 'OEM', encoding, header: messageHeader, segments, notUsed };
}
