/** Text longer than this, or of more lines, is shown summarised where inputs are listed (PDF, result tables). */
export const LONG_TEXT_CHARS = 160;
const LONG_TEXT_LINES = 3;

/**
 * A long free-text input (a pasted orbit data message of hundreds of lines) as one
 * line: its first non-blank line and its size — the PDF and the block's input list
 * show that, while the memo keeps the whole text.
 */
export function summariseLongText(text: string): string {
  const lines = text.split(/\r\n|\r|\n/);
  if (text.length <= LONG_TEXT_CHARS && lines.length <= LONG_TEXT_LINES) return text;
  const first = (lines.find((l) => l.trim() !== '') ?? '').trim().slice(0, 80);
  return `${first} … (${lines.length} lines, ${text.length.toLocaleString('en-GB')} characters)`;
}
