// A column's cells as codes into its distinct texts. The text rules decide once per distinct text
// and walk the rows only to collect the first hits they report: a column of millions of rows with
// a few hundred distinct values costs a few hundred string operations, not millions (the profile's
// dictionary already numbers the values, so no string per row is ever made).
import { DEFAULT_MAX_FLAGS } from './hit-list';
import type { RuleHit, RuleResult } from './types';
import type { RuleId } from '../options';

export interface CodedCells {
  /** Per row, the index of the cell's text in `texts`. */
  readonly codes: ArrayLike<number>;
  /** Each distinct cell text once, in order of first appearance (row order). */
  readonly texts: readonly string[];
  /** Rows holding each text. */
  readonly counts: ArrayLike<number>;
}

/**
 * Row codes into `labels` (`codeAt(row)` for rows 0 to rows − 1), turned into CodedCells: labels
 * that spell the same text become one, and texts are numbered in order of first appearance
 * whatever the labels' order. Cost: O(rows + labels), one call of `codeAt` per row.
 * @example recode(4, (r) => [2, 0, 1, 2][r]!, ['b', 'a', 'b']) // rows read b, b, a, b: codes [0, 0, 1, 0], texts ["b", "a"], counts [3, 1]
 */
export function recode(rows: number, codeAt: (row: number) => number, labels: readonly string[]): CodedCells {
  const same = new Int32Array(labels.length);
  const byText = new Map<string, number>();
  for (let i = 0; i < labels.length; i++) {
    const t = labels[i]!;
    const c = byText.get(t);
    if (c === undefined) byText.set(t, i);
    same[i] = c ?? i;
  }
  const order = new Int32Array(labels.length).fill(-1);
  const counts = new Float64Array(byText.size);
  const texts: string[] = [];
  const codes = new Int32Array(rows);
  for (let r = 0; r < rows; r++) {
    const c = same[codeAt(r)]!;
    let o = order[c]!;
    if (o < 0) {
      o = order[c] = texts.length;
      texts.push(labels[c]!);
    }
    counts[o]! += 1;
    codes[r] = o;
  }
  return { codes, texts, counts: counts.subarray(0, texts.length) };
}

/**
 * The cells given one string per row, as CodedCells. Cost: one hash lookup per row.
 * @example codeCells(['x', 'y', 'x']) // codes [0, 1, 0], texts ['x', 'y'], counts [2, 1]
 */
export function codeCells(cells: readonly string[]): CodedCells {
  const byText = new Map<string, number>();
  const texts: string[] = [];
  const counts: number[] = [];
  const codes = new Int32Array(cells.length);
  for (let r = 0; r < cells.length; r++) {
    const cell = cells[r]!;
    let c = byText.get(cell);
    if (c === undefined) {
      byText.set(cell, (c = texts.length));
      texts.push(cell);
      counts.push(0);
    }
    counts[c]! += 1;
    codes[r] = c;
  }
  return { codes, texts, counts };
}

/** Strings per row or coded cells, as coded cells (the rules take either). */
export function asCoded(cells: readonly string[] | CodedCells): CodedCells {
  return isCoded(cells) ? cells : codeCells(cells);
}

function isCoded(cells: readonly string[] | CodedCells): cells is CodedCells {
  return !Array.isArray(cells);
}

/** What a rule says of every cell holding one text: the hit without its row, or null for none. */
export type TextVerdict = Omit<RuleHit, 'index'> | null;

/**
 * A rule's result from one verdict per text: the total counts every row whose text has a hit, and
 * the hits are the first `maxFlags` such rows (row order), each a copy of its text's verdict.
 * Cost: O(texts), plus a scan of the rows up to the last hit kept (none when there are no hits).
 */
export function hitsByText(rule: RuleId, cells: CodedCells, verdicts: readonly TextVerdict[], maxFlags: number = DEFAULT_MAX_FLAGS): RuleResult {
  let total = 0;
  for (let t = 0; t < cells.texts.length; t++) if (verdicts[t]) total += cells.counts[t]!;
  const hits: RuleHit[] = [];
  const { codes } = cells;
  if (total > 0 && maxFlags > 0) {
    for (let r = 0; r < codes.length; r++) {
      const v = verdicts[codes[r]!];
      if (!v) continue;
      hits.push({ index: r, ...v });
      if (hits.length >= maxFlags) break;
    }
  }
  return { rule, hits, total, skipped: null };
}
