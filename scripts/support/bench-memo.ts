/** The benchmark memo: TERNLIGHT-1 candidate orbits, each section a set of calc blocks, live values and, for some, a figure. */
import type { TiptapDoc, TiptapNode } from '@/lib/memos/memo-schema';
import { bullets, calc, from, h, p, typed, value } from '@/lib/templates/build-doc';

const figure = (figureId: string, figureKind: string, blockId: string, caption: string): TiptapNode => ({
  type: 'figure',
  attrs: { figureId, figureKind, blockId, caption },
});

/** One candidate: six calc blocks and one or two figures. */
function candidate(k: number, revolutions: number, days: number): TiptapNode[] {
  const id = (s: string) => `${s}${k}`;
  const nodes: TiptapNode[] = [
    h(1, `Candidate ${k}: ${revolutions} revolutions in ${days} days`),
    p(
      'This candidate is traded on coverage, illumination, drag and injection sensitivity; every number below is recomputed from the inputs shown.',
    ),
    calc(id('rep'), 'repeat-orbit', `Repeat orbit ${revolutions}/${days}`, {
      revolutions: typed(String(revolutions)),
      days: typed(String(days)),
    }),
    p(
      'The orbit flies at ',
      value(id('rep'), 'altitudeKm'),
      ' with a nodal period of ',
      value(id('rep'), 'nodalPeriodMin'),
      '.',
    ),
    h(2, 'Inclination and node'),
    calc(id('sso'), 'sso-inclination', 'Sun-synchronous inclination', {
      altitudeKm: from(id('rep'), 'altitudeKm'),
      eccentricity: typed('0.0011'),
    }),
    calc(id('rate'), 'node-rate', 'Node and perigee rates', {
      altitudeKm: from(id('rep'), 'altitudeKm'),
      inclinationDeg: from(id('sso'), 'inclinationDeg'),
    }),
    p(
      'Sun-synchronism needs ',
      value(id('sso'), 'inclinationDeg'),
      '; the node then moves ',
      value(id('rate'), 'nodeRateDegPerDay'),
      '.',
    ),
    h(2, 'Sun, drag and injection'),
    calc(id('sun'), 'sun-geometry', 'Beta angle over a year', {
      altitudeKm: from(id('rep'), 'altitudeKm'),
      inclinationDeg: from(id('sso'), 'inclinationDeg'),
      ltanHours: typed('22.5'),
      startEpoch: typed('2027-09-15T00:00:00Z'),
      days: typed('365'),
      stepDays: typed('2'),
    }),
    calc(id('drag'), 'drag-decay', 'Decay at moderate activity', {
      altitudeKm: from(id('rep'), 'altitudeKm'),
      massKg: typed('310 kg'),
      areaM2: typed('1.6 m^2'),
      dragCoefficient: typed('2.2'),
      solarActivity: typed('moderate'),
    }),
    calc(id('inj'), 'injection-sensitivity', 'Injection dispersions', {
      altitudeKm: from(id('rep'), 'altitudeKm'),
      inclinationDeg: from(id('sso'), 'inclinationDeg'),
      inclinationErrorDeg: typed('0.05 deg'),
      altitudeErrorKm: typed('5 km'),
    }),
    bullets(
      ['Longest eclipse ', value(id('sun'), 'eclipseMaxMin'), '.'],
      ['Maintenance ', value(id('drag'), 'maintenanceDeltaVMpsPerYear'), ' per year.'],
      ['Drift from the inclination error ', value(id('inj'), 'driftFromInclinationMinPerYear'), '.'],
    ),
  ];
  return nodes;
}

/** Five candidates (30 calc blocks) and eight figures. */
export function benchMemoDocument(): TiptapDoc {
  const cycles: [number, number][] = [
    [175, 12],
    [233, 16],
    [190, 13],
    [161, 11],
    [117, 8],
  ];
  const content = cycles.flatMap(([r, d], i) => candidate(i + 1, r, d));
  const after = (blockId: string, fig: TiptapNode) => {
    const at = content.findIndex((n) => n.type === 'calcBlock' && n.attrs?.blockId === blockId);
    content.splice(at + 1, 0, fig);
  };
  after(
    'sso1',
    figure('fig1', 'sso-inclination-altitude', 'sso1', 'SSO inclination against altitude, candidate 1 marked.'),
  );
  after(
    'sun1',
    figure('fig2', 'beta-eclipse-year', 'sun1', 'Beta angle and eclipse over the first year, candidate 1.'),
  );
  after('drag1', figure('fig3', 'altitude-decay', 'drag1', 'Altitude decay without manoeuvres, candidate 1.'));
  after('inj1', figure('fig4', 'local-time-drift', 'inj1', 'Local-time drift from injection errors, candidate 1.'));
  after(
    'sso2',
    figure('fig5', 'sso-inclination-altitude', 'sso2', 'SSO inclination against altitude, candidate 2 marked.'),
  );
  after(
    'sun3',
    figure('fig6', 'beta-eclipse-year', 'sun3', 'Beta angle and eclipse over the first year, candidate 3.'),
  );
  after('drag4', figure('fig7', 'altitude-decay', 'drag4', 'Altitude decay without manoeuvres, candidate 4.'));
  after('inj5', figure('fig8', 'local-time-drift', 'inj5', 'Local-time drift from injection errors, candidate 5.'));
  return { type: 'doc', content };
}
