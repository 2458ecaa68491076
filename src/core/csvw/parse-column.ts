// One column description ("Metadata Vocabulary for Tabular Data" §5.6), plus Assay's extension
// properties for what the standard does not describe: the level of measurement.
import type { Level } from '../profile/types';
import { isObject, shown, type MetadataReader } from './metadata-reader';
import { itemPath, memberPath, type JsonValue } from './parse-json';
import { INHERITED_KEYS, readInherited, type Inherited } from './parse-inherited';
import type { ColumnDescription } from './types';
import { isLanguageTag } from './vocabulary';

/**
 * Assay's extension property for a column's level of measurement: `"assay:level": "ordinal"`
 * (nominal, ordinal, interval or ratio). The standard allows other properties only as common
 * properties named by a prefixed name or an absolute URL (§5.8); `assay` is not a prefix of the
 * CSV on the Web context, so JSON-LD reads `assay:level` as an absolute IRI with the scheme
 * `assay`, and other processors keep it as an annotation. Assay never dereferences it.
 */
export const LEVEL_PROPERTY = 'assay:level';
/** Assay's extension property for the order of an ordinal column's categories, lowest first: an array of strings. */
export const ORDER_PROPERTY = 'assay:order';

const LEVELS: readonly Level[] = ['nominal', 'ordinal', 'interval', 'ratio'];

const COLUMN_KEYS = new Set(['name', 'titles', 'virtual', 'suppressOutput', '@type', '@id', LEVEL_PROPERTY, ORDER_PROPERTY]);

/** A name as the standard allows it: a URI template variable name (RFC 6570) not starting with "_". */
export function isColumnName(s: string): boolean {
  return /^(?:[A-Za-z0-9]|%[0-9A-Fa-f]{2})(?:\.?(?:[A-Za-z0-9_]|%[0-9A-Fa-f]{2}))*$/.test(s);
}

/** Reads a natural-language property (§5.1.3): a string, an array of strings, or a map from language tags to those. */
export function readTitles(v: JsonValue, path: string, r: MetadataReader): string[] {
  const strings = (x: JsonValue, at: string): string[] => {
    if (typeof x === 'string') return [x];
    if (Array.isArray(x)) {
      const out: string[] = [];
      x.forEach((t, i) => (typeof t === 'string' ? out.push(t) : r.error(itemPath(at, i), `expected a string, got ${shown(t)}`)));
      return out;
    }
    r.error(at, `expected a string or an array of strings, got ${shown(x)}`);
    return [];
  };
  if (!isObject(v)) return strings(v, path);
  const out: string[] = [];
  for (const [lang, x] of Object.entries(v)) {
    const at = memberPath(path, lang);
    if (!isLanguageTag(lang)) r.error(at, `expected a BCP 47 language tag as the key, got ${shown(lang)}`);
    else out.push(...strings(x, at));
  }
  return out;
}

/**
 * Reads one column description under the properties its table and schema pass down.
 * Example: parseColumn({ titles: 'Price', datatype: 'decimal', 'assay:level': 'ratio' }, path, r, inherited)
 * gives titles ['Price'], datatype base 'decimal', level 'ratio'.
 */
export function parseColumn(value: JsonValue, path: string, r: MetadataReader, parent: Inherited): ColumnDescription | null {
  if (!isObject(value)) {
    r.error(path, `expected a column description (an object), got ${shown(value)}`);
    return null;
  }
  const inh = readInherited(value, path, r, parent);
  const col: ColumnDescription = {
    path, ...r.at(path), name: null, titles: [], datatype: inh.datatype, nullTokens: inh.nullTokens,
    required: inh.required, default: inh.default, virtual: false, suppressOutput: false,
    aboutUrl: inh.aboutUrl, propertyUrl: inh.propertyUrl, valueUrl: inh.valueUrl, level: null, order: null,
  };
  for (const [k, v] of Object.entries(value)) {
    const at = memberPath(path, k);
    if (INHERITED_KEYS.has(k)) continue;
    if (!COLUMN_KEYS.has(k)) {
      r.other(at, k, v);
      continue;
    }
    switch (k) {
      case '@type': r.type(at, v, 'Column'); break;
      case '@id': r.other(at, k, v); break;
      case 'name':
        if (typeof v === 'string' && isColumnName(v)) col.name = v;
        else r.error(at, `expected a name of letters, digits, "_", "." and %-escapes, not starting with "_", got ${shown(v)}`);
        break;
      case 'titles': col.titles = readTitles(v, at, r); break;
      case 'virtual': case 'suppressOutput':
        if (typeof v === 'boolean') col[k] = v;
        else r.error(at, `expected true or false, got ${shown(v)}`);
        break;
      case LEVEL_PROPERTY:
        if (LEVELS.includes(v as Level)) col.level = v as Level;
        else r.error(at, `expected one of ${LEVELS.join(', ')}, got ${shown(v)}`);
        break;
      case ORDER_PROPERTY:
        if (Array.isArray(v) && v.length > 0 && v.every((x) => typeof x === 'string') && new Set(v).size === v.length) col.order = v as string[];
        else r.error(at, `expected an array of distinct category strings, lowest first, got ${shown(v)}`);
        break;
    }
  }
  if (col.order !== null) {
    if (col.level === null) col.level = 'ordinal';
    else if (col.level !== 'ordinal') r.error(memberPath(path, ORDER_PROPERTY), `applies to ordinal columns, and ${LEVEL_PROPERTY} is "${col.level}"`);
  }
  return col;
}
