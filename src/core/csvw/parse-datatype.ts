// The `datatype` property ("Metadata Vocabulary for Tabular Data" §5.7, §5.11): a built-in name, or
// a datatype description with `base`, `format`, value bounds and length bounds.
import { compileDatatype } from './compile-datatype';
import { isObject, shown, type MetadataReader } from './metadata-reader';
import { memberPath, type JsonValue } from './parse-json';
import type { DatatypeDescription, NumericFormat } from './types';
import { BUILT_IN_DATATYPES } from './vocabulary';

/** The description a column gets when none is declared: string, no constraints. */
export const STRING_DATATYPE: DatatypeDescription = Object.freeze({
  base: 'string', format: null, minInclusive: null, maxInclusive: null, minExclusive: null, maxExclusive: null,
  length: null, minLength: null, maxLength: null,
});

const NUMERIC = new Set(['integer', 'decimal', 'double']);

function knownBase(name: string, path: string, r: MetadataReader): boolean {
  if (BUILT_IN_DATATYPES.has(name)) {
    if (BUILT_IN_DATATYPES.get(name)?.family === 'unchecked') r.warning(path, `values of the datatype ${name} are not checked by Assay`);
    return true;
  }
  r.error(path, `expected the name of a built-in datatype (integer, decimal, double, number, boolean, date, dateTime, string, ...), got ${shown(name)}`);
  return false;
}

function readFormat(v: JsonValue, base: string, path: string, r: MetadataReader): string | NumericFormat | null {
  const numeric = NUMERIC.has(BUILT_IN_DATATYPES.get(base)?.family ?? '');
  if (typeof v === 'string') return numeric ? { pattern: v, decimalChar: '.', groupChar: null } : v;
  // Some metadata writes { "pattern": ... } for dates and strings too; read it as the pattern.
  if (!numeric && isObject(v) && typeof v.pattern === 'string' && Object.keys(v).length === 1) return v.pattern;
  if (numeric && isObject(v)) {
    const f: NumericFormat = { pattern: null, decimalChar: '.', groupChar: null };
    for (const [k, x] of Object.entries(v)) {
      const at = memberPath(path, k);
      if (k === 'pattern' || k === 'decimalChar' || k === 'groupChar') {
        if (typeof x !== 'string' || (k !== 'pattern' && x.length === 0)) r.error(at, `expected a string, got ${shown(x)}`);
        else f[k] = x;
      } else r.other(at, k, x);
    }
    return f;
  }
  r.error(path, `expected ${numeric ? 'a pattern string or an object with pattern, decimalChar, groupChar' : 'a string'}, got ${shown(v)}`);
  return null;
}

/**
 * Reads a `datatype` value, reporting each invalid member at its path; an invalid member is left out.
 * Example: parseDatatype({ base: 'date', format: 'M/d/yyyy' }, '$.datatype', r) gives base 'date',
 * format 'M/d/yyyy'.
 */
export function parseDatatype(value: JsonValue, path: string, r: MetadataReader): DatatypeDescription {
  if (typeof value === 'string') return knownBase(value, path, r) ? { ...STRING_DATATYPE, base: value } : { ...STRING_DATATYPE };
  if (!isObject(value)) {
    r.error(path, `expected a datatype name or a datatype description, got ${shown(value)}`);
    return { ...STRING_DATATYPE };
  }
  const dt: DatatypeDescription = { ...STRING_DATATYPE };
  const base = value.base;
  if (base !== undefined) {
    if (typeof base !== 'string') r.error(memberPath(path, 'base'), `expected a datatype name, got ${shown(base)}`);
    else if (knownBase(base, memberPath(path, 'base'), r)) dt.base = base;
  }
  if (typeof value['@id'] === 'string') r.warning(memberPath(path, '@id'), 'a datatype identified by @id is checked as its base only');
  // Where each folded bound was written, so that a problem points at what the user wrote.
  const written: Record<string, string> = {};
  for (const [k, v] of Object.entries(value)) {
    const at = memberPath(path, k);
    if (k === 'base') continue;
    if (k === '@type') r.type(at, v, 'Datatype');
    else if (k === 'format') dt.format = readFormat(v, dt.base, at, r);
    else if (k === 'minimum' || k === 'maximum' || k === 'minInclusive' || k === 'maxInclusive' || k === 'minExclusive' || k === 'maxExclusive') {
      const key = k === 'minimum' ? 'minInclusive' : k === 'maximum' ? 'maxInclusive' : k;
      if (typeof v !== 'number' && typeof v !== 'string') r.error(at, `expected a number or a string, got ${shown(v)}`);
      else if (dt[key] !== null && dt[key] !== v) r.error(at, `conflicts with ${written[key]} ${shown(dt[key])}`);
      else {
        dt[key] = v;
        written[key] = k;
      }
    } else if (k === 'length' || k === 'minLength' || k === 'maxLength') {
      if (typeof v !== 'number' || !Number.isInteger(v) || v < 0) r.error(at, `expected a whole number of 0 or more, got ${shown(v)}`);
      else dt[k] = v;
    } else r.other(at, k, v);
  }
  for (const p of compileDatatype(dt).problems) r.error(memberPath(path, written[p.key] ?? p.key), p.message);
  return dt;
}
