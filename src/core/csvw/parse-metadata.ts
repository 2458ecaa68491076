// Reading a CSV on the Web metadata document (W3C Recommendation 17 December 2015, "Metadata
// Vocabulary for Tabular Data") for one table: a table description, or a table group whose first
// table is used. Every invalid property is reported with its JSON path and position, then ignored,
// so that the rest of the metadata still applies.
import { checkCommonProperty } from './check-common-property';
import { isObject, MetadataReader, shown, type JsonObject } from './metadata-reader';
import { itemPath, JsonSyntaxError, memberPath, parseJson, type JsonValue } from './parse-json';
import { parseColumn } from './parse-column';
import { parseDialect } from './parse-dialect';
import { INHERITED_KEYS, NO_INHERITED, readInherited, type Inherited } from './parse-inherited';
import type { ColumnDescription, DialectDescription, MetadataError, TableMetadata } from './types';
import { CSVW_CONTEXT } from './vocabulary';

export interface ParsedMetadata {
  /** Null only when the text is not JSON or not an object. */
  metadata: TableMetadata | null;
  errors: MetadataError[];
}

const GROUP_KEYS = new Set(['@context', '@type', 'tables', 'dialect', 'tableDirection', 'tableSchema', 'transformations']);
const TABLE_KEYS = new Set(['@context', '@type', 'url', 'dialect', 'suppressOutput', 'tableDirection', 'tableSchema', 'transformations']);
const SCHEMA_KEYS = new Set(['@type', 'columns', 'primaryKey', 'foreignKeys', 'rowTitles']);

/** `@context` must be the CSV on the Web context, alone or followed by an object with only @base and @language (§5.2). */
function checkContext(v: JsonValue | undefined, r: MetadataReader): void {
  const at = '$["@context"]';
  if (v === undefined) {
    r.warning('$', `has no @context; expected "${CSVW_CONTEXT}"`);
    return;
  }
  if (v === CSVW_CONTEXT) return;
  if (Array.isArray(v) && v.length === 2 && v[0] === CSVW_CONTEXT && isObject(v[1])) {
    for (const [k, x] of Object.entries(v[1])) {
      const p = memberPath(itemPath(at, 1), k);
      if (k !== '@base' && k !== '@language') r.error(p, 'a local context may only hold @base and @language');
      else if (typeof x !== 'string') r.error(p, `expected a string, got ${shown(x)}`);
    }
    return;
  }
  r.error(at, `expected "${CSVW_CONTEXT}" or ["${CSVW_CONTEXT}", { "@base"?, "@language"? }], got ${shown(v)}`);
}

/** Members every description may carry besides its own: inherited, common and `@id`. */
function others(obj: JsonObject, own: ReadonlySet<string>, path: string, r: MetadataReader): void {
  for (const [k, v] of Object.entries(obj)) {
    if (own.has(k) || INHERITED_KEYS.has(k)) continue;
    const at = memberPath(path, k);
    if (k === '@context' && path !== '$') r.error(at, 'only allowed at the top of the document');
    else if (k === 'notes') {
      // Notes are annotations in the same restricted JSON-LD as common properties (§5.3, §5.4).
      if (!Array.isArray(v)) r.error(at, `expected an array, got ${shown(v)}`);
      else checkCommonProperty(v, at, (p, m) => r.error(p, m));
    } else r.other(at, k, v);
  }
}

function parseSchema(v: JsonValue, path: string, r: MetadataReader, inh: Inherited): { columns: ColumnDescription[]; primaryKey: string[] } {
  const out = { columns: [] as ColumnDescription[], primaryKey: [] as string[] };
  if (typeof v === 'string') {
    r.error(path, 'a schema given by URL is not supported; write the schema inline');
    return out;
  }
  if (!isObject(v)) {
    r.error(path, `expected a schema (an object with columns), got ${shown(v)}`);
    return out;
  }
  r.type(memberPath(path, '@type'), v['@type'], 'Schema');
  const own = readInherited(v, path, r, inh);
  const cols = v.columns;
  const colsPath = memberPath(path, 'columns');
  if (cols !== undefined && !Array.isArray(cols)) r.error(colsPath, `expected an array of column descriptions, got ${shown(cols)}`);
  if (Array.isArray(cols)) {
    cols.forEach((c, i) => {
      const col = parseColumn(c, itemPath(colsPath, i), r, own);
      if (col) out.columns.push(col);
    });
  }
  // Names must be unique (§5.6), and virtual columns come after all others (§5.6 virtual).
  const seen = new Map<string, number>();
  let virtualSeen = false;
  out.columns.forEach((c, i) => {
    if (c.name !== null) {
      const first = seen.get(c.name);
      if (first !== undefined) r.error(memberPath(c.path, 'name'), `"${c.name}" is also the name of column ${first + 1}; names must be unique`);
      else seen.set(c.name, i);
    }
    if (c.virtual) virtualSeen = true;
    else if (virtualSeen) r.error(c.path, 'a non-virtual column must not follow a virtual one');
  });
  const pk = v.primaryKey;
  if (pk !== undefined) {
    const at = memberPath(path, 'primaryKey');
    const names = typeof pk === 'string' ? [pk] : Array.isArray(pk) && pk.every((x) => typeof x === 'string') ? (pk as string[]) : null;
    if (names === null) r.error(at, `expected a column name or an array of column names, got ${shown(pk)}`);
    else {
      const known = new Set(out.columns.map((c) => c.name ?? c.titles[0]).filter((n): n is string => n !== undefined));
      const unknown = names.filter((n) => !known.has(n));
      if (unknown.length > 0) r.error(at, `names no column of the schema: ${unknown.map((n) => `"${n}"`).join(', ')}`);
      else out.primaryKey = names;
    }
  }
  if (v.foreignKeys !== undefined) r.warning(memberPath(path, 'foreignKeys'), 'foreign keys are not checked by Assay');
  others(v, SCHEMA_KEYS, path, r);
  return out;
}

