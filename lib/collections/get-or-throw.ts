/**
 * The value stored under `key`, for lookups where a missing key would be a
 * programming error (the map was built from the same keys). Throws an Error
 * naming `what` was missing instead of letting `undefined` flow on.
 */
export function getOrThrow<K, V>(map: ReadonlyMap<K, V>, key: K, what: string): V {
  const value = map.get(key);
  if (value === undefined && !map.has(key)) throw new Error(`${what} not found: ${String(key)}`);
  return value as V;
}
