/** The generated memo of the editor benchmark: 40 calc blocks (chained) and 100 live values. */
import { calc, doc, from, h, p, typed, value } from '../lib/templates/build-doc';
import type { TiptapNode } from '../lib/memos/memo-schema';

export const BLOCKS = 40;
export const LIVE_VALUES = 100;
/** Exact 12-day repeats between roughly 560 km and 900 km (coprime with 12). */
const REVOLUTIONS_IN_12_DAYS = [169, 173, 175, 179, 181, 173, 175, 169, 179, 181];

export function generatedMemo() {
  const content: TiptapNode[] = [h(1, 'Generated memo for the editor benchmark')];
  for (let i = 0; i < BLOCKS / 4; i++) {
    const alt = 600 + i * 15;
    content.push(h(2, `Candidate ${i + 1}`));
    content.push(
      calc(`r${i}`, 'repeat-orbit', `Repeat ${i}`, {
        revolutions: typed(String(REVOLUTIONS_IN_12_DAYS[i])),
        days: typed('12'),
      }),
    );
    content.push(calc(`s${i}`, 'sso-inclination', `SSO ${i}`, { altitudeKm: typed(`${alt} km`) }));
    content.push(
      calc(`n${i}`, 'node-rate', `Node rate ${i}`, {
        altitudeKm: from(`r${i}`, 'altitudeKm'),
        inclinationDeg: from(`s${i}`, 'inclinationDeg'),
      }),
    );
    content.push(
      calc(`c${i}`, 'coverage', `Coverage ${i}`, {
        altitudeKm: typed(`${alt} km`),
        swathKm: typed('240 km'),
        revolutions: typed('175'),
        days: typed('12'),
      }),
    );
  }
  const outputs: [string, string][] = [
    ['s', 'inclinationDeg'],
    ['s', 'nodalPeriodMin'],
    ['n', 'nodeRateDegPerDay'],
    ['c', 'sidelapPercent'],
    ['r', 'altitudeKm'],
  ];
  for (let k = 0; k < LIVE_VALUES / 5; k++) {
    const i = k % (BLOCKS / 4);
    content.push(
      p(
        'Sentence ',
        String(k),
        ' quotes ',
        ...outputs.flatMap(([prefix, out]) => [value(`${prefix}${i}`, out), ', ']),
        'and ends here.',
      ),
    );
  }
  return doc(...content);
}
