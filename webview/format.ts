// Panel wording for numbers, intervals and file facts. Statistics go through the core's
// formatNumber so that the panel and the Markdown copy show the same digits.
import { formatNumber, NO_NUMBER } from '../src/core/markdown/format-number';
import type { EncodingName, GroupedRow, LineEnding } from '../src/core/profile/types';

export { NO_NUMBER };

/** A statistic at the user's significant digits; null reads as a dash. */
export function num(x: number | null | undefined, digits: number): string {
  return formatNumber(x ?? null, digits);
}

/**
 * A count, grouped in threes with a narrow no-break space (U+202F, the SI style): long counts stay
 * readable and the mark is the same in every locale.
 */
export function count(n: number): string {
  if (!Number.isFinite(n)) return NO_NUMBER;
  const sign = n < 0 ? '-' : '';
  const digits = String(Math.abs(Math.round(n)));
  return sign + digits.replace(/\B(?=(\d{3})+(?!\d))/g, '\u202f');
}

/** A share (0-1) as a percentage with one decimal, e.g. "12.5 %"; a share too small to show is "< 0.1 %", not "0.0 %". */
export function percent(share: number | null | undefined): string {
  if (share === null || share === undefined || !Number.isFinite(share)) return NO_NUMBER;
  if (share > 0 && share < 0.0005) return '<\u00a00.1\u00a0%';
  if (share < 1 && share > 0.9995) return '>\u00a099.9\u00a0%';
  return `${(share * 100).toFixed(1)}\u00a0%`;
}

/** An interval written [a, b), or [a, b] when it includes its upper edge. */
export function interval(row: Pick<GroupedRow, 'lower' | 'upper' | 'closed'>, digits: number): string {
  return `[${num(row.lower, digits)}, ${num(row.upper, digits)}${row.closed ? ']' : ')'}`;
}

const DELIMITERS: Record<string, string> = { ',': 'comma', '\t': 'tab', ';': 'semicolon', '|': 'pipe', ' ': 'space', ':': 'colon' };

/** The delimiter as a word, with the character when it prints. */
export function delimiterName(d: string): string {
  const name = DELIMITERS[d];
  if (name === undefined) return `U+${(d.codePointAt(0) ?? 0).toString(16).toUpperCase().padStart(4, '0')}`;
  return d === '\t' || d === ' ' ? name : `${name} (${d})`;
}

const ENCODINGS: Record<EncodingName, string> = { 'utf-8': 'UTF-8', 'utf-16le': 'UTF-16 LE', 'utf-16be': 'UTF-16 BE', 'windows-1252': 'Windows-1252' };

export function encodingName(e: EncodingName, bom: boolean): string {
  return (ENCODINGS[e] ?? String(e)) + (bom ? ' with BOM' : '');
}

const ENDINGS: Record<LineEnding, string> = { LF: 'LF', CRLF: 'CRLF', CR: 'CR', mixed: 'mixed', none: 'none' };

export function lineEndingName(l: LineEnding): string {
  return ENDINGS[l] ?? String(l);
}

/** Singular or plural noun after a count. */
export function plural(n: number, one: string, many = one + 's'): string {
  return `${count(n)} ${n === 1 ? one : many}`;
}