function parseTable(t: JsonObject, path: string, r: MetadataReader, inh: Inherited, groupDialect: DialectDescription, groupSchema: JsonValue | undefined, location: string): TableMetadata {
  const own = readInherited(t, path, r, inh);
  let url: string | null = null;
  if (typeof t.url === 'string') url = t.url;
  else if (t.url !== undefined) r.error(memberPath(path, 'url'), `expected the data file's URL as a string, got ${shown(t.url)}`);
  else r.warning(path, 'has no url; the metadata is applied to the file it was given with');
  const dialect = t.dialect !== undefined ? parseDialect(t.dialect, memberPath(path, 'dialect'), r) : groupDialect;
  for (const k of ['suppressOutput'] as const) {
    if (t[k] !== undefined && typeof t[k] !== 'boolean') r.error(memberPath(path, k), `expected true or false, got ${shown(t[k])}`);
  }
  const schemaValue = t.tableSchema ?? groupSchema;
  const schemaPath = t.tableSchema !== undefined ? memberPath(path, 'tableSchema') : '$.tableSchema';
  const schema = schemaValue === undefined ? { columns: [], primaryKey: [] } : parseSchema(schemaValue, schemaPath, r, own);
  if (schemaValue === undefined) r.warning(path, 'has no tableSchema; only the dialect applies');
  return { location, url, dialect, columns: schema.columns, primaryKey: schema.primaryKey, aboutUrl: own.aboutUrl };
}

/**
 * Parses a metadata document for one table. Errors carry the JSON path and, when known, the line
 * and column of the offending value; a JSON syntax error gives null metadata.
 * Example: parseMetadata('{"@context": "http://www.w3.org/ns/csvw", "url": "a.csv",
 * "tableSchema": {"columns": [{"name": "n", "datatype": "integer"}]}}', 'a.csv-metadata.json')
 * gives one column named "n" of base integer, and no errors.
 */
export function parseMetadata(text: string, location: string): ParsedMetadata {
  let parsed;
  try {
    parsed = parseJson(text);
  } catch (e) {
    if (!(e instanceof JsonSyntaxError)) throw e;
    return { metadata: null, errors: [{ path: '$', line: e.line, column: e.column, severity: 'error', message: `${location}: ${e.message}` }] };
  }
  const r = new MetadataReader(parsed.positions);
  const root = parsed.value;
  if (!isObject(root)) {
    r.error('$', `expected a JSON object (a table or table group description), got ${shown(root)}`);
    return { metadata: null, errors: r.errors };
  }
  checkContext(root['@context'], r);
  let metadata: TableMetadata;
  if (root.tables !== undefined) {
    r.type('$["@type"]', root['@type'], 'TableGroup');
    const inh = readInherited(root, '$', r, NO_INHERITED);
    const dialect = root.dialect !== undefined ? parseDialect(root.dialect, '$.dialect', r) : {};
    const tables = Array.isArray(root.tables) ? root.tables : [];
    if (!Array.isArray(root.tables) || tables.length === 0) r.error('$.tables', `expected a non-empty array of table descriptions, got ${shown(root.tables)}`);
    if (tables.length > 1) r.warning('$.tables', `holds ${tables.length} tables; Assay uses the first`);
    tables.slice(1).forEach((t, i) => {
      if (!isObject(t)) r.error(itemPath('$.tables', i + 1), `expected a table description (an object), got ${shown(t)}`);
    });
    const first = tables[0];
    const t0: JsonObject = isObject(first) ? first : {};
    if (first !== undefined && !isObject(first)) r.error('$.tables[0]', `expected a table description (an object), got ${shown(first)}`);
    r.type('$.tables[0]["@type"]', t0['@type'], 'Table');
    metadata = parseTable(t0, '$.tables[0]', r, inh, dialect, root.tableSchema, location);
    others(t0, TABLE_KEYS, '$.tables[0]', r);
    others(root, GROUP_KEYS, '$', r);
  } else {
    r.type('$["@type"]', root['@type'], 'Table');
    metadata = parseTable(root, '$', r, NO_INHERITED, {}, undefined, location);
    others(root, TABLE_KEYS, '$', r);
  }
  return { metadata, errors: r.errors };
}
