import { parseUtcEpoch } from '../calc/fields';
import type { Vec3 } from './orbit-message-types';

/** A dated osculating state of a calc result, true of date at its epoch (as mean-to-osculating and orbit-message give it). */
export interface DatedState {
  epoch: Date;
  positionKm: Vec3;
  velocityKmS: Vec3;
}

const isVec3 = (v: unknown): v is Vec3 =>
  Array.isArray(v) && v.length === 3 && v.every((x) => typeof x === 'number' && Number.isFinite(x));

/**
 * The dated state of a calc block's result, if it yields one: outputs `positionKm`
 * and `velocityKmS` (true-of-date vectors) and an epoch, from the output `epoch`
 * or else the input `epoch`. Otherwise the reason, to tell the person what to add.
 */
export function readStateResult(result: {
  inputs: Record<string, unknown>;
  outputs: Record<string, unknown>;
}): { ok: true; state: DatedState } | { ok: false; reason: string } {
  const { positionKm, velocityKmS } = result.outputs;
  if (!isVec3(positionKm) || !isVec3(velocityKmS))
    return { ok: false, reason: 'this block does not yield a state vector (outputs positionKm and velocityKmS)' };
  const text = typeof result.outputs.epoch === 'string' ? result.outputs.epoch : result.inputs.epoch;
  const epoch = typeof text === 'string' ? parseUtcEpoch(text) : undefined;
  if (!epoch) return { ok: false, reason: 'the state has no epoch: give the block an epoch (UTC) to export it' };
  return { ok: true, state: { epoch, positionKm, velocityKmS } };
}
