import type { MemoTemplate } from './template-types';
import { bullets, calc, complianceTable, doc, figure, figureRef, from, h, p, requirement, typed, value } from './build-doc';

/**
 * Sun-synchronous orbit design rationale, written for the invented
 * TERNLIGHT-1 mission. The repeat-orbit block sets the altitude; every
 * other block reads it, so changing the repeat cycle updates the whole memo.
 */
export const ssoDesignRationale: MemoTemplate = {
  id: 'sso-design-rationale',
  title: 'Sun-synchronous orbit design rationale',
  description: 'Repeat cycle, altitude, inclination, node local time, sun and eclipse, frozen eccentricity, drag and injection errors — each section with its calc block.',
  build: () =>
    doc(
      h(1, 'Purpose and scope'),
      p('This memo records the choice of the operational orbit of TERNLIGHT-1, Brightwater Orbital’s wetland-monitoring imager for the Northmere Basin Authority, and the reasoning behind each orbit parameter. It is the baseline for the launch-vehicle interface and the propellant budget.'),
      h(1, 'Mission drivers'),
      bullets(
        ['Complete, gap-free coverage of the basin once per repeat cycle with the 240 km imager swath.'],
        ['Constant illumination: descending node at 10:30 local mean solar time (ascending node 22:30).'],
        ['Five-year design life within the 28 m/s propellant allocation.'],
      ),
      h(1, 'Repeat ground track'),
      p('Exact repeat cycles between 600 km and 800 km with at most 16 days are listed first (', figureRef('fig-options'), '); the design adopts the 12-day cycle of 175 revolutions.'),
      calc('options', 'repeat-options', 'Repeat cycles in the altitude band', { minAltitudeKm: typed('600 km'), maxAltitudeKm: typed('800 km'), maxDays: typed('16') }),
      figure('fig-options', 'repeat-options', 'options', 'Exact repeat cycles of at most 16 days between 600 km and 800 km.'),
      calc('repeat', 'repeat-orbit', 'Selected repeat orbit', { revolutions: typed('175'), days: typed('12') }),
      p('The selected orbit has a mean altitude of ', value('repeat', 'altitudeKm'), ' (semi-major axis ', value('repeat', 'semiMajorAxisKm'), '), a nodal period of ', value('repeat', 'nodalPeriodMin'), ' and an equator spacing of adjacent tracks of ', value('repeat', 'equatorSpacingKm'), '.'),
      h(2, 'Coverage'),
      calc('cover', 'coverage', 'Swath coverage at the equator', { altitudeKm: from('repeat', 'altitudeKm'), swathKm: typed('240 km'), revolutions: typed('175'), days: typed('12') }),
      p('With the 240 km swath the sidelap at the equator is ', value('cover', 'sidelapPercent'), '; the smallest gap-free swath would be ', value('cover', 'swathForGaplessKm'), '.'),
      requirement('REQ-ORB-001', 'Gap-free coverage at the equator once per repeat cycle with the 240 km imager swath.', ['cover', 'swathForGaplessKm'], 'le', '240 km'),
      h(1, 'Sun-synchronous inclination'),
      calc('sso', 'sso-inclination', 'Sun-synchronous inclination at the selected altitude', { altitudeKm: from('repeat', 'altitudeKm'), eccentricity: typed('0.0011') }),
      p('Sun-synchronism at this altitude requires an inclination of ', value('sso', 'inclinationDeg'), ', for a node rate of ', value('sso', 'nodeRateDegPerDay'), '.'),
      figure('fig-sso', 'sso-inclination-altitude', 'sso', 'Sun-synchronous inclination against altitude, with the design point.'),
      h(2, 'Ground track'),
      calc('track', 'ground-track', 'First three hours of ground track', { altitudeKm: from('repeat', 'altitudeKm'), inclinationDeg: from('sso', 'inclinationDeg'), ltanHours: typed('22.5'), startEpoch: typed('2027-09-15T00:00:00Z'), hours: typed('3'), stepSec: typed('30') }),
      figure('fig-track', 'ground-track-map', 'track', 'Ground track over the first three hours after the reference epoch, ascending nodes marked.'),
      h(1, 'Local time of the node'),
      calc('ltan', 'node-local-time', 'Node at the reference epoch', { epoch: typed('2027-09-15T00:00:00Z'), ltanHours: typed('22.5') }),
      p('At the reference epoch the ascending node lies at a right ascension of ', value('ltan', 'raanDeg'), '.'),
      requirement('REQ-ORB-002', 'Descending node at 10:30 local mean solar time, within ±15 min.', ['ltan', 'ltdnHours'], 'within', '10.5 h', '15 min'),
      h(1, 'Sun and eclipse geometry'),
      calc('sun', 'sun-geometry', 'Beta angle and eclipses over the first year', { altitudeKm: from('repeat', 'altitudeKm'), inclinationDeg: from('sso', 'inclinationDeg'), ltanHours: typed('22.5'), startEpoch: typed('2027-09-15T00:00:00Z'), days: typed('365'), stepDays: typed('1') }),
      p(figureRef('fig-sun'), ' shows that over the first year the beta angle stays between ', value('sun', 'betaMinDeg'), ' and ', value('sun', 'betaMaxDeg'), '; the longest eclipse lasts ', value('sun', 'eclipseMaxMin'), '.'),
      figure('fig-sun', 'beta-eclipse-year', 'sun', 'Beta angle and eclipse duration over the first year.'),
      h(1, 'Frozen eccentricity'),
      calc('frozen', 'frozen-orbit', 'Frozen eccentricity and argument of perigee', { altitudeKm: from('repeat', 'altitudeKm'), inclinationDeg: from('sso', 'inclinationDeg') }),
      p('The frozen orbit has an eccentricity of ', value('frozen', 'eccentricity'), ' with the argument of perigee held at ', value('frozen', 'argPerigeeDeg'), '.'),
      h(1, 'Drag and maintenance'),
      calc('drag', 'drag-decay', 'Decay and maintenance at moderate solar activity', { altitudeKm: from('repeat', 'altitudeKm'), massKg: typed('310 kg'), areaM2: typed('1.6 m^2'), dragCoefficient: typed('2.2'), solarActivity: typed('moderate') }),
      p('The orbit decays by ', value('drag', 'decayKmPerDay'), ' without manoeuvres; holding it costs about ', value('drag', 'maintenanceDeltaVMpsPerYear'), ' per year.'),
      requirement('REQ-ORB-003', 'Drag make-up within the propellant allocation: at most 5.6 m/s per year (28 m/s over the five-year life).', ['drag', 'maintenanceDeltaVMpsPerYear'], 'le', '5.6 m/s'),
      h(1, 'Sensitivity to injection errors'),
      calc('inject', 'injection-sensitivity', 'Local-time drift from launcher dispersions', { altitudeKm: from('repeat', 'altitudeKm'), inclinationDeg: from('sso', 'inclinationDeg'), inclinationErrorDeg: typed('0.05 deg'), altitudeErrorKm: typed('5 km') }),
      p('A 0.05° inclination error alone would drift the node local time by ', value('inject', 'driftFromInclinationMinPerYear'), '; correcting it costs ', value('inject', 'planeChangeDeltaVMps'), '.'),
      figure('fig-drift', 'local-time-drift', 'inject', 'Drift of the node local time over the mission from the assumed injection errors.'),
      requirement('REQ-ORB-004', 'Without an inclination trim, launcher dispersions keep the node within ±30 min of 10:30 over the five-year mission: drift within ±6 min per year.', ['inject', 'localTimeDriftMinPerYear'], 'within', '0 min/yr', '6 min/yr'),
      h(1, 'Design state for the launcher'),
      calc('state', 'mean-to-osculating', 'Design state at the reference epoch', { semiMajorAxisKm: from('repeat', 'semiMajorAxisKm'), eccentricity: from('frozen', 'eccentricity'), inclinationDeg: from('sso', 'inclinationDeg'), raanDeg: from('ltan', 'raanDeg'), argPerigeeDeg: from('frozen', 'argPerigeeDeg'), meanAnomalyDeg: typed('0'), epoch: typed('2027-09-15T00:00:00Z') }),
      p('At the reference epoch the design orbit passes the perigee of the frozen orbit; its osculating state is ', value('state', 'injectionTarget'), '. Each frozen revision carries this state as a CCSDS Orbit Parameter Message and one day of its numerical propagation as an Orbit Ephemeris Message, both in EME2000.'),
      h(1, 'Requirements compliance'),
      p('Each requirement above is checked against its calc block’s current result; the table gathers them.'),
      complianceTable(),
      h(1, 'Conclusion'),
      p('TERNLIGHT-1 will fly a frozen, sun-synchronous 12-day repeat orbit at ', value('repeat', 'altitudeKm'), ' and ', value('sso', 'inclinationDeg'), ' with the descending node at 10:30.'),
    ),
};
