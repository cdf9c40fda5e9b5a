/**
 * Figure specs are built from engine results only: each test compares the
 * data in the spec with runCalc's own outputs for the same inputs, and
 * renders the spec to SVG to check that it compiles and carries its axis
 * titles with units.
 */
import { describe, expect, it } from 'vitest';
import { getCalcKind, runCalc } from '@/lib/calc';
import { buildFigureSpec } from '@/lib/figures/build-figure-spec';
import { FIGURE_KINDS } from '@/lib/figures/figure-kinds';
import type { FigureSpec } from '@/lib/figures/figure-types';
import { renderFigureSvg } from '@/lib/figures/render-figure-svg';
import { evaluated, layerValues, svgTexts } from './figure-support';
import { TERNLIGHT_TLES } from '@/lib/demo/ternlight-tles';

function specOf(figureKind: string, kind: string, inputs: Record<string, unknown>): FigureSpec {
  const outcome = buildFigureSpec(figureKind, evaluated(kind, inputs));
  if (!outcome.ok) throw new Error(outcome.error);
  return outcome.spec;
}

const TRACK_INPUTS = {
  altitudeKm: 700,
  inclinationDeg: 98.2,
  ltanHours: 22.5,
  startEpoch: '2027-09-15T00:00:00Z',
  hours: 6,
  stepSec: 60,
};

describe('figure registry', () => {
  it('lists the figure kinds, each bound to calc kinds the engine has', () => {
    expect(FIGURE_KINDS.map((k) => k.kind)).toEqual([
      'sso-inclination-altitude',
      'repeat-options',
      'ground-track-map',
      'beta-eclipse-year',
      'local-time-drift',
      'altitude-decay',
      'decay-solar-flux',
      'propagation-elements',
      'node-local-time-mission',
      'dispersion-histogram',
      'as-flown-local-time-altitude',
      'sites-ground-track-map',
    ]);
    for (const k of FIGURE_KINDS) {
      for (const calcKind of k.sourceCalcKinds) expect(getCalcKind(calcKind)?.kind).toBe(calcKind);
    }
  });

  it('refuses an unknown kind, a missing block, a failed block and a block of the wrong kind, naming the problem', () => {
    const sso = evaluated('sso-inclination', { altitudeKm: 700 });
    expect(buildFigureSpec('pie-chart', sso)).toEqual({
      ok: false,
      error: expect.stringContaining('unknown figure kind "pie-chart"'),
    });
    expect(buildFigureSpec('sso-inclination-altitude', undefined)).toEqual({
      ok: false,
      error: expect.stringContaining('not bound'),
    });
    const failed = {
      blockId: 'b2',
      status: 'error' as const,
      block: sso.block,
      error: 'altitudeKm: must be at least 100 km',
      fields: {},
    };
    expect(buildFigureSpec('sso-inclination-altitude', failed)).toEqual({
      ok: false,
      error: expect.stringContaining('must be at least 100 km'),
    });
    expect(buildFigureSpec('ground-track-map', sso)).toEqual({
      ok: false,
      error: expect.stringContaining('needs a ground-track block, not sso-inclination'),
    });
  });
});

