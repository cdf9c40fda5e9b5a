/**
 * Shapes of the CCSDS Orbit Data Messages Nodewright reads and writes: the
 * Orbit Parameter Message (OPM, one state) and the Orbit Ephemeris Message
 * (OEM, states over time) of CCSDS 502.0-B (Orbit Data Messages, Blue Book,
 * issue 2 of 2009 and issue 3 of 2023: §3 OPM, §5 OEM, §7 KVN syntax; XML encoding
 * from memory).
 * Pure data: no framework imports.
 */

export type Vec3 = [number, number, number];

/** Reference frames accepted in REF_FRAME (502.0-B-3 §3.2.3.3 names): the ones the engine converts between. */
export const ACCEPTED_REF_FRAMES = ['EME2000', 'TOD', 'TEME'] as const;
export type OrbitMessageFrame = (typeof ACCEPTED_REF_FRAMES)[number];

export type OrbitMessageEncoding = 'kvn' | 'xml';

/** One keyword = value [unit] line of a message (or an XML element mapped to one), with its 1-based line. */
export interface KvnEntry {
  kind: 'keyword';
  line: number;
  keyword: string;
  value: string;
  /** Text inside the brackets after the value, or the XML `units` attribute; null when absent. */
  unit: string | null;
}

/** An OEM ephemeris data line (epoch and six or nine numbers), with its 1-based line. */
export interface KvnDataLine {
  kind: 'data';
  line: number;
  fields: string[];
}

export type KvnItem = KvnEntry | KvnDataLine;

export interface OrbitMessageHeader {
  version: string;
  creationDate: string;
  originator: string;
  messageId: string | null;
  comments: string[];
}

export interface OrbitMessageMetadata {
  objectName: string;
  objectId: string;
  centerName: 'EARTH';
  refFrame: OrbitMessageFrame;
  timeSystem: 'UTC';
  comments: string[];
}

/** A state at an epoch: position [km] and velocity [km/s] in the message's REF_FRAME, epoch in UTC. */
export interface EpochState {
  /** The epoch as written (kept for output: a Date holds milliseconds only). */
  epochText: string;
  epoch: Date;
  positionKm: Vec3;
  velocityKmS: Vec3;
  /** Line of the EPOCH keyword (OPM) or of the data line (OEM). */
  line: number;
}

/** Osculating Keplerian elements of an OPM (502.0-B-3 table 3-3), in the message's frame. */
export interface OpmKeplerianElements {
  semiMajorAxisKm: number;
  eccentricity: number;
  inclinationDeg: number;
  raanDeg: number;
  argPericenterDeg: number;
  anomaly: { kind: 'true' | 'mean'; deg: number };
  gmKm3S2: number;
}

export interface OpmSpacecraftParameters {
  massKg?: number;
  solarRadAreaM2?: number;
  solarRadCoeff?: number;
  dragAreaM2?: number;
  dragCoeff?: number;
}

export interface OrbitParameterMessage {
  type: 'OPM';
  encoding: OrbitMessageEncoding;
  header: OrbitMessageHeader;
  metadata: OrbitMessageMetadata;
  state: EpochState;
  keplerian: OpmKeplerianElements | null;
  spacecraft: OpmSpacecraftParameters;
  /** Blocks read and checked for form but not used by the engine (covariance, manoeuvres, user-defined parameters). */
  notUsed: string[];
}

export interface OemSegmentMetadata extends OrbitMessageMetadata {
  startTime: string;
  stopTime: string;
  useableStartTime: string | null;
  useableStopTime: string | null;
  interpolation: string | null;
  interpolationDegree: number | null;
}

export interface OemSegment {
  metadata: OemSegmentMetadata;
  states: EpochState[];
  /** Line of the segment's META_START (or XML <segment>). */
  line: number;
}

export interface OrbitEphemerisMessage {
  type: 'OEM';
  encoding: OrbitMessageEncoding;
  header: OrbitMessageHeader;
  segments: OemSegment[];
  notUsed: string[];
}

export type OrbitDataMessage = OrbitParameterMessage | OrbitEphemerisMessage;

/** Size limits of a message Nodewright reads (checked before anything is parsed). */
export const ORBIT_MESSAGE_LIMITS = {
  /** Characters of the whole message: one day of states at 60 s in KVN is about 160 000. */
  maxChars: 400_000,
  maxLines: 12_000,
  maxLineChars: 1_000,
  /** Ephemeris states over all segments. */
  maxStates: 10_000,
  maxSegments: 50,
} as const;

/** A message refused: names the line (1-based; 0 when it concerns the whole message) and the keyword. */
export class OrbitMessageError extends Error {
  constructor(
    readonly line: number,
    readonly keyword: string | null,
    readonly reason: string,
  ) {
    super(`${line > 0 ? `line ${line}` : 'message'}${keyword ? `, ${keyword}` : ''}: ${reason}`);
    this.name = 'OrbitMessageError';
  }
}
