/** Every calc kind, in the order shown to users. */
import type { RegisteredKind } from '../registry';
import { nodeLocalTimeKind } from './nodeLocalTime';
import { nodeRateKind } from './nodeRate';
import { repeatOptionsKind } from './repeatOptions';
import { repeatOrbitKind } from './repeatOrbit';
import { ssoInclinationKind } from './ssoInclination';

export const ALL_KINDS: readonly RegisteredKind[] = [
  ssoInclinationKind,
  nodeRateKind,
  repeatOrbitKind,
  repeatOptionsKind,
  nodeLocalTimeKind,
];
