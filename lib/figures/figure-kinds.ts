/** The one registry of figure kinds. */
import type { FigureKindDefinition, FigureKindInfo } from './figure-types';
import { altitudeDecay } from './kinds/altitude-decay';
import { asFlownLocalTimeAltitude } from './kinds/as-flown-local-time-altitude';
import { betaEclipseYear } from './kinds/beta-eclipse-year';
import { decaySolarFlux } from './kinds/decay-solar-flux';
import { dispersionHistogram } from './kinds/dispersion-histogram';
import { groundTrackMap } from './kinds/ground-track-map';
import { localTimeDrift } from './kinds/local-time-drift';
import { propagationElements } from './kinds/propagation-elements';
import { repeatOptionsChart } from './kinds/repeat-options-chart';
import { ssoInclinationAltitude } from './kinds/sso-inclination-altitude';
import { nodeLocalTimeMission } from './kinds/node-local-time-mission';
import { sitesGroundTrackMap } from './kinds/sites-ground-track-map';

const DEFINITIONS: readonly FigureKindDefinition[] = [
  ssoInclinationAltitude,
  repeatOptionsChart,
  groundTrackMap,
  betaEclipseYear,
  localTimeDrift,
  altitudeDecay,
  decaySolarFlux,
  propagationElements,
  nodeLocalTimeMission,
  dispersionHistogram,
  asFlownLocalTimeAltitude,
  sitesGroundTrackMap,
];

/** Metadata of every figure kind, in the order offered to users. */
export const FIGURE_KINDS: readonly FigureKindInfo[] = DEFINITIONS.map(({ kind, title, sourceCalcKinds }) => ({
  kind,
  title,
  sourceCalcKinds: [...sourceCalcKinds],
}));

export function getFigureKind(kind: string): FigureKindDefinition | undefined {
  return DEFINITIONS.find((d) => d.kind === kind);
}
