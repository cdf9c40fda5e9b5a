import { beforeAll, describe, expect, inject, it } from 'vitest';
import { HttpSession } from '../../scripts/support/http-session';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';

/**
 * POST /api/calc answers bad input with a 400 whose `fields` name the field,
 * what it accepts with its unit, and the value sent — a wrong type is not
 * reported as missing. Expected wording and ranges are those the kind publishes
 * in its descriptor, GET /api/calc/kinds (sso-inclination: altitudeKm, km, 100–6000).
 */

let analyst: HttpSession;
beforeAll(async () => {
  analyst = new HttpSession(inject('baseUrl'));
  expect(await analyst.signIn(DEMO_USERS.find((u) => u.role === 'analyst')!.email, DEMO_PASSWORD)).toBe(true);
});

type CalcError = { error: string; fields: Record<string, string> };

const post = (inputs: unknown) =>
  analyst.json<CalcError>('/api/calc', { method: 'POST', body: JSON.stringify({ kind: 'sso-inclination', inputs }) });

describe('POST /api/calc over HTTP', () => {
  it.each([
    [{ altitudeKm: 'abc' }, 'altitudeKm: must be a number in km from 100 to 6000 (got text "abc")'],
    [{ altitudeKm: true }, 'altitudeKm: must be a number in km from 100 to 6000 (got boolean true)'],
    [{ altitudeKm: null }, 'altitudeKm: must be a number in km from 100 to 6000 (got null)'],
    [{ altitudeKm: 50 }, 'altitudeKm: must be at least 100 km (got 50)'],
  ])('%j → 400 naming the field, its unit and the value sent', async (inputs, message) => {
    const res = await post(inputs);
    expect(res.status).toBe(400);
    expect(res.body.fields.altitudeKm).toBe(message);
  });
});

describe('POST /api/calc with the analyst’s solar-activity table', () => {
  it('a malformed table gives 400 naming the field, the line and the reason', async () => {
    const solarActivityTableCsv = 'date,f107,f107Average,ap\n2027-01-01,120,118,10\n2027-02-01,130,121';
    const res = await analyst.json<CalcError>('/api/calc', {
      method: 'POST',
      body: JSON.stringify({ kind: 'drag-decay', inputs: { solarFlux: 'table', solarActivityTableCsv } }),
    });
    expect(res.status).toBe(400);
    expect(res.body.fields.solarActivityTableCsv).toBe(
      'solarActivityTableCsv: line 3: expected 4 comma-separated values (date, f107, f107Average, ap), got 3',
    );
  });

  it('a well-formed table is used (the result echoes the solar flux source)', async () => {
    const solarActivityTableCsv = ['date,f107,f107Average,ap', '2026-01-01,150,150,12', '2031-01-01,150,150,12'].join(
      '\n',
    );
    const res = await analyst.json<{ inputs: Record<string, unknown>; outputs: Record<string, unknown> }>('/api/calc', {
      method: 'POST',
      body: JSON.stringify({
        kind: 'drag-decay',
        inputs: { altitudeKm: 350, startEpoch: '2026-02-01T00:00:00Z', solarFlux: 'table', solarActivityTableCsv },
      }),
    });
    expect(res.status).toBe(200);
    expect(res.body.inputs.solarFlux).toBe('table');
    expect(res.body.outputs.lifetimeDays).toBeGreaterThan(0);
  });
});

describe('POST /api/calc tle-check over HTTP', () => {
  /** Satellite 00005 of Vallado et al. 2006 (AIAA 2006-6753) and its TEME state at epoch from tcppver.out. */
  const TLE_00005 =
    '1 00005U 58002B   00179.78495062  .00000023  00000-0  28098-4 0  4753\n2 00005  34.2682 348.7242 1859667 331.7664  19.3264 10.82419157413667';
  const postTle = (tle: string) =>
    analyst.json<CalcError & { outputs: Record<string, unknown> }>('/api/calc', {
      method: 'POST',
      body: JSON.stringify({ kind: 'tle-check', inputs: { tle } }),
    });

  it('answers the published TEME state (1e-7 km) for a good TLE', async () => {
    const res = await postTle(TLE_00005);
    expect(res.status).toBe(200);
    const r = res.body.outputs.positionTemeKm as number[];
    expect(Math.abs(r[0] - 7022.46529266)).toBeLessThan(1e-7);
  });

  it('answers a wrong checksum with 400 naming the line, the column and the expected and found digits', async () => {
    const res = await postTle(TLE_00005.replace('4753', '4758'));
    expect(res.status).toBe(400);
    expect(res.body.fields.tle).toBe(
      'tle: text line 1 (line 1 of TLE set 1): checksum (column 69) is 8, expected 3 from columns 1–68: the line was altered or mistyped',
    );
  });
});
