import 'server-only';
import { NextResponse, type NextRequest } from 'next/server';
import { z } from 'zod';
import { toErrorBody, badRequest, fieldsFromZod, describeFields } from './errors';
import { requireActor } from '@/lib/auth/current-actor';
import type { Actor } from '@/lib/auth/permissions';

type Params = Record<string, string | string[]>;
type Handler<P extends Params> = (ctx: { req: NextRequest; actor: Actor; params: P }) => Promise<Response | unknown>;

/**
 * Wraps a route handler: requires a session (401), runs it, turns the one
 * error type (and zod errors) into the JSON error shape, and serialises
 * plain return values as 200 JSON.
 */
export function withActor<P extends Params = Params>(handler: Handler<P>) {
  return async (req: NextRequest, context: { params: Promise<P> }): Promise<Response> => {
    try {
      const actor = await requireActor();
      const params = (await context.params) ?? ({} as P);
      const out = await handler({ req, actor, params });
      return out instanceof Response ? out : NextResponse.json(out);
    } catch (err) {
      const { status, body, headers } = toErrorBody(err);
      return NextResponse.json(body, { status, headers });
    }
  };
}

/**
 * For the few routes used before anyone is signed in (invitation and
 * password-reset links): the same error shape, no session required.
 */
export function withoutActor<P extends Params = Params>(handler: (ctx: { req: NextRequest; params: P }) => Promise<Response | unknown>) {
  return async (req: NextRequest, context: { params: Promise<P> }): Promise<Response> => {
    try {
      const out = await handler({ req, params: (await context.params) ?? ({} as P) });
      return out instanceof Response ? out : NextResponse.json(out);
    } catch (err) {
      const { status, body, headers } = toErrorBody(err);
      return NextResponse.json(body, { status, headers });
    }
  };
}

/** Reads a JSON body and validates it; malformed JSON is a 400, never a 500. */
export async function parseJsonBody<T>(req: NextRequest, schema: z.ZodType<T>): Promise<T> {
  let raw: unknown;
  try {
    raw = await req.json();
  } catch {
    throw badRequest('The request body is not valid JSON.', { _: 'body must be a JSON object' });
  }
  return parseWith(schema, raw);
}

export function parseWith<T>(schema: z.ZodType<T>, raw: unknown): T {
  const result = schema.safeParse(raw);
  if (!result.success) {
    const fields = fieldsFromZod(result.error);
    throw badRequest(describeFields(fields), fields);
  }
  return result.data;
}

/** Parses a positive integer path parameter such as a memo id. */
export function parseId(value: string | string[] | undefined, name: string): number {
  const n = typeof value === 'string' && /^\d{1,12}$/.test(value) ? Number(value) : NaN;
  if (!Number.isSafeInteger(n) || n < 1) throw badRequest(`${name} must be a positive whole number.`, { [name]: 'must be a positive whole number' });
  return n;
}

export function searchParamsObject(req: NextRequest): Record<string, string> {
  return Object.fromEntries(req.nextUrl.searchParams.entries());
}
