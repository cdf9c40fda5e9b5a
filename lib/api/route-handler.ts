import 'server-only';
import { NextRequest, NextResponse } from 'next/server';
import { z } from 'zod';
import { toErrorBody, badRequest, fieldsFromZod, describeFields } from './errors';
import { assertSameOriginWrite } from './request-origin';
import { readBodyBytes, readJsonBody } from './request-body';
import { requireActor } from '@/lib/auth/current-actor';
import type { Actor } from '@/lib/auth/permissions';

type Params = Record<string, string | string[]>;
type Handler<P extends Params> = (ctx: { req: NextRequest; actor: Actor; params: P }) => Promise<Response | unknown>;

/**
 * The error shape as a response. A 413 also closes the connection, so the
 * server stops receiving the rest of a body it has refused.
 */
function errorResponse(err: unknown): Response {
  const { status, body, headers } = toErrorBody(err);
  return NextResponse.json(body, { status, headers: status === 413 ? { ...headers, connection: 'close' } : headers });
}

/**
 * Wraps a route handler: refuses a state-changing request from another origin
 * (403, see request-origin.ts), requires a session (401), runs it, turns the
 * one error type (and zod errors) into the JSON error shape, and serialises
 * plain return values as 200 JSON.
 */
export function withActor<P extends Params = Params>(handler: Handler<P>) {
  return async (req: NextRequest, context: { params: Promise<P> }): Promise<Response> => {
    try {
      assertSameOriginWrite(req);
      const actor = await requireActor();
      const params = (await context.params) ?? ({} as P);
      const out = await handler({ req, actor, params });
      return out instanceof Response ? out : NextResponse.json(out);
    } catch (err) {
      return errorResponse(err);
    }
  };
}

/**
 * For the few routes used before anyone is signed in (invitation and
 * password-reset links): the same error shape, no session required.
 */
export function withoutActor<P extends Params = Params>(
  handler: (ctx: { req: NextRequest; params: P }) => Promise<Response | unknown>,
) {
  return async (req: NextRequest, context: { params: Promise<P> }): Promise<Response> => {
    try {
      assertSameOriginWrite(req);
      const out = await handler({ req, params: (await context.params) ?? ({} as P) });
      return out instanceof Response ? out : NextResponse.json(out);
    } catch (err) {
      return errorResponse(err);
    }
  };
}

/**
 * Reads a JSON body (Content-Type application/json, at most JSON_BODY_MAX_BYTES,
 * see request-body.ts) and validates it; malformed JSON is a 400, never a 500.
 */
export async function parseJsonBody<T>(req: NextRequest, schema: z.ZodType<T>): Promise<T> {
  return parseWith(schema, await readJsonBody(req));
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
  if (!Number.isSafeInteger(n) || n < 1)
    throw badRequest(`${name} must be a positive whole number.`, { [name]: 'must be a positive whole number' });
  return n;
}

export function searchParamsObject(req: NextRequest): Record<string, string> {
  return Object.fromEntries(req.nextUrl.searchParams.entries());
}

/**
 * For handlers that read their body themselves (next-auth's): the body is read
 * within `maxBytes` first (413 otherwise), then handed on as a fresh request.
 */
export function withBodyLimit<C>(maxBytes: number, handler: (req: NextRequest, context: C) => Promise<Response>) {
  return async (req: NextRequest, context: C): Promise<Response> => {
    let bytes: Buffer;
    try {
      bytes = await readBodyBytes(req, maxBytes);
    } catch (err) {
      return errorResponse(err);
    }
    const copy = new NextRequest(req.url, {
      method: req.method,
      headers: req.headers,
      body: bytes.length > 0 ? new Uint8Array(bytes) : undefined,
    });
    return handler(copy, context);
  };
}
