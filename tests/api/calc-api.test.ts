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

const post = (inputs: unknown) => analyst.json<CalcError>('/api/calc', { method: 'POST', body: JSON.stringify({ kind: 'sso-inclination', inputs }) });

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
