// Repeated values in a column that looks like a key: one declared as the primary key in metadata,
// or one named like an identifier (id, key, code, ...) whose values are nearly all distinct
// (default at least 95%). A repeat in such a column usually means a duplicated record or a typing
// slip (common practice; cf. primary keys in "Model for Tabular Data" §4.5).
import { hitList, skippedResult } from './hit-list';
import { messageNumber } from './message-number';
import { severityOf } from './severity';
import { BLANK_IS_MISSING, REVIEW, type CapOptions, type IsMissing, type RuleResult } from './types';

const KEY_WORDS = new Set(['id', 'key', 'code', 'uuid', 'guid', 'identifier', 'sku']);

/**
 * True when a name has a word that names an identifier: words split at non-alphanumerics and at
 * camelCase boundaries. Example: looksLikeKeyName('batchID') and looksLikeKeyName('order_code') are
 * true; looksLikeKeyName('paid') and looksLikeKeyName('idle_time') are false.
 */
export function looksLikeKeyName(name: string): boolean {
  const words = name
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .replace(/([A-Z]+)([A-Z][a-z])/g, '$1 $2')
    .toLowerCase()
    .split(/[^\p{L}\p{N}]+/u);
  return words.some((w) => KEY_WORDS.has(w));
}

export interface DuplicateKeyOptions extends CapOptions {
  /** The column's name, for the name test. */
  name: string;
  /** True when metadata declares the column (alone) as the primary key. */
  declared?: boolean;
  /** Share of distinct values among non-missing cells needed for an undeclared key. Default 0.95. */
  minDistinctShare?: number;
  isMissing?: IsMissing;
}

/**
 * Flags each repeat of a value in a key-like column, naming the first row that had it. Missing
 * cells are skipped. Cost: one pass, memory for the distinct values.
 * Example: a column "id" of 1..100 with "7" again at row 101 flags row 101, "repeats row 7".
 */
export function duplicateKey(cells: readonly string[], options: DuplicateKeyOptions): RuleResult {
  const isMissing = options.isMissing ?? BLANK_IS_MISSING;
  const minShare = options.minDistinctShare ?? 0.95;
  const first = new Map<string, number>();
  let n = 0;
  for (let i = 0; i < cells.length; i++) {
    const cell = cells[i] as string;
    if (isMissing(cell)) continue;
    n++;
    if (!first.has(cell)) first.set(cell, i);
  }
  if (n === 0) return skippedResult('duplicate-key', 'no values');
  const share = first.size / n;
  let why: string;
  if (options.declared) why = 'the metadata declares it the primary key';
  else if (!looksLikeKeyName(options.name)) return skippedResult('duplicate-key', 'the column is not named like a key and is not declared one');
  else if (share < minShare) return skippedResult('duplicate-key', `only ${messageNumber(100 * share)}% of values are distinct, below ${messageNumber(100 * minShare)}%`);
  else why = `it is named like a key and ${messageNumber(100 * share)}% of its values are distinct`;
  const list = hitList('duplicate-key', options.maxFlags);
  for (let i = 0; i < cells.length; i++) {
    const cell = cells[i] as string;
    if (isMissing(cell)) continue;
    const at = first.get(cell) as number;
    if (at === i) continue;
    const message = `${JSON.stringify(cell)} repeats the value of row ${at + 1} in "${options.name}", which looks like a key (${why})${REVIEW}`;
    list.push({ index: i, value: cell, severity: severityOf('duplicate-key'), message });
  }
  return list.result();
}
