import { ORBIT_MESSAGE_LIMITS, OrbitMessageError, type KvnItem } from './orbit-message-types';

/** Keywords that stand alone on their line (OEM block delimiters, 502.0-B-3 §5, from memory). */
const BARE_KEYWORDS = new Set(['META_START', 'META_STOP', 'COVARIANCE_START', 'COVARIANCE_STOP']);
const KEYWORD = /^[A-Z][A-Z0-9_]*$/;
const VALUE_WITH_UNIT = /^(.*?)\s*\[([^\]]*)\]$/;

/**
 * Splits a KVN message (CCSDS 502.0-B-3 §7, clauses from memory: one `KEYWORD = value [unit]`
 * per line, COMMENT lines, blank lines allowed, keywords in upper case) into
 * items with their 1-based line numbers. Ephemeris data lines of an OEM (an
 * epoch followed by numbers, as in annex G6) come back as data items. Only the form of
 * each line is checked here; what may appear where is checked by the OPM and
 * OEM builders. Throws OrbitMessageError naming the line.
 */
export function readKvnItems(text: string): KvnItem[] {
  if (text.length > ORBIT_MESSAGE_LIMITS.maxChars) {
    throw new OrbitMessageError(
      0,
      null,
      `the message has ${text.length} characters; at most ${ORBIT_MESSAGE_LIMITS.maxChars} are accepted`,
    );
  }
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\r|\n/);
  if (lines.length > ORBIT_MESSAGE_LIMITS.maxLines) {
    throw new OrbitMessageError(
      0,
      null,
      `the message has ${lines.length} lines; at most ${ORBIT_MESSAGE_LIMITS.maxLines} are accepted`,
    );
  }
  const items: KvnItem[] = [];
  lines.forEach((raw, index) => {
    const line = index + 1;
    if (raw.length > ORBIT_MESSAGE_LIMITS.maxLineChars)
      throw new OrbitMessageError(
        line,
        null,
        `the line has ${raw.length} characters; at most ${ORBIT_MESSAGE_LIMITS.maxLineChars} are accepted`,
      );
    // eslint-disable-next-line no-control-regex
    if (/[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/.test(raw))
      throw new OrbitMessageError(line, null, 'the line holds control characters; a KVN message is plain text');
    const trimmed = raw.trim();
    if (trimmed === '') return;
    if (trimmed === 'COMMENT' || trimmed.startsWith('COMMENT ') || trimmed.startsWith('COMMENT\t')) {
      items.push({
        kind: 'keyword',
        line,
        keyword: 'COMMENT',
        value: trimmed.slice('COMMENT'.length).trim(),
        unit: null,
      });
      return;
    }
    if (BARE_KEYWORDS.has(trimmed)) {
      items.push({ kind: 'keyword', line, keyword: trimmed, value: '', unit: null });
      return;
    }
    const eq = trimmed.indexOf('=');
    if (eq < 0) {
      if (/^[0-9]/.test(trimmed)) {
        items.push({ kind: 'data', line, fields: trimmed.split(/\s+/) });
        return;
      }
      const word = trimmed.split(/\s+/)[0].slice(0, 40);
      throw new OrbitMessageError(
        line,
        KEYWORD.test(word) ? word : null,
        `expected "KEYWORD = value", a COMMENT or an ephemeris data line, found "${trimmed.slice(0, 60)}"`,
      );
    }
    const keyword = trimmed.slice(0, eq).trim();
    if (!KEYWORD.test(keyword)) {
      throw new OrbitMessageError(
        line,
        null,
        `"${keyword.slice(0, 40)}" is not a keyword: keywords are upper-case letters, digits and underscores`,
      );
    }
    const rest = trimmed.slice(eq + 1).trim();
    const withUnit = VALUE_WITH_UNIT.exec(rest);
    const value = withUnit ? withUnit[1].trim() : rest;
    if (value === '') throw new OrbitMessageError(line, keyword, 'has no value');
    items.push({ kind: 'keyword', line, keyword, value, unit: withUnit ? withUnit[2].trim() : null });
  });
  if (items.length === 0) throw new OrbitMessageError(0, null, 'the message is empty');
  return items;
}
