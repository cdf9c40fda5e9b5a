import type { MemoTemplate } from './template-types';
import { calc, doc, from, h, p, typed, value } from './build-doc';

/** Candidate orbit trade study for the invented TERNLIGHT-1 mission. */
export const candidateTradeStudy: MemoTemplate = {
  id: 'candidate-trade-study',
  title: 'Candidate orbit trade study',
  description:
    'Candidate sun-synchronous orbits side by side in a trade table, the chosen candidate fed to the detail blocks.',
  build: () =>
    doc(
      h(1, 'Purpose'),
      p(
        'This study compares candidate sun-synchronous orbits for TERNLIGHT-1 before one is baselined. Each column of the trade table is computed by the engine from the candidate altitude; the chosen column feeds the detail sections.',
      ),
      h(1, 'Candidates'),
      calc('trade', 'orbit-trade', 'Candidate orbits', {
        candidateAltitudesKm: typed('600, 650, 693, 720'),
        chosenIndex: typed('3'),
        ltanHours: typed('22.5'),
        startEpoch: typed('2027-09-15T00:00:00Z'),
        massKg: typed('310 kg'),
        areaM2: typed('1.6 m^2'),
        solarActivity: typed('moderate'),
      }),
      p(
        'The chosen candidate flies at ',
        value('trade', 'chosenAltitudeKm'),
        ' and ',
        value('trade', 'chosenInclinationDeg'),
        '.',
      ),
      h(1, 'Chosen candidate in detail'),
      h(2, 'Repeat cycles near the chosen altitude'),
      calc('near', 'repeat-options', 'Repeat cycles within ±15 km', {
        minAltitudeKm: typed('678 km'),
        maxAltitudeKm: typed('708 km'),
        maxDays: typed('16'),
      }),
      h(2, 'Node rate and local-time drift'),
      calc('rate', 'node-rate', 'Node rate of the chosen candidate', {
        altitudeKm: from('trade', 'chosenAltitudeKm'),
        inclinationDeg: from('trade', 'chosenInclinationDeg'),
      }),
      p(
        'At the design inclination the node local time drifts by ',
        value('rate', 'localTimeDriftMinPerYear'),
        ' against the mean Sun.',
      ),
      h(1, 'Recommendation'),
      p(
        'Carry the chosen candidate into the orbit design rationale; revisit the choice if the launch provider’s injection accuracy differs from the assumption.',
      ),
    ),
};
