/** The first characters of a text an audit event quotes (a comment, the passage it is on), on one line. */
export function auditExcerpt(text: string | null | undefined, maxChars = 160): string {
  const line = (text ?? '').replace(/\s+/g, ' ').trim();
  return line.length > maxChars ? `${line.slice(0, maxChars - 1)}…` : line;
}
