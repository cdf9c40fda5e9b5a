/** JSON with object keys sorted, so equal inputs give equal text whatever their order. */
export function stableStringify(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(stableStringify).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${stableStringify(v)}`).join(',')}}`;
  }
  return JSON.stringify(value);
}

/** The cache key of one engine request: the same on server (initial results) and client (SWR). */
export const calcRequestKey = (kind: string, inputs: Record<string, unknown>): string =>
  `calc:${kind}:${stableStringify(inputs)}`;
