// A CSV on the Web metadata document ("Metadata Vocabulary for Tabular Data", W3C Recommendation
// 2015) written from a profile, as a starting point for declaring what each column must satisfy:
// the dialect as read, each column's title and datatype, `required` where no cell was missing, the
// observed range of numeric and date columns as bounds, and the level of measurement in Assay's
// extension property. The user edits it; nothing here is a rule the data has to follow already.
import type { ColumnProfile, DateStats, NumericStats, Profile } from '../profile/types';
import { LEVEL_PROPERTY, ORDER_PROPERTY } from './parse-column';

const BASE: Record<ColumnProfile['type'], string> = {
  integer: 'integer',
  decimal: 'decimal',
  boolean: 'boolean',
  date: 'date',
  datetime: 'dateTime',
  text: 'string',
};

function datatype(c: ColumnProfile, withBounds: boolean): string | Record<string, unknown> {
  const base = BASE[c.type];
  if (!withBounds || !c.stats) return base;
  if (c.type === 'integer' || c.type === 'decimal') {
    const s = c.stats as NumericStats;
    return { base, minimum: s.min, maximum: s.max };
  }
  if (c.type === 'date') {
    const s = c.stats as DateStats;
    return { base, minimum: s.min, maximum: s.max };
  }
  return base;
}

export interface MetadataOptions {
  /** The data file's name relative to where the metadata will be saved. */
  url: string;
  /** Declare the observed min and max as bounds (default false: bounds are a decision, not a fact). */
  bounds?: boolean;
}

/**
 * @example metadataFromProfile(profile, { url: 'batches.csv' }) // '{\n  "@context": "http://www.w3.org/ns/csvw", ...'
 */
export function metadataFromProfile(profile: Profile, options: MetadataOptions): string {
  const tokens = new Set<string>();
  for (const c of profile.columns) for (const t of c.missingTokens) if (t.token !== '(no field)') tokens.add(t.token);
  const columns = profile.columns.map((c) => {
    const col: Record<string, unknown> = {
      titles: c.name,
      datatype: datatype(c, options.bounds ?? false),
    };
    if (c.missing === 0 && c.count > 0) col.required = true;
    col[LEVEL_PROPERTY] = c.level;
    if (c.level === 'ordinal' && c.order) col[ORDER_PROPERTY] = c.order;
    return col;
  });
  const doc: Record<string, unknown> = {
    '@context': 'http://www.w3.org/ns/csvw',
    url: options.url,
    dialect: {
      delimiter: profile.delimiter,
      quoteChar: profile.quote,
      header: profile.header,
      encoding: profile.encoding,
    },
    tableSchema: { columns },
  };
  // The table's null tokens, when the file uses more than the empty cell.
  const nonEmpty = [...tokens].filter((t) => t !== '');
  if (nonEmpty.length > 0) (doc.tableSchema as Record<string, unknown>).null = ['', ...nonEmpty];
  return JSON.stringify(doc, null, 2) + '\n';
}
