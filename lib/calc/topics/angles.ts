/** Angle helpers (internal unit: rad). */
import { DEG, TWO_PI } from '../constants';

export const toRad = (deg: number): number => deg * DEG;
export const toDeg = (rad: number): number => rad / DEG;

/** Wrap to [0, 2π). */
export function wrapTwoPi(x: number): number {
  const r = x % TWO_PI;
  return r < 0 ? r + TWO_PI : r;
}

/** Wrap to [-π, π). */
export function wrapPi(x: number): number {
  return wrapTwoPi(x + Math.PI) - Math.PI;
}

/** Wrap hours to [0, 24). */
export function wrapHours(h: number): number {
  const r = h % 24;
  return r < 0 ? r + 24 : r;
}

/** Round for display/transport without losing the engine's precision where it matters. */
export function roundTo(x: number, decimals: number): number {
  const f = 10 ** decimals;
  return Math.round(x * f) / f;
}
