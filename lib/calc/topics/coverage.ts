/**
 * Swath coverage of a repeat ground track at the equator.
 * Adjacent tracks of a repeat cycle of R revolutions are 2π R⊕ / R apart along the equator
 * (USGS Landsat 8 Data Users Handbook: 233 paths, ≈ 172 km apart). Sidelap = (swath − spacing)/swath.
 * The perpendicular distance between adjacent tracks is spacing · sin ψ, with ψ the angle of the
 * ground track to the equator: tan ψ = u̇ sin i / (u̇ cos i − (ω⊕ − Ω̇)) (Earth rotation included;
 * Wertz, Orbit & Constellation Design and Management ch. 8 ground-track geometry, from memory).
 * Units: km, rad.
 */
import { EARTH_RADIUS_KM, EARTH_ROTATION_RAD_S, TWO_PI } from '../constants';
import { computeSecularRates, DEFAULT_THEORY, type SecularTheory } from './secular-rates';

/** Equatorial spacing [km] of adjacent tracks for a cycle of `revolutions` revolutions. */
export function computeEquatorSpacingKm(revolutions: number): number {
  return (TWO_PI * EARTH_RADIUS_KM) / revolutions;
}

/** Angle ψ [rad] (0..π) between the ground track and the equator at the ascending node. */
export function computeGroundTrackAngle(aKm: number, iRad: number, theory: SecularTheory = DEFAULT_THEORY): number {
  const r = computeSecularRates(aKm, 0, iRad, theory);
  const uRate = r.perigeeRate + r.meanAnomalyRate;
  return Math.atan2(uRate * Math.sin(iRad), uRate * Math.cos(iRad) - (EARTH_ROTATION_RAD_S - r.nodeRate));
}

/** Sidelap [%] of a swath over a track spacing (negative means a gap). */
export function computeSidelapPercent(swathKm: number, spacingKm: number): number {
  return ((swathKm - spacingKm) / swathKm) * 100;
}
