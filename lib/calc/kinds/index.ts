/** Every calc kind, in the order shown to users. */
import type { RegisteredKind } from '../registry';
import { altitudeMaintenanceKind } from './altitudeMaintenance';
import { atmosphereDensityKind } from './atmosphereDensity';
import { coverageKind } from './coverage';
import { dragDecayKind } from './dragDecay';
import { eclipseDurationKind } from './eclipseDuration';
import { elementFrameKind } from './element-frame';
import { disposalComplianceKind } from './disposalCompliance';
import { expressionKind } from './expression';
import { frozenOrbitKind } from './frozenOrbit';
import { groundTrackKind } from './groundTrack';
import { injectionSensitivityKind } from './injectionSensitivity';
import { injectionDispersionKind } from './injection-dispersion';
import { meanToOsculatingKind } from './meanToOsculating';
import { nodeLocalTimeKind } from './nodeLocalTime';
import { nodeRateKind } from './nodeRate';
import { orbitTradeKind } from './orbitTrade';
import { osculatingToMeanKind } from './osculatingToMean';
import { propagationCheckKind } from './propagationCheck';
import { repeatOptionsKind } from './repeatOptions';
import { repeatOrbitKind } from './repeatOrbit';
import { solarActivityKind } from './solarActivity';
import { ssoInclinationKind } from './ssoInclination';
import { sunGeometryKind } from './sunGeometry';
import { solarInclinationDriftKind } from './solar-inclination-drift';
import { deltaVBudgetKind } from './delta-v-budget';
import { tleCheckKind } from './tle-check';
import { orbitMessageKind } from './orbit-message';
import { stationContactsKind } from './station-contacts';
import { siteRevisitKind } from './site-revisit';

export const ALL_KINDS: readonly RegisteredKind[] = [
  ssoInclinationKind,
  nodeRateKind,
  repeatOrbitKind,
  repeatOptionsKind,
  nodeLocalTimeKind,
  sunGeometryKind,
  eclipseDurationKind,
  frozenOrbitKind,
  injectionSensitivityKind,
  meanToOsculatingKind,
  osculatingToMeanKind,
  dragDecayKind,
  disposalComplianceKind,
  altitudeMaintenanceKind,
  atmosphereDensityKind,
  solarActivityKind,
  groundTrackKind,
  coverageKind,
  orbitTradeKind,
  propagationCheckKind,
  expressionKind,
  injectionDispersionKind,
  elementFrameKind,
  solarInclinationDriftKind,
  deltaVBudgetKind,
  tleCheckKind,
  orbitMessageKind,
  stationContactsKind,
  siteRevisitKind,
];
