// Assembling some of a merged state's columns in another thread while this one assembles the rest:
// the accumulators go over as their parts (buffers transferred, not copied) and come back as
// assembled columns. The same `assembleColumn` runs on the same data, so the profile is the one a
// single thread would make; only the wall time changes.
import { CellClassifier } from '../infer/classify-cell';
import { resolveOptions, type ProfileOptions, type RuleId } from '../options';
import { assembleColumn, type AssembledColumn, type ColumnContext } from './assemble-column';
import { columnContext } from './assemble-profile';
import { accumulatorLimits, ColumnAccumulator, type AccumulatorParts } from './column-accumulator';
import type { JobState } from './job';
import { accumulatorBuffers } from './serialize-state';

/** What goes to the other thread (structured-clone safe): per column, its part from each range, in file order. */
export interface ColumnWork {
  decimalSeparator: '.' | ',';
  /**
   * Send each joined accumulator back with its column: a session that answers later (re-binning,
   * comparing groups) reads the accumulators, which would otherwise stay in the other thread.
   */
  returnAccumulators?: boolean;
  columns: { index: number; name: string; parts: AccumulatorParts[]; ctx: Omit<ColumnContext, 'options'> & { options: unknown } }[];
}

/** What comes back: one assembled column per column sent, in the same order. */
export interface ColumnResults {
  columns: { index: number; assembled: Omit<AssembledColumn, 'totals'> & { totals: [RuleId, number][] }; accumulator?: AccumulatorParts }[];
}

/**
 * Which columns to send: a greedy split of the estimated work (rows, three times over where the
 * column holds numbers or dates, which are sorted and summarised) into two near-equal halves. This
 * thread starts with the records' share when the ranges are several (it joins their duplicate-record
 * tables meanwhile, about four columns' worth in the benchmark's profile). Group-by columns stay
 * here: comparing groups reads their codes after assembly.
 */
export function pickColumnsToSend(ranges: JobState | readonly JobState[]): number[] {
  const list = Array.isArray(ranges) ? (ranges as readonly JobState[]) : [ranges as JobState];
  const first = list[0];
  if (!first) return [];
  const rows = list.reduce((n, st) => n + st.records.rows, 0);
  const cost = first.columns.map((_, i) => {
    let numeric = false;
    for (const st of list) numeric ||= st.columns[i]!.values !== null;
    return { i, w: rows * (numeric ? 3 : 1) };
  });
  cost.sort((a, b) => b.w - a.w || a.i - b.i);
  let here = list.length > 1 ? 4 * rows : 0;
  let there = 0;
  const send: number[] = [];
  for (const { i, w } of cost) {
    if (there < here && !first.options.groupBy.includes(first.names[i]!)) {
      send.push(i);
      there += w;
    } else here += w;
  }
  return send.sort((a, b) => a - b);
}

/**
 * Packs the columns for the other thread, each as its parts from every range (the other thread
 * appends them in order, as merging would here); their accumulators here are used up (buffers
 * transferred).
 */
export function packColumns(ranges: JobState | readonly JobState[], indices: number[], returnAccumulators = false): { work: ColumnWork; transfer: ArrayBuffer[] } {
  const list = Array.isArray(ranges) ? (ranges as readonly JobState[]) : [ranges as JobState];
  const st = list[0]!;
  const buffers = new Set<ArrayBuffer>();
  const columns = indices.map((index) => {
    const parts = list.map((range) => {
      const p = range.columns[index]!.toParts();
      accumulatorBuffers(p, buffers);
      return p;
    });
    const { options, ...rest } = columnContext(st, index);
    return { index, name: st.names[index]!, parts, ctx: { ...rest, options: plainOptions(options) } };
  });
  return { work: { decimalSeparator: st.dialect.decimalSeparator, returnAccumulators, columns }, transfer: [...buffers] };
}

/** The other thread's side: rebuilds each column's accumulators, joins them in order, and assembles it. */
export function assembleWork(work: ColumnWork): { results: ColumnResults; transfer: ArrayBuffer[] } {
  const transfer = new Set<ArrayBuffer>();
  const columns = work.columns.map(({ index, name, parts, ctx }) => {
    const options = resolveOptions(ctx.options as Parameters<typeof resolveOptions>[0]);
    const classifier = new CellClassifier(ctx.missingTokens, work.decimalSeparator);
    const limits = accumulatorLimits(options);
    // One range at a time, so that each range's arrays can go as soon as they are appended.
    const acc = ColumnAccumulator.fromParts(parts[0]!, classifier, limits);
    for (let k = 1; k < parts.length; k++) acc.append(ColumnAccumulator.fromParts(parts[k]!, classifier, limits));
    parts.length = 0;
    const a = assembleColumn(acc, name, index, { ...ctx, options });
    if (a.rowValues && a.rowValues.buffer instanceof ArrayBuffer) transfer.add(a.rowValues.buffer);
    const assembled = { ...a, totals: [...a.totals] };
    if (!work.returnAccumulators) return { index, assembled };
    const accumulator = acc.toParts();
    accumulatorBuffers(accumulator, transfer);
    return { index, assembled, accumulator };
  });
  return { results: { columns }, transfer: [...transfer] };
}

/**
 * Puts the joined accumulators that came back (`returnAccumulators`) in place of the used-up ones
 * in `st`, with this thread's classifier and limits (made from the same options).
 */
export function adoptAccumulators(results: ColumnResults, st: JobState): void {
  for (const { index, accumulator } of results.columns) {
    if (!accumulator) continue;
    const old = st.columns[index]!;
    st.columns[index] = ColumnAccumulator.fromParts(accumulator, old.classifier, old.limits);
  }
}

/** The results as `assembleProfile`'s `preassembled` entries. */
export function unpackResults(results: ColumnResults): Map<number, AssembledColumn> {
  return new Map(results.columns.map(({ index, assembled }) => [index, { ...assembled, totals: new Map(assembled.totals) }]));
}

function plainOptions(o: ProfileOptions): unknown {
  return { ...o, rules: { ...o.rules, enabled: [...o.rules.enabled] }, types: { ...o.types }, levels: { ...o.levels } };
}