describe('sso-inclination-altitude', () => {
  it('marks the design point at the inclination runCalc gives for the block altitude (to 1e-12 deg)', () => {
    const block = evaluated('sso-inclination', { altitudeKm: 693, eccentricity: 0.0011 });
    const outcome = buildFigureSpec('sso-inclination-altitude', block);
    if (!outcome.ok) throw new Error(outcome.error);
    const [design] = layerValues(outcome.spec, 'design_point');
    expect(design.altitudeKm).toBe(693);
    expect(design.inclinationDeg).toBeCloseTo(block.result.outputs.inclinationDeg as number, 12);
  });

  it('sweeps 400–1000 km in 10 km steps with the engine values at each altitude', () => {
    const sweep = layerValues(specOf('sso-inclination-altitude', 'sso-inclination', { altitudeKm: 705 }), 'sweep');
    expect(sweep).toHaveLength(61);
    expect(sweep[0].altitudeKm).toBe(400);
    expect(sweep[60].altitudeKm).toBe(1000);
    const at800 = sweep.find((r) => r.altitudeKm === 800);
    const engine = runCalc('sso-inclination', { altitudeKm: 800, eccentricity: 0 });
    expect(engine.ok && at800?.inclinationDeg).toBeCloseTo(
      engine.ok ? (engine.result.outputs.inclinationDeg as number) : NaN,
      12,
    );
    // The SSO inclination rises with altitude (retrograde orbit, larger J2 lever arm needed at lower node rate): 97.0° at 400 km to 99.5° at 1000 km.
    expect(sweep[0].inclinationDeg as number).toBeGreaterThan(96.9);
    expect(sweep[60].inclinationDeg as number).toBeLessThan(99.6);
    expect(sweep[60].inclinationDeg as number).toBeGreaterThan(sweep[0].inclinationDeg as number);
  });

  it('widens the band to keep a design point outside 400–1000 km inside it', () => {
    const sweep = layerValues(specOf('sso-inclination-altitude', 'sso-inclination', { altitudeKm: 1200 }), 'sweep');
    expect(sweep[0].altitudeKm).toBe(400);
    expect(sweep[sweep.length - 1].altitudeKm).toBe(1250);
  });

  it('renders to SVG with both axis titles and the design label', async () => {
    const svg = await renderFigureSvg(specOf('sso-inclination-altitude', 'sso-inclination', { altitudeKm: 705 }));
    const texts = svgTexts(svg);
    expect(texts).toContain('Mean altitude (km)');
    expect(texts).toContain('Sun-synchronous inclination (deg)');
    const inc = runCalc('sso-inclination', { altitudeKm: 705 });
    expect(texts).toContain(
      `Design point: 705.0 km, ${inc.ok ? (inc.result.outputs.inclinationDeg as number).toFixed(3) : ''} deg`,
    );
  });
});

describe('repeat-options', () => {
  it('plots every option of the block at its altitude and cycle, labelled revolutions/days', async () => {
    const block = evaluated('repeat-options', { minAltitudeKm: 600, maxAltitudeKm: 800, maxDays: 16 });
    const outcome = buildFigureSpec('repeat-options', block);
    if (!outcome.ok) throw new Error(outcome.error);
    const engine = block.result.outputs.options as { revolutions: number; days: number; altitudeKm: number }[];
    const plotted = (outcome.spec as { data: { values: { label: string; altitudeKm: number; days: number }[] } }).data
      .values;
    expect(plotted).toHaveLength(engine.length);
    expect(plotted.map((p) => p.label)).toEqual(engine.map((o) => `${o.revolutions}/${o.days}`));
    expect(plotted.map((p) => p.altitudeKm)).toEqual(engine.map((o) => o.altitudeKm));
    const texts = svgTexts(await renderFigureSvg(outcome.spec));
    expect(texts).toEqual(expect.arrayContaining(['Mean altitude (km)', 'Repeat cycle (days)', '175/12']));
  });
});

