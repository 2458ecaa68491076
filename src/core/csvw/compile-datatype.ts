// One datatype description turned into a reader for cell strings: the lexical form and `format`
// of the base ("Metadata Vocabulary for Tabular Data" §6.4), then the length constraints (§5.11.2,
// "Model for Tabular Data" §4.6.1) and value constraints (§4.6.2).
import { compileDateFormat, type DateFamily } from './date-format';
import { compileNumberFormat, type NumericFamily } from './number-format';
import type { DatatypeDescription, NumericFormat } from './types';
import { BUILT_IN_DATATYPES, LENGTH_BASES } from './vocabulary';

export type DatatypeReading =
  | { ok: true; value: number | string | boolean }
  | { ok: false; constraint: string; reason: string };

/** A problem with the description itself, keyed by the offending member. */
export interface DatatypeProblem {
  key: string;
  message: string;
}

export interface CompiledDatatype {
  read: (s: string) => DatatypeReading;
  problems: DatatypeProblem[];
}

const BOUNDS = ['minInclusive', 'minExclusive', 'maxInclusive', 'maxExclusive'] as const;
type BoundKey = (typeof BOUNDS)[number];

const BOUND_WORDS: Record<BoundKey, string> = {
  minInclusive: 'is below the minimum',
  minExclusive: 'is not above the exclusive minimum',
  maxInclusive: 'is above the maximum',
  maxExclusive: 'is not below the exclusive maximum',
};

const passes = (key: BoundKey, v: number, b: number): boolean =>
  key === 'minInclusive' ? v >= b : key === 'minExclusive' ? v > b : key === 'maxInclusive' ? v <= b : v < b;

/** The lexical reader of a base, before constraints; `problem` describes an unusable format. */
type LexicalReading = { ok: true; value: number | string | boolean; order: number | null } | { ok: false; reason: string };

function lexicalReader(dt: DatatypeDescription): { read: (s: string) => LexicalReading; problem: string | null; order: ((b: string | number) => number | null) | null } {
  const info = BUILT_IN_DATATYPES.get(dt.base);
  const family = info?.family ?? 'string';
  const format = dt.format;
  if (family === 'integer' || family === 'decimal' || family === 'double') {
    const nf = typeof format === 'string' ? { pattern: format, decimalChar: '.', groupChar: null } : (format as NumericFormat | null);
    const { read, problem } = compileNumberFormat(family as NumericFamily, nf);
    const plain = compileNumberFormat(family as NumericFamily, null).read;
    const order = (b: string | number): number | null => {
      if (typeof b === 'number') return b;
      const r = plain(b);
      return r.ok ? r.value : null;
    };
    return {
      read: (s) => {
        const r = read(s);
        return r.ok ? { ok: true, value: r.value, order: Number.isNaN(r.value) ? null : r.value } : r;
      },
      problem,
      order,
    };
  }
  if (family === 'date' || family === 'datetime' || family === 'time') {
    const pattern = typeof format === 'string' ? format : null;
    let problem: string | null = format !== null && typeof format !== 'string' ? 'a date or time format must be a string' : null;
    let read = compileDateFormat(family as DateFamily, null, info?.zone === true);
    try {
      if (pattern !== null) read = compileDateFormat(family as DateFamily, pattern, info?.zone === true);
    } catch (e) {
      problem = (e as Error).message;
    }
    const plain = compileDateFormat(family as DateFamily, null);
    const order = (b: string | number): number | null => {
      if (typeof b !== 'string') return null;
      const r = plain(b);
      if (r.ok) return r.value;
      const f = read(b);
      return f.ok ? f.value : null;
    };
    return {
      read: (s) => {
        const r = read(s);
        return r.ok ? { ok: true, value: r.iso, order: r.value } : r;
      },
      problem,
      order,
    };
  }
  if (family === 'boolean') {
    let yes = ['true', '1'];
    let no = ['false', '0'];
    let problem: string | null = null;
    if (format !== null) {
      const parts = typeof format === 'string' ? format.split('|') : [];
      if (parts.length === 2 && parts[0] !== '' && parts[1] !== '' && parts[0] !== parts[1]) {
        yes = [parts[0] as string];
        no = [parts[1] as string];
      } else problem = `a boolean format must be the true value and the false value separated by "|" (e.g. "Y|N"), got ${JSON.stringify(format)}`;
    }
    const expected = `is not ${[...yes, ...no].map((t) => `"${t}"`).join(', ').replace(/, ([^,]*)$/, ' or $1')}`;
    return {
      read: (s) => (yes.includes(s) ? { ok: true, value: true, order: null } : no.includes(s) ? { ok: true, value: false, order: null } : { ok: false, reason: expected }),
      problem,
      order: null,
    };
  }
  if (family === 'string' && format !== null) {
    if (typeof format !== 'string') return { read: (s) => ({ ok: true, value: s, order: null }), problem: 'a string format must be a regular expression', order: null };
    try {
      // The whole value must match, as an XML Schema pattern facet does.
      const re = new RegExp(`^(?:${format})$`);
      return { read: (s) => (re.test(s) ? { ok: true, value: s, order: null } : { ok: false, reason: `does not match the pattern /${format}/` }), problem: null, order: null };
    } catch {
      return { read: (s) => ({ ok: true, value: s, order: null }), problem: `not a valid regular expression: ${JSON.stringify(format)}`, order: null };
    }
  }
  return { read: (s) => ({ ok: true, value: s, order: null }), problem: null, order: null };
}

