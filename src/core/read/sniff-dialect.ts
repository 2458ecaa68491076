// Works out how a delimited text file is written, from a sample of its start: delimiter, quote,
// header, decimal separator and line ending, each with the reason in plain words. An option the
// user gave always wins over the guess.
import type { LineEnding } from '../profile/types';
import { guessDecimalSeparator } from './guess-decimal-separator';
import { guessHeader } from './guess-header';
import { splitSample, type SampleRecords } from './split-sample';

export interface Dialect {
  delimiter: string;
  quote: string;
  header: boolean;
  decimalSeparator: '.' | ',';
  lineEnding: LineEnding;
  /** One sentence per choice, in the order delimiter, quote, header, decimal separator, line ending. */
  reasons: string[];
}

export interface DialectOverrides {
  delimiter: string | null;
  quote: string | null;
  header: boolean | null;
  decimalSeparator: '.' | ',' | null;
}

const DELIMITERS = [',', ';', '\t', '|'] as const;
const QUOTES = ['"', "'"] as const;
/** Records read from the sample per candidate: enough to judge, bounded for long samples. */
const MAX_RECORDS = 500;

function show(ch: string): string {
  return ch === '\t' ? 'tab' : `"${ch}"`;
}

interface Trial {
  delimiter: string;
  quote: string;
  split: SampleRecords;
  /** Records judged: a last record the sample may have cut is left out. */
  judged: string[][];
  /** Share of records with the most common field count; 0 when that count is 1. */
  consistency: number;
  /** The most common field count. */
  fields: number;
}

function trial(sample: string, delimiter: string, quote: string): Trial {
  const split = splitSample(sample, delimiter, quote, MAX_RECORDS);
  const judged = !split.endsWithBreak && split.records.length > 1 ? split.records.slice(0, -1) : split.records;
  const tally = new Map<number, number>();
  for (const r of judged) tally.set(r.length, (tally.get(r.length) ?? 0) + 1);
  let fields = 0;
  let top = 0;
  for (const [count, times] of tally) {
    if (times > top || (times === top && count > fields)) {
      fields = count;
      top = times;
    }
  }
  const consistency = judged.length > 0 && fields > 1 ? top / judged.length : 0;
  return { delimiter, quote, split, judged, consistency, fields };
}

/** Better when clearly more consistent; among nearly equally consistent ones, more fields. */
function better(a: Trial, b: Trial): boolean {
  if (Math.abs(a.consistency - b.consistency) > 0.05) return a.consistency > b.consistency;
  if (a.fields !== b.fields) return a.fields > b.fields;
  return a.consistency > b.consistency;
}

/** For one delimiter: `"` unless only `'` wraps fields in the sample (and reads as well). */
function pickQuote(double: Trial, single: Trial): Trial {
  return single.split.quotedFields > 0 && double.split.quotedFields === 0 && !better(double, single) ? single : double;
}

function lineEndingOf(s: SampleRecords): LineEnding {
  const kinds = (s.lf > 0 ? 1 : 0) + (s.crlf > 0 ? 1 : 0) + (s.cr > 0 ? 1 : 0);
  if (kinds === 0) return 'none';
  if (kinds > 1) return 'mixed';
  return s.lf > 0 ? 'LF' : s.crlf > 0 ? 'CRLF' : 'CR';
}

/**
 * Sniffs the dialect of `sample` (decoded text from the start of the file; a last line the sample
 * cut short is not held against a candidate). Cost O(sample length x 8 candidates).
 * Example: `sniffDialect('id;price\n1;12,5\n2;3,75\n', none)` gives delimiter ";", quote '"',
 * header true, decimal separator ",", line ending LF.
 */
export function sniffDialect(sample: string, overrides: DialectOverrides): Dialect {
  const delimiters = overrides.delimiter !== null ? [overrides.delimiter] : DELIMITERS;
  const quotes = overrides.quote !== null ? [overrides.quote] : QUOTES;
  let best: Trial | null = null;
  for (const d of delimiters) {
    // A quote the same as the delimiter cannot be read (the option checks forbid giving both).
    const tried = quotes.filter((q) => q !== d).map((q) => trial(sample, d, q));
    if (tried.length === 0) continue;
    const pick = tried.length === 2 ? pickQuote(tried[0]!, tried[1]!) : tried[0]!;
    if (best === null || better(pick, best)) best = pick;
  }
  const chosen = best!;
  const reasons: string[] = [];

  if (overrides.delimiter !== null) reasons.push(`delimiter ${show(chosen.delimiter)}: given as an option`);
  else if (chosen.consistency === 0) {
    reasons.push(`delimiter ${show(chosen.delimiter)}: none of comma, semicolon, tab or pipe splits the records, so the file is read as one column`);
  } else {
    const agree = Math.round(chosen.consistency * chosen.judged.length);
    reasons.push(`delimiter ${show(chosen.delimiter)}: it splits ${agree} of ${chosen.judged.length} sampled records into the same ${chosen.fields} fields, more consistently than the other candidates`);
  }

  const quoted = chosen.split.quotedFields;
  if (overrides.quote !== null) reasons.push(`quote ${show(chosen.quote)}: given as an option`);
  else if (chosen.quote === "'") reasons.push(`quote "'": ${quoted} field${quoted === 1 ? ' is' : 's are'} wrapped in single quotes and none in double quotes`);
  else if (quoted > 0) reasons.push(`quote '"': ${quoted} field${quoted === 1 ? ' is' : 's are'} wrapped in double quotes`);
  else reasons.push(`quote '"': no quoted fields in the sample; the double quote is the RFC 4180 default`);

  // The decimal separator tells which values are numbers for the header test; it is settled again
  // over the data records once the header is known.
  let decimalSeparator = overrides.decimalSeparator ?? guessDecimalSeparator(chosen.judged, chosen.delimiter).separator;
  let header: boolean;
  if (overrides.header !== null) {
    header = overrides.header;
    reasons.push(`${header ? 'header' : 'no header'}: given as an option`);
  } else {
    const h = guessHeader(chosen.judged, decimalSeparator);
    header = h.header;
    reasons.push(h.reason);
  }
  if (overrides.decimalSeparator !== null) {
    reasons.push(`decimal separator "${decimalSeparator}": given as an option`);
  } else {
    const d = guessDecimalSeparator(header ? chosen.judged.slice(1) : chosen.judged, chosen.delimiter);
    decimalSeparator = d.separator;
    reasons.push(d.reason);
  }

  const lineEnding = lineEndingOf(chosen.split);
  const names: Record<LineEnding, string> = {
    LF: 'every line ends with LF',
    CRLF: 'every line ends with CRLF',
    CR: 'every line ends with CR alone',
    mixed: 'lines end in more than one way (LF, CRLF, CR)',
    none: 'the sample has no line break',
  };
  reasons.push(`line ending ${lineEnding}: ${names[lineEnding]} in the sample`);
  return { delimiter: chosen.delimiter, quote: chosen.quote, header, decimalSeparator, lineEnding, reasons };
}
