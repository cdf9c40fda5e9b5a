import type { TiptapDoc } from '@/lib/memos/memo-schema';
import { calc, figure, from, h, p, typed, value } from '@/lib/templates/build-doc';
import { ssoDesignRationale } from '@/lib/templates/sso-design-rationale';
import { TERNLIGHT_TLES } from './ternlight-tles';

export const DEMO_MEMO = {
  documentNumber: 'BWO-TL1-DM-001',
  title: 'TERNLIGHT-1 orbit design rationale',
};

/**
 * The "As flown" section of the demo memo: the invented element sets of
 * TERNLIGHT-1 since its invented launch, checked against the memo's own design
 * blocks (repeat-orbit altitude, sun-synchronous inclination, 22:30 node).
 * It travels with the memo: the customer reads it in every revision released to them.
 */
export function asFlownSection() {
  return [
    h(1, 'As flown after launch'),
    p(
      'TERNLIGHT-1 was launched on 14 September 2027. The element sets published since then are checked below against this memo’s design blocks; the latest, of ',
      value('flown', 'epoch'),
      ', puts the mean altitude at ',
      value('flown', 'meanAltitudeKm'),
      ' (',
      value('flown', 'altitudeDifferenceKm'),
      ' from the design) and the inclination at ',
      value('flown', 'inclinationDeg'),
      ', ',
      value('flown', 'inclinationDifferenceDeg'),
      ' above the design.',
    ),
    calc('flown', 'tle-check', 'As flown from the published element sets', {
      tle: typed(TERNLIGHT_TLES),
      designLtanHours: typed('22.5 h'),
      designAltitudeKm: from('repeat', 'altitudeKm'),
      designInclinationDeg: from('sso', 'inclinationDeg'),
    }),
    p(
      'The ascending node now crosses at ',
      value('flown', 'ltanHours'),
      ' local mean solar time, ',
      value('flown', 'ltanDifferenceMin'),
      ' after the design’s 22:30; the inclination left by the injection drifts it by ',
      value('flown', 'ltanDriftMinPerYear'),
      ' per year until the inclination is trimmed.',
    ),
    figure(
      'fig-flown',
      'as-flown-local-time-altitude',
      'flown',
      'Local time of the ascending node and mean altitude of TERNLIGHT-1 from the published element sets, against the design values.',
    ),
  ];
}

/** The demo memo: the design-rationale template, as the invented analyst started it, with its as-flown section. */
export function demoMemoContent(): TiptapDoc {
  const base = ssoDesignRationale.build();
  return { ...base, content: [...base.content, ...asFlownSection()] };
}