/**
 * Compiles a datatype description. Problems with the description (a bad format, unusable bounds,
 * contradictory constraints) are returned, not thrown: the standard ignores such a member and goes on.
 * Example: compileDatatype({ base: 'integer', minInclusive: 1, ... }).read('0') gives
 * { ok: false, constraint: 'minInclusive', reason: 'is below the minimum 1' }.
 */
export function compileDatatype(dt: DatatypeDescription): CompiledDatatype {
  const problems: DatatypeProblem[] = [];
  const info = BUILT_IN_DATATYPES.get(dt.base);
  const lex = lexicalReader(dt);
  if (lex.problem !== null) problems.push({ key: 'format', message: lex.problem });
  const hasFormat = dt.format !== null && lex.problem === null;

  const bounds: { key: BoundKey; text: string; at: number }[] = [];
  for (const key of BOUNDS) {
    const b = dt[key];
    if (b === null) continue;
    const at = lex.order?.(b) ?? null;
    if (at === null || Number.isNaN(at)) {
      problems.push({ key, message: lex.order ? `${JSON.stringify(b)} is not a value of the datatype ${dt.base}` : `value bounds apply to numbers, dates and times, and the datatype is ${dt.base}` });
    } else bounds.push({ key, text: String(b), at });
  }
  const bound = (k: BoundKey): number | undefined => bounds.find((x) => x.key === k)?.at;
  const [minI, minE, maxI, maxE] = [bound('minInclusive'), bound('minExclusive'), bound('maxInclusive'), bound('maxExclusive')];
  // Contradictions the standard names (§5.11.2): both kinds of one bound, or an empty range.
  if (minI !== undefined && minE !== undefined) problems.push({ key: 'minExclusive', message: 'minInclusive and minExclusive are both given; use one' });
  if (maxI !== undefined && maxE !== undefined) problems.push({ key: 'maxExclusive', message: 'maxInclusive and maxExclusive are both given; use one' });
  if (minI !== undefined && maxI !== undefined && maxI < minI) problems.push({ key: 'maxInclusive', message: `the maximum is less than the minimum` });
  if (minI !== undefined && maxE !== undefined && maxE <= minI) problems.push({ key: 'maxExclusive', message: `the exclusive maximum is not above the minimum` });
  if (minE !== undefined && maxE !== undefined && maxE < minE) problems.push({ key: 'maxExclusive', message: `the exclusive maximum is less than the exclusive minimum` });
  if (minE !== undefined && maxI !== undefined && maxI <= minE) problems.push({ key: 'maxInclusive', message: `the maximum is not above the exclusive minimum` });

  const lengths: { key: 'length' | 'minLength' | 'maxLength'; n: number }[] = [];
  for (const key of ['length', 'minLength', 'maxLength'] as const) {
    const n = dt[key];
    if (n === null) continue;
    if (!LENGTH_BASES.has(dt.base)) problems.push({ key, message: `length constraints apply to strings and binary data, and the datatype is ${dt.base}` });
    else lengths.push({ key, n });
  }
  const len = (k: string): number | undefined => lengths.find((x) => x.key === k)?.n;
  const [L, minL, maxL] = [len('length'), len('minLength'), len('maxLength')];
  if (L !== undefined && minL !== undefined && minL > L) problems.push({ key: 'minLength', message: 'minLength is greater than length' });
  if (L !== undefined && maxL !== undefined && maxL < L) problems.push({ key: 'maxLength', message: 'maxLength is less than length' });
  if (minL !== undefined && maxL !== undefined && maxL < minL) problems.push({ key: 'maxLength', message: 'maxLength is less than minLength' });

  // Implied bounds of the integer subtypes (nonNegativeInteger, byte, ...).
  const implied = info?.family === 'integer' ? { min: info.min, max: info.max } : null;

  const read = (s: string): DatatypeReading => {
    const r = lex.read(s);
    if (!r.ok) return { ok: false, constraint: hasFormat ? 'format' : 'datatype', reason: r.reason };
    const v = r.value;
    if (implied && typeof v === 'number') {
      if ((implied.min !== undefined && v < implied.min) || (implied.max !== undefined && v > implied.max)) {
        return { ok: false, constraint: 'datatype', reason: `is outside the range of ${dt.base}` };
      }
    }
    if (r.order !== null) {
      for (const b of bounds) if (!passes(b.key, r.order, b.at)) return { ok: false, constraint: b.key, reason: `${BOUND_WORDS[b.key]} ${b.text}` };
    }
    if (lengths.length > 0) {
      const n = [...s].length;
      for (const l of lengths) {
        const bad = l.key === 'length' ? n !== l.n : l.key === 'minLength' ? n < l.n : n > l.n;
        const word = l.key === 'length' ? 'the declared length is' : l.key === 'minLength' ? 'the declared minimum length is' : 'the declared maximum length is';
        if (bad) return { ok: false, constraint: l.key, reason: `has ${n} character${n === 1 ? '' : 's'}; ${word} ${l.n}` };
      }
    }
    return { ok: true, value: v };
  };
  return { read, problems };
}
