/** Every calc kind, in the order shown to users. */
import type { RegisteredKind } from '../registry';
import { altitudeMaintenanceKind } from './altitude-maintenance';
import { atmosphereDensityKind } from './atmosphere-density';
import { coverageKind } from './coverage';
import { dragDecayKind } from './drag-decay';
import { eclipseDurationKind } from './eclipse-duration';
import { elementFrameKind } from './element-frame';
import { disposalComplianceKind } from './disposal-compliance';
import { expressionKind } from './expression';
import { frozenOrbitKind } from './frozen-orbit';
import { groundTrackKind } from './ground-track';
import { injectionSensitivityKind } from './injection-sensitivity';
import { injectionDispersionKind } from './injection-dispersion';
import { meanToOsculatingKind } from './mean-to-osculating';
import { nodeLocalTimeKind } from './node-local-time';
import { nodeRateKind } from './node-rate';
import { orbitTradeKind } from './orbit-trade';
import { osculatingToMeanKind } from './osculating-to-mean';
import { propagationCheckKind } from './propagation-check';
import { repeatOptionsKind } from './repeat-options';
import { repeatOrbitKind } from './repeat-orbit';
import { solarActivityKind } from './solar-activity';
import { ssoInclinationKind } from './sso-inclination';
import { sunGeometryKind } from './sun-geometry';
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
