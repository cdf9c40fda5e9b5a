/** Longest input text shown as is; longer or multi-line text (a pasted table) is summarised. */
const INPUT_TEXT_SHOWN = 120;

/** 32-bit FNV-1a of the UTF-16 code units, as 8 hex digits (Fowler–Noll–Vo; offset basis 2166136261, prime 16777619). */
export function fingerprint(text: string): string {
  let h = 0x811c9dc5;
  for (let k = 0; k < text.length; k++) h = Math.imul(h ^ text.charCodeAt(k), 0x01000193);
  return (h >>> 0).toString(16).padStart(8, '0');
}

/**
 * A pasted table in a few words, for the PDF and the comparison of versions: its data lines (comments and blank
 * lines left out), size, a fingerprint that tells two tables apart, and its first and last lines.
 */
export function summariseInputText(text: string): string {
  if (text.length <= INPUT_TEXT_SHOWN && !/[\r\n]/.test(text)) return text;
  const lines = text
    .split(/\r\n|\n|\r/)
    .map((l) => l.trim())
    .filter((l) => l !== '' && !l.startsWith('#'));
  const clip = (l: string) => (l.length > 60 ? `${l.slice(0, 60)}…` : l);
  const ends =
    lines.length > 1
      ? `; first “${clip(lines[0])}”, last “${clip(lines[lines.length - 1])}”`
      : lines.length === 1
        ? `; “${clip(lines[0])}”`
        : '';
  return `pasted text, ${lines.length} ${lines.length === 1 ? 'line' : 'lines'} (${text.length.toLocaleString('en-GB')} characters, fingerprint ${fingerprint(text)})${ends}`;
}
