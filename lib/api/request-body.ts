import { ApiError, badRequest } from './errors';

/**
 * Request bodies are read only through these functions, which refuse a body
 * over its limit with a 413 before reading it in full: first by its declared
 * Content-Length, then by counting bytes as they stream in (a chunked body
 * declares no length). Nothing is parsed until the whole body is known to fit.
 */

const MIB = 1024 * 1024;

/** Largest JSON body of any route: a memo's content is at most 2 MiB when saved, plus room for the request around it. */
export const JSON_BODY_MAX_BYTES = 4 * MIB;

/** 413 naming the limit, in MiB or KiB. */
export function tooLarge(maxBytes: number, what: string, where = 'this route'): ApiError {
  const limit =
    maxBytes >= MIB
      ? `${(maxBytes / MIB).toFixed(maxBytes % MIB === 0 ? 0 : 1)} MiB`
      : `${Math.ceil(maxBytes / 1024)} KiB`;
  return new ApiError('too_large', `The ${what} is larger than ${where} accepts (at most ${limit}).`, {
    details: { maxBytes },
  });
}

/** A Content-Length header's value in bytes, or null when absent or not a plain decimal number. */
export function declaredContentLength(text: string | null | undefined): number | null {
  return text !== null && text !== undefined && /^\d+$/.test(text.trim()) ? Number(text) : null;
}

/** The media type of the request without parameters, lower case ('' when absent). */
export function mediaTypeOf(req: Request): string {
  return (req.headers.get('content-type') ?? '').split(';')[0].trim().toLowerCase();
}

/** 415 naming the expected type when the request's Content-Type is another. */
export function assertMediaType(req: Request, expected: 'application/json' | 'multipart/form-data'): void {
  const got = mediaTypeOf(req);
  if (got === expected) return;
  throw new ApiError(
    'unsupported_media_type',
    `Send the body as ${expected} (Content-Type: ${expected}); this request said ${got ? got : 'nothing'}.`,
    {
      fields: { 'content-type': `must be ${expected}` },
    },
  );
}

/**
 * The body's bytes, or a 413 as soon as it is known to exceed `maxBytes`.
 * On a stream over the limit the reader is released, not cancelled: cancelling
 * would destroy the socket before the 413 could be sent.
 */
export async function readBodyBytes(req: Request, maxBytes: number, what = 'request body'): Promise<Buffer> {
  const declared = declaredContentLength(req.headers.get('content-length'));
  if (declared !== null && declared > maxBytes) throw tooLarge(maxBytes, what);
  if (!req.body) return Buffer.alloc(0);
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let received = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    received += value.byteLength;
    if (received > maxBytes) {
      reader.releaseLock();
      throw tooLarge(maxBytes, what);
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks, received);
}

/** Reads a JSON body within the JSON limit; a wrong Content-Type is a 415, malformed JSON a 400 — never a 500. */
export async function readJsonBody(req: Request): Promise<unknown> {
  assertMediaType(req, 'application/json');
  const bytes = await readBodyBytes(req, JSON_BODY_MAX_BYTES, 'JSON body');
  try {
    return JSON.parse(bytes.toString('utf8'));
  } catch {
    throw badRequest('The request body is not valid JSON.', { _: 'body must be a JSON object' });
  }
}

/** Reads a multipart/form-data body within `maxBytes`, then parses it. */
export async function readMultipartForm(req: Request, maxBytes: number): Promise<FormData> {
  assertMediaType(req, 'multipart/form-data');
  const bytes = await readBodyBytes(req, maxBytes, 'upload');
  try {
    return await new Response(new Uint8Array(bytes), {
      headers: { 'content-type': req.headers.get('content-type') ?? '' },
    }).formData();
  } catch {
    throw badRequest('The upload is not well-formed multipart/form-data.', { _: 'malformed multipart body' });
  }
}