describe('ground-track-map', () => {
  it('draws the engine track split at the antimeridian, its ascending nodes, and the Natural Earth coastline', async () => {
    const block = evaluated('ground-track', TRACK_INPUTS);
    const outcome = buildFigureSpec('ground-track-map', block);
    if (!outcome.ok) throw new Error(outcome.error);
    const track = layerValues(outcome.spec, 'track');
    const points = block.result.outputs.points as { lonDeg: number; latDeg: number }[];
    expect(track.map((p) => p.lon)).toEqual(points.map((p) => p.lonDeg));
    for (let k = 1; k < track.length; k++) {
      if (track[k].segment === track[k - 1].segment)
        expect(Math.abs((track[k].lon as number) - (track[k - 1].lon as number))).toBeLessThan(180);
    }
    const nodes = layerValues(outcome.spec, 'ascending_nodes');
    expect(nodes.map((n) => n.lon)).toEqual(
      (block.result.outputs.ascendingNodes as { lonDeg: number }[]).map((n) => n.lonDeg),
    );
    expect(layerValues(outcome.spec, 'coastline').length).toBeGreaterThan(4000);
    const svg = await renderFigureSvg(outcome.spec);
    // One line mark per coastline string (vega facets the line by its detail field), each a path.
    const coastPaths = [...svg.matchAll(/<g class="mark-line role-mark coastline_marks"[^>]*><path [^>]*d="M[^"]+"/g)];
    expect(coastPaths.length).toBeGreaterThan(100);
    expect(svgTexts(svg)).toEqual(expect.arrayContaining(['Longitude (deg)', 'Latitude (deg)']));
  });
});

describe('sites-ground-track-map', () => {
  it('puts each site of a station-contacts block at its latitude and longitude over the engine ground track of the same orbit', async () => {
    const sites =
      'name,latitude,longitude,altitude,minimum elevation\nNorthmere Basin,52.1,-3.2,120,5\nSaltmarsh Point,-12.4,130.8,30,5\n';
    const block = evaluated('station-contacts', {
      sites,
      altitudeKm: 700,
      inclinationDeg: 98.2,
      ltanHours: 22.5,
      startEpoch: '2027-09-15T00:00:00Z',
      days: 0.25,
      stepSec: 60,
    });
    const outcome = buildFigureSpec('sites-ground-track-map', block);
    if (!outcome.ok) throw new Error(outcome.error);
    expect(layerValues(outcome.spec, 'sites')).toEqual([
      { name: 'Northmere Basin', lat: 52.1, lon: -3.2 },
      { name: 'Saltmarsh Point', lat: -12.4, lon: 130.8 },
    ]);
    const track = evaluated('ground-track', { ...TRACK_INPUTS, hours: 6 });
    expect(layerValues(outcome.spec, 'track').map((p) => p.lon)).toEqual(
      (track.result.outputs.points as { lonDeg: number }[]).map((p) => p.lonDeg),
    );
    expect(svgTexts(await renderFigureSvg(outcome.spec))).toEqual(
      expect.arrayContaining(['Northmere Basin', 'Saltmarsh Point']),
    );
  });
});

describe('beta-eclipse-year', () => {
  it('draws the sun-geometry series: beta and eclipse values equal to the engine rows, dates as given', async () => {
    const block = evaluated('sun-geometry', {
      altitudeKm: 700,
      inclinationDeg: 98.19,
      ltanHours: 22.5,
      startEpoch: '2027-09-15T00:00:00Z',
      days: 365,
      stepDays: 5,
    });
    const outcome = buildFigureSpec('beta-eclipse-year', block);
    if (!outcome.ok) throw new Error(outcome.error);
    const series = block.result.outputs.series as {
      date: string;
      betaDeg: number;
      umbraMin: number;
      penumbraMin: number;
    }[];
    expect(layerValues(outcome.spec, 'beta_lines').map((p) => p.y)).toEqual(series.map((r) => r.betaDeg));
    // conical shadow: umbra and umbra + penumbra as two series
    const eclipse = layerValues(outcome.spec, 'eclipse_lines');
    expect(eclipse.filter((p) => p.series === 'Umbra').map((p) => p.y)).toEqual(series.map((r) => r.umbraMin));
    expect(eclipse.filter((p) => p.series === 'Umbra + penumbra').map((p) => p.y)).toEqual(
      series.map((r) => r.penumbraMin),
    );
    expect(eclipse.filter((p) => p.series === 'Umbra').map((p) => p.x)).toEqual(series.map((r) => r.date));
    expect(svgTexts(await renderFigureSvg(outcome.spec))).toEqual(
      expect.arrayContaining(['Beta angle (deg)', 'Eclipse duration (min)', 'Date (UTC)', 'Umbra + penumbra']),
    );
  });
});

describe('beta-eclipse-year on a result frozen before the conical shadow', () => {
  it('draws the one eclipse column such rows carry', () => {
    const block = evaluated('sun-geometry', {
      altitudeKm: 700,
      inclinationDeg: 98.19,
      ltanHours: 22.5,
      startEpoch: '2027-09-15T00:00:00Z',
      days: 60,
      stepDays: 5,
    });
    const rowsBefore = (block.result.outputs.series as Record<string, unknown>[]).map(
      ({ umbraMin: _u, penumbraMin: _p, ...rest }) => rest,
    );
    const old = { ...block, result: { ...block.result, outputs: { ...block.result.outputs, series: rowsBefore } } };
    const outcome = buildFigureSpec('beta-eclipse-year', old as typeof block);
    if (!outcome.ok) throw new Error(outcome.error);
    const eclipse = layerValues(outcome.spec, 'eclipse_lines');
    expect(eclipse.map((p) => p.series)).toEqual(rowsBefore.map(() => 'Eclipse duration'));
    expect(eclipse.map((p) => p.y)).toEqual(rowsBefore.map((r) => r.eclipseMin));
  });
});

describe('local-time-drift', () => {
  it('grows each drift linearly at the engine rate: value at 5 years = 5 × rate (1e-12 min)', async () => {
    const block = evaluated('injection-sensitivity', {
      altitudeKm: 700,
      inclinationDeg: 98.19,
      inclinationErrorDeg: 0.05,
      altitudeErrorKm: 5,
    });
    const outcome = buildFigureSpec('local-time-drift', block);
    if (!outcome.ok) throw new Error(outcome.error);
    const lines = layerValues(outcome.spec, 'series_lines') as { series: string; x: number; y: number }[];
    const at5 = (series: string) => lines.find((p) => p.series === series && p.x === 5)?.y;
    const o = block.result.outputs as Record<string, number>;
    expect(at5('Inclination error +0.05 deg')).toBeCloseTo(5 * o.driftFromInclinationMinPerYear, 12);
    expect(at5('Altitude error +5 km')).toBeCloseTo(5 * o.driftFromAltitudeMinPerYear, 12);
    expect(at5('Both errors together')).toBeCloseTo(5 * o.localTimeDriftMinPerYear, 12);
    expect(lines.filter((p) => p.x === 0).every((p) => p.y === 0)).toBe(true);
    const svg = await renderFigureSvg(outcome.spec);
    expect(svgTexts(svg)).toEqual(
      expect.arrayContaining(['Time since injection (years)', 'Node local-time drift (min)', 'Both errors together']),
    );
    // Greyscale print: the three series carry three different dash patterns.
    const paths = [...svg.matchAll(/<g class="mark-line role-mark series_lines_marks"[^>]*>(<path [^>]*>)/g)].map(
      (m) => m[1],
    );
    const dashes = new Set(paths.map((path) => /stroke-dasharray="([^"]*)"/.exec(path)?.[1] ?? 'solid'));
    expect(dashes.size).toBe(3);
  });
});

describe('altitude-decay', () => {
  it('draws the engine decay series (exponential path): starts at the block altitude, ends at the lifetime, altitude falls, time = L(h0) − L(h)', () => {
    const inputs = {
      altitudeKm: 450,
      massKg: 310,
      areaM2: 1.6,
      dragCoefficient: 2.2,
      solarActivity: 'moderate',
      atmosphere: 'exponential',
    };
    const block = evaluated('drag-decay', inputs);
    const outcome = buildFigureSpec('altitude-decay', block);
    if (!outcome.ok) throw new Error(outcome.error);
    const history = layerValues(outcome.spec, 'decay') as { years: number; altitudeKm: number }[];
    expect(history[0]).toEqual({ years: 0, altitudeKm: 450 });
    const last = history[history.length - 1];
    expect(last.years).toBeCloseTo((block.result.outputs.lifetimeDays as number) / 365.25, 9);
    expect(last.altitudeKm).toBeLessThanOrEqual(200);
    for (let k = 1; k < history.length; k++) expect(history[k].altitudeKm).toBeLessThan(history[k - 1].altitudeKm);
    // A middle point: the time to fall from 450 km to h is L(450) − L(h), both from runCalc.
    const mid = history[20];
    const lower = runCalc('drag-decay', { ...inputs, altitudeKm: mid.altitudeKm });
    const expected =
      ((block.result.outputs.lifetimeDays as number) -
        (lower.ok ? (lower.result.outputs.lifetimeDays as number) : NaN)) /
      365.25;
    expect(mid.years).toBeCloseTo(expected, 9);
  });
});

describe('altitude-decay of a result stored before the decay series', () => {
  it('rebuilds the history with the static exponential model those results used: time to a middle altitude = L(h0) − L(h) (1e-9 yr)', () => {
    const inputs = {
      altitudeKm: 450,
      massKg: 310,
      areaM2: 1.6,
      dragCoefficient: 2.2,
      solarActivity: 'moderate',
      atmosphere: 'exponential',
    };
    const block = evaluated('drag-decay', inputs);
    const { series: _series, ...oldOutputs } = block.result.outputs;
    const { atmosphere: _atmosphere, ...oldInputs } = block.result.inputs;
    const old = { ...block, result: { ...block.result, inputs: oldInputs, outputs: oldOutputs } };
    const outcome = buildFigureSpec('altitude-decay', old);
    if (!outcome.ok) throw new Error(outcome.error);
    const history = layerValues(outcome.spec, 'decay') as { years: number; altitudeKm: number }[];
    const mid = history[20];
    const lower = runCalc('drag-decay', { ...inputs, altitudeKm: mid.altitudeKm });
    const expected =
      ((block.result.outputs.lifetimeDays as number) -
        (lower.ok ? (lower.result.outputs.lifetimeDays as number) : NaN)) /
      365.25;
    expect(mid.years).toBeCloseTo(expected, 9);
  });
});

describe('decay-solar-flux', () => {
  it('draws the engine decay series over dates: altitudes and F10.7 equal to the engine rows, dates as given; refuses the exponential path', async () => {
    const inputs = {
      altitudeKm: 450,
      massKg: 100,
      areaM2: 1,
      dragCoefficient: 2.2,
      startEpoch: '2026-01-01T00:00:00Z',
    };
    const block = evaluated('drag-decay', inputs);
    const outcome = buildFigureSpec('decay-solar-flux', block);
    if (!outcome.ok) throw new Error(outcome.error);
    const series = block.result.outputs.series as { date: string; altitudeKm: number; f107Average: number }[];
    expect(layerValues(outcome.spec, 'altitude_lines').map((p) => p.y)).toEqual(series.map((r) => r.altitudeKm));
    expect(layerValues(outcome.spec, 'flux_lines').map((p) => p.y)).toEqual(series.map((r) => r.f107Average));
    expect(layerValues(outcome.spec, 'flux_lines').map((p) => p.x)).toEqual(series.map((r) => r.date));
    expect(svgTexts(await renderFigureSvg(outcome.spec))).toEqual(
      expect.arrayContaining(['Mean altitude (km)', 'F10.7 (sfu)', 'Date (UTC)']),
    );
    const flat = buildFigureSpec('decay-solar-flux', evaluated('drag-decay', { ...inputs, atmosphere: 'exponential' }));
    expect(flat).toEqual({ ok: false, error: expect.stringContaining('nrlmsise-00') });
  });
});

describe('propagation-elements', () => {
  it('draws numerical histories of a, i and RAAN with the analytic secular ones alongside, values equal to the engine rows', async () => {
    const block = evaluated('propagation-check', {
      altitudeKm: 700,
      inclinationDeg: 98.19,
      days: 1,
      integrator: 'dop853',
      relTol: 1e-9,
    });
    const outcome = buildFigureSpec('propagation-elements', block);
    if (!outcome.ok) throw new Error(outcome.error);
    const history = block.result.outputs.history as Record<string, number>[];
    const series = (layer: string, name: string) =>
      (layerValues(outcome.spec, layer) as { series: string; y: number }[])
        .filter((p) => p.series === name)
        .map((p) => p.y);
    expect(series('element0_lines', 'Numerical (osculating)')).toEqual(history.map((r) => r.smaKm));
    expect(series('element0_lines', 'Analytic J2 secular')).toEqual(history.map((r) => r.smaAnalyticKm));
    expect(series('element1_lines', 'Numerical (osculating)')).toEqual(history.map((r) => r.inclinationDeg));
    expect(series('element1_lines', 'Analytic J2 secular')).toEqual(history.map((r) => r.inclinationAnalyticDeg));
    const raan = layerValues(outcome.spec, 'element2_lines') as { series: string; y: number }[];
    expect(raan.filter((p) => p.series === 'Analytic J2 secular').map((p) => p.y)).toEqual(
      history.map((r) => r.raanAnalyticDeg),
    );
    expect(svgTexts(await renderFigureSvg(outcome.spec))).toEqual(
      expect.arrayContaining(['Semi-major axis (km)', 'Inclination (deg)', 'RAAN (deg)', 'Time (d)']),
    );
  });
});

describe('node-local-time-mission', () => {
  const INPUTS = {
    altitudeKm: 700,
    ltanHours: 22.5,
    startEpoch: '2027-09-15T00:00:00Z',
    years: 5,
    ltanToleranceMin: 10,
  };

  it("draws the block's monthly deviations, the ±tolerance band, and the optimal-bias parabola from a second run of the kind (to 1e-12 min)", async () => {
    const block = evaluated('solar-inclination-drift', INPUTS);
    const spec = specOf('node-local-time-mission', 'solar-inclination-drift', INPUTS);
    const lines = layerValues(spec, 'series_lines');
    const series = block.result.outputs.series as { years: number; ltanDeviationMin: number }[];
    const asGiven = lines.filter((p) => p.series === 'No bias');
    expect(asGiven.map((p) => p.y)).toEqual(series.map((r) => r.ltanDeviationMin));
    const bias = block.result.outputs.optimalBiasDeg as number;
    const rerun = runCalc('solar-inclination-drift', { ...INPUTS, inclinationBiasDeg: bias });
    if (!rerun.ok) throw new Error(rerun.error);
    const optimal = lines.filter((p) => p.series !== 'No bias');
    expect(optimal).toHaveLength(series.length);
    optimal.forEach((p, k) =>
      expect(p.y as number).toBeCloseTo(
        (rerun.result.outputs.series as { ltanDeviationMin: number }[])[k].ltanDeviationMin,
        12,
      ),
    );
    expect(layerValues(spec, 'tolerance_band')).toEqual([{ x0: 0, x1: 5, y0: -10, y1: 10 }]);
    const texts = svgTexts(await renderFigureSvg(spec));
    expect(texts).toContain('Node local time − reference 22:30 (min)');
    expect(texts).toContain('Time since injection (years)');
  });

  it('without a tolerance: one line, no band', () => {
    const spec = specOf('node-local-time-mission', 'solar-inclination-drift', {
      ...INPUTS,
      ltanToleranceMin: undefined,
    });
    expect(new Set(layerValues(spec, 'series_lines').map((p) => p.series))).toEqual(new Set(['No bias']));
    expect(() => layerValues(spec, 'tolerance_band')).toThrow();
  });
});

describe('dispersion-histogram', () => {
  it('draws the engine histogram bins, a normal curve whose area equals the sample count, and the ±99.73 % rules', async () => {
    const block = evaluated('injection-dispersion', {
      altitudeKm: 700,
      sigmaAltitudeKm: 2,
      sigmaInclinationDeg: 0.02,
      samples: 20_000,
      seed: 4,
    });
    const outcome = buildFigureSpec('dispersion-histogram', block);
    if (!outcome.ok) throw new Error(outcome.error);
    const histogram = block.result.outputs.histogram as { binLowMinPerYear: number; count: number }[];
    expect(layerValues(outcome.spec, 'bins').map((b) => b.count)).toEqual(histogram.map((r) => r.count));
    expect(layerValues(outcome.spec, 'bins').map((b) => b.from)).toEqual(histogram.map((r) => r.binLowMinPerYear));
    const p997 = block.result.outputs.ltanDriftP997MinPerYear as number;
    expect(layerValues(outcome.spec, 'p997_limits').map((r) => r.x)).toEqual([-p997, p997]);
    // trapezoid area under the curve / bin width = samples inside ±(range) ≈ 20 000 (the range spans > ±4σ: within 0.5 %)
    const curve = layerValues(outcome.spec, 'normal_curve') as { x: number; count: number }[];
    let area = 0;
    for (let k = 1; k < curve.length; k++)
      area += ((curve[k].count + curve[k - 1].count) / 2) * (curve[k].x - curve[k - 1].x);
    const width = (block.result.outputs.histogram as { binLowMinPerYear: number; binHighMinPerYear: number }[])[0];
    expect(area / (width.binHighMinPerYear - width.binLowMinPerYear) / 20_000).toBeGreaterThan(0.995);
    expect(area / (width.binHighMinPerYear - width.binLowMinPerYear) / 20_000).toBeLessThan(1.005);
    expect(svgTexts(await renderFigureSvg(outcome.spec))).toEqual(
      expect.arrayContaining(['Node local-time drift (min/yr)', 'Samples per bin']),
    );
  });
});

describe('as-flown-local-time-altitude', () => {
  it("draws the tle-check series against flat design lines taken from the block (LTAN input, design a on SGP4's radius)", async () => {
    const block = evaluated('tle-check', { tle: TERNLIGHT_TLES, designLtanHours: 22.5, designAltitudeKm: 692.84 });
    const outcome = buildFigureSpec('as-flown-local-time-altitude', block);
    if (!outcome.ok) throw new Error(outcome.error);
    const series = block.result.outputs.series as { date: string; ltanHours: number; meanAltitudeKm: number }[];
    const ltan = layerValues(outcome.spec, 'ltan_lines');
    expect(ltan.filter((p) => p.series === 'As flown (TLE)').map((p) => p.y)).toEqual(series.map((r) => r.ltanHours));
    expect(ltan.filter((p) => p.series === 'Design').map((p) => p.y)).toEqual([22.5, 22.5]);
    const altitude = layerValues(outcome.spec, 'altitude_lines');
    expect(altitude.filter((p) => p.series === 'As flown (TLE)').map((p) => p.y)).toEqual(
      series.map((r) => r.meanAltitudeKm),
    );
    expect(altitude.filter((p) => p.series === 'Design').map((p) => p.y)).toEqual(
      [0, 1].map(() => block.result.outputs.designMeanAltitudeSgp4Km),
    );
    expect(svgTexts(await renderFigureSvg(outcome.spec))).toEqual(
      expect.arrayContaining(['LTAN (mean Sun) (h)', 'Mean altitude (SGP4) (km)', 'TLE epoch (UTC)', 'Design']),
    );
  });

  it('draws only the flown values when the block has no design values', () => {
    const outcome = buildFigureSpec('as-flown-local-time-altitude', evaluated('tle-check', { tle: TERNLIGHT_TLES }));
    if (!outcome.ok) throw new Error(outcome.error);
    expect(layerValues(outcome.spec, 'ltan_lines').every((p) => p.series === 'As flown (TLE)')).toBe(true);
  });
});
