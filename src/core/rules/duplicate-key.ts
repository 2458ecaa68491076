// Repeated values in a column that looks like a key: one declared as the primary key in metadata,
// or one named like an identifier (id, key, code, ...) whose values are nearly all distinct
// (default at least 95%). A repeat in such a column usually means a duplicated record or a typing
// slip (common practice; cf. primary keys in "Model for Tabular Data" §4.5).
import { asCoded, type CodedCells } from './coded-cells';
import { DEFAULT_MAX_FLAGS, skippedResult } from './hit-list';
import { messageNumber } from './message-number';
import { severityOf } from './severity';
import { BLANK_IS_MISSING, REVIEW, type CapOptions, type IsMissing, type RuleHit, type RuleResult } from './types';

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
 * cells are skipped. Cost: O(distinct texts), plus a row scan up to the last hit kept.
 * Example: a column "id" of 1..100 with "7" again at row 101 flags row 101, "repeats row 7".
 */
export function duplicateKey(cells: readonly string[] | CodedCells, options: DuplicateKeyOptions): RuleResult {
  const isMissing = options.isMissing ?? BLANK_IS_MISSING;
  const minShare = options.minDistinctShare ?? 0.95;
  const { codes, texts, counts } = asCoded(cells);
  const missing = texts.map((cell) => isMissing(cell));
  let n = 0;
  let distinct = 0;
  for (let t = 0; t < texts.length; t++) {
    if (missing[t]) continue;
    n += counts[t]!;
    distinct++;
  }
  if (n === 0) return skippedResult('duplicate-key', 'no values');
  const share = distinct / n;
  let why: string;
  if (options.declared) why = 'the metadata declares it the primary key';
  else if (!looksLikeKeyName(options.name)) return skippedResult('duplicate-key', 'the column is not named like a key and is not declared one');
  else if (share < minShare) return skippedResult('duplicate-key', `only ${messageNumber(100 * share)}% of values are distinct, below ${messageNumber(100 * minShare)}%`);
  else why = `it is named like a key and ${messageNumber(100 * share)}% of its values are distinct`;
  // Every cell of a value but its first is a repeat.
  const total = n - distinct;
  const maxFlags = options.maxFlags ?? DEFAULT_MAX_FLAGS;
  const hits: RuleHit[] = [];
  if (total > 0 && maxFlags > 0) {
    const first = new Int32Array(texts.length).fill(-1);
    for (let i = 0; i < codes.length; i++) {
      const t = codes[i]!;
      if (missing[t]) continue;
      const at = first[t]!;
      if (at < 0) {
        first[t] = i;
        continue;
      }
      const cell = texts[t]!;
      const message = `${JSON.stringify(cell)} repeats the value of row ${at + 1} in "${options.name}", which looks like a key (${why})${REVIEW}`;
      hits.push({ index: i, value: cell, severity: severityOf('duplicate-key'), message });
      if (hits.length >= maxFlags) break;
    }
  }
  return { rule: 'duplicate-key', hits, total, skipped: null };
}
