/** Dates are shown in UTC with the zone named: memos are read across sites and time zones. */
export function formatDateTime(iso: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  return `${d.toISOString().slice(0, 10)} ${d.toISOString().slice(11, 16)} UTC`;
}

/** A span of time in UTC: "2026-12-02 09:02–09:18 UTC" within a day, both dates and times across days. */
export function formatTimeSpan(startIso: string, endIso: string): string {
  const [a, b] = [new Date(startIso), new Date(endIso)];
  if (Number.isNaN(a.getTime()) || Number.isNaN(b.getTime())) return `${startIso}–${endIso}`;
  const [da, db] = [a.toISOString(), b.toISOString()];
  return da.slice(0, 10) === db.slice(0, 10)
    ? `${da.slice(0, 10)} ${da.slice(11, 16)}–${db.slice(11, 16)} UTC`
    : `${formatDateTime(startIso)} – ${formatDateTime(endIso)}`;
}
