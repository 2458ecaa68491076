// Inherited properties ("Metadata Vocabulary for Tabular Data" §5.7): written on a table group, a
// table, a schema or a column, and in force for every column below unless a column overrides them.
import { shown, type JsonObject, type MetadataReader } from './metadata-reader';
import { memberPath } from './parse-json';
import { parseDatatype } from './parse-datatype';
import type { DatatypeDescription } from './types';
import { isLanguageTag } from './vocabulary';

export interface Inherited {
  datatype: DatatypeDescription | null;
  nullTokens: string[];
  required: boolean;
  default: string;
  aboutUrl: string | null;
  propertyUrl: string | null;
  valueUrl: string | null;
  lang: string;
}

export const NO_INHERITED: Inherited = Object.freeze({
  datatype: null, nullTokens: [''], required: false, default: '', aboutUrl: null, propertyUrl: null, valueUrl: null, lang: 'und',
});

export const INHERITED_KEYS: ReadonlySet<string> = new Set([
  'aboutUrl', 'datatype', 'default', 'lang', 'null', 'ordered', 'propertyUrl', 'required', 'separator', 'textDirection', 'valueUrl',
]);

/**
 * Reads the inherited properties written on `obj`, on top of those of its parent.
 * Example: readInherited({ null: ['NA', ''] }, '$', r, NO_INHERITED).nullTokens gives ['NA', ''].
 */
export function readInherited(obj: JsonObject, path: string, r: MetadataReader, parent: Inherited): Inherited {
  const out: Inherited = { ...parent };
  for (const k of INHERITED_KEYS) {
    if (!(k in obj)) continue;
    const v = obj[k];
    const at = memberPath(path, k);
    switch (k) {
      case 'datatype': if (v !== undefined) out.datatype = parseDatatype(v, at, r); break;
      case 'null':
        if (typeof v === 'string') out.nullTokens = [v];
        else if (Array.isArray(v) && v.every((x) => typeof x === 'string')) out.nullTokens = v as string[];
        else r.error(at, `expected a string or an array of strings, got ${shown(v)}`);
        break;
      case 'required':
        if (typeof v === 'boolean') out.required = v;
        else r.error(at, `expected true or false, got ${shown(v)}`);
        break;
      case 'default':
        if (typeof v === 'string') out.default = v;
        else r.error(at, `expected a string, got ${shown(v)}`);
        break;
      case 'aboutUrl': case 'propertyUrl': case 'valueUrl':
        if (typeof v === 'string') out[k] = v;
        else r.error(at, `expected a URI template string, got ${shown(v)}`);
        break;
      case 'lang':
        if (typeof v === 'string' && isLanguageTag(v)) out.lang = v;
        else r.error(at, `expected a BCP 47 language tag, got ${shown(v)}`);
        break;
      case 'separator':
        if (typeof v === 'string') r.warning(at, 'cells holding lists are checked as one value (separator is not supported)');
        else if (v !== null) r.error(at, `expected a string or null, got ${shown(v)}`);
        break;
      case 'ordered':
        if (typeof v !== 'boolean') r.error(at, `expected true or false, got ${shown(v)}`);
        break;
      case 'textDirection':
        if (!['ltr', 'rtl', 'auto', 'inherit'].includes(v as string)) r.error(at, `expected "ltr", "rtl", "auto" or "inherit", got ${shown(v)}`);
        break;
    }
  }
  return out;
}
