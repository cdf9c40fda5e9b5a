/** Client-side JSON calls that always resolve to a result: the API's error shape, or a network failure said plainly. */
export type JsonResult<T> =
  | { ok: true; status: number; data: T }
  | { ok: false; status: number; error: string; fields: Record<string, string>; body: Record<string, unknown> };

export async function requestJson<T>(url: string, init: RequestInit = {}): Promise<JsonResult<T>> {
  let res: Response;
  try {
    res = await fetch(url, { ...init, headers: { 'content-type': 'application/json', ...(init.headers ?? {}) } });
  } catch {
    return {
      ok: false,
      status: 0,
      error: 'The server could not be reached; check the connection and try again.',
      fields: {},
      body: {},
    };
  }
  let body: unknown = null;
  try {
    body = await res.json();
  } catch {
    body = null;
  }
  if (res.ok) return { ok: true, status: res.status, data: body as T };
  const b = (body && typeof body === 'object' ? body : {}) as Record<string, unknown>;
  return {
    ok: false,
    status: res.status,
    error: typeof b.error === 'string' ? b.error : `The server answered ${res.status}.`,
    fields: (b.fields && typeof b.fields === 'object' ? b.fields : {}) as Record<string, string>,
    body: b,
  };
}

export const postJson = <T>(url: string, data: unknown) =>
  requestJson<T>(url, { method: 'POST', body: JSON.stringify(data) });
export const patchJson = <T>(url: string, data: unknown) =>
  requestJson<T>(url, { method: 'PATCH', body: JSON.stringify(data) });
export const putJson = <T>(url: string, data: unknown) =>
  requestJson<T>(url, { method: 'PUT', body: JSON.stringify(data) });

/** SWR fetcher: throws the API error so SWR exposes it as `error`. */
export async function swrFetcher<T>(url: string): Promise<T> {
  const r = await requestJson<T>(url);
  if (!r.ok) throw Object.assign(new Error(r.error), { status: r.status, fields: r.fields });
  return r.data;
}
