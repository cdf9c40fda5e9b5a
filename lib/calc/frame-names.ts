/** How the engine's reference frames are named to people (editor chips, PDF notes, model notes). Plain data: safe for the browser bundle. */
import type { InputFrame } from './types';

export const FRAME_NAMES: Readonly<Record<InputFrame, { short: string; long: string }>> = {
  EME2000: { short: 'EME2000', long: 'mean equator and equinox of J2000.0 (CCSDS EME2000)' },
  TOD: { short: 'true of date', long: 'true equator and true equinox of date (IAU-76/80)' },
  TEME: { short: 'TEME', long: 'true equator, mean equinox of date (SGP4 and TLEs)' },
};
