// The `dialect` property ("Metadata Vocabulary for Tabular Data" §5.9 Dialect Descriptions): how to
// read the file. Only members the document declares are returned, so that the reader can still
// detect the others.
import { isObject, shown, type MetadataReader } from './metadata-reader';
import { memberPath, type JsonValue } from './parse-json';
import type { DialectDescription } from './types';

/** The standard's defaults for members a dialect leaves out. */
export const DEFAULT_DIALECT: Readonly<Required<DialectDescription>> = Object.freeze({
  delimiter: ',', quoteChar: '"', doubleQuote: true, header: true, headerRowCount: 1, encoding: 'utf-8',
  skipRows: 0, skipBlankRows: false, commentPrefix: null, trim: true,
});

/** Members the standard defines but Assay reads as usual (their effect is accepted, not applied). */
const ACCEPTED = new Set(['lineTerminators', 'skipColumns', 'skipInitialSpace']);

/**
 * Reads a dialect description. `header: false` implies headerRowCount 0, as the standard says.
 * Example: parseDialect({ delimiter: ';', header: false }, '$.dialect', r) gives { delimiter: ';', header: false, headerRowCount: 0 }.
 */
export function parseDialect(value: JsonValue, path: string, r: MetadataReader): DialectDescription {
  const d: DialectDescription = {};
  if (typeof value === 'string') {
    r.error(path, 'a dialect given by URL is not supported; write the dialect description inline');
    return d;
  }
  if (!isObject(value)) {
    r.error(path, `expected a dialect description (an object), got ${shown(value)}`);
    return d;
  }
  for (const [k, v] of Object.entries(value)) {
    const at = memberPath(path, k);
    const bool = (): boolean | null => (typeof v === 'boolean' ? v : (r.error(at, `expected true or false, got ${shown(v)}`), null));
    const count = (): number | null => (typeof v === 'number' && Number.isInteger(v) && v >= 0 ? v : (r.error(at, `expected a whole number of 0 or more, got ${shown(v)}`), null));
    switch (k) {
      case '@type': r.type(at, v, 'Dialect'); break;
      case 'delimiter':
        if (typeof v === 'string' && v.length > 0) d.delimiter = v;
        else r.error(at, `expected a non-empty string, got ${shown(v)}`);
        break;
      case 'quoteChar':
        if (v === null || (typeof v === 'string' && [...v].length === 1)) d.quoteChar = v;
        else r.error(at, `expected one character or null, got ${shown(v)}`);
        break;
      case 'commentPrefix':
        if (v === null || typeof v === 'string') d.commentPrefix = v;
        else r.error(at, `expected a string or null, got ${shown(v)}`);
        break;
      case 'encoding':
        if (typeof v === 'string') d.encoding = v.toLowerCase();
        else r.error(at, `expected an encoding name such as "utf-8", got ${shown(v)}`);
        break;
      case 'doubleQuote': case 'header': case 'skipBlankRows': {
        const b = bool();
        if (b !== null) d[k] = b;
        break;
      }
      case 'headerRowCount': case 'skipRows': {
        const n = count();
        if (n !== null) d[k] = n;
        break;
      }
      case 'trim':
        if (typeof v === 'boolean' || v === 'start' || v === 'end') d.trim = v;
        else if (v === 'true' || v === 'false') d.trim = v === 'true';
        else r.error(at, `expected true, false, "start" or "end", got ${shown(v)}`);
        break;
      default:
        if (!ACCEPTED.has(k)) r.other(at, k, v);
    }
  }
  if (d.header === false && d.headerRowCount === undefined) d.headerRowCount = 0;
  if (d.header === true && d.headerRowCount === 0) r.error(memberPath(path, 'headerRowCount'), 'is 0, and header is true');
  return d;
}
