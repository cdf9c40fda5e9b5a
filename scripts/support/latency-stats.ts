/** Nearest-rank percentile (q in 0…1) of a list of figures; NaN for an empty list. */
export function percentile(values: number[], q: number): number {
  if (values.length === 0) return NaN;
  const s = [...values].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor(q * s.length))];
}

/** p50 / p95 / p99 / max of latencies in milliseconds, as a table cell. */
export function latencyLine(ms: number[]): string {
  const f = (x: number) => (Number.isNaN(x) ? '—' : x < 10 ? x.toFixed(1) : x.toFixed(0));
  return `p50 ${f(percentile(ms, 0.5))} · p95 ${f(percentile(ms, 0.95))} · p99 ${f(percentile(ms, 0.99))} · max ${f(percentile(ms, 1))} ms`;
}
