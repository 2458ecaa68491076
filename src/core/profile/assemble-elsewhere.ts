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

/** What goes to the other thread (structured-clone safe). */
export interface ColumnWork {
  decimalSeparator: '.' | ',';
  columns: { index: number; name: string; parts: AccumulatorParts; ctx: Omit<ColumnContext, 'options'> & { options: unknown } }[];
}

/** What comes back: one assembled column per column sent, in the same order. */
export interface ColumnResults {
  columns: { index: number; assembled: Omit<AssembledColumn, 'totals'> & { totals: [RuleId, number][] } }[];
}

/**
 * Which columns to send: a greedy split of the estimated work (rows, three times over where the
 * column holds numbers or dates, which are sorted and summarised) into two near-equal halves. Group-by
 * columns stay here: comparing groups reads their codes after assembly.
 */
export function pickColumnsToSend(st: JobState): number[] {
  const cost = st.columns.map((c, i) => ({ i, w: c.rows * (c.values ? 3 : 1) }));
  cost.sort((a, b) => b.w - a.w || a.i - b.i);
  let here = 0;
  let there = 0;
  const send: number[] = [];
  for (const { i, w } of cost) {
    if (there < here && !st.options.groupBy.includes(st.names[i]!)) {
      send.push(i);
      there += w;
    } else here += w;
  }
  return send.sort((a, b) => a - b);
}

/** Packs the columns for the other thread; their accumulators here are used up (buffers transferred). */
export function packColumns(st: JobState, indices: number[]): { work: ColumnWork; transfer: ArrayBuffer[] } {
  const buffers = new Set<ArrayBuffer>();
  const columns = indices.map((index) => {
    const parts = st.columns[index]!.toParts();
    accumulatorBuffers(parts, buffers);
    const { options, ...rest } = columnContext(st, index);
    return { index, name: st.names[index]!, parts, ctx: { ...rest, options: plainOptions(options) } };
  });
  return { work: { decimalSeparator: st.dialect.decimalSeparator, columns }, transfer: [...buffers] };
}

/** The other thread's side: rebuilds each accumulator and assembles it. */
export function assembleWork(work: ColumnWork): { results: ColumnResults; transfer: ArrayBuffer[] } {
  const transfer: ArrayBuffer[] = [];
  const columns = work.columns.map(({ index, name, parts, ctx }) => {
    const options = resolveOptions(ctx.options as Parameters<typeof resolveOptions>[0]);
    const classifier = new CellClassifier(ctx.missingTokens, work.decimalSeparator);
    const acc = ColumnAccumulator.fromParts(parts, classifier, accumulatorLimits(options));
    const a = assembleColumn(acc, name, index, { ...ctx, options });
    for (const v of [a.rowValues, a.sorted]) if (v && v.buffer instanceof ArrayBuffer && !transfer.includes(v.buffer)) transfer.push(v.buffer);
    return { index, assembled: { ...a, totals: [...a.totals] } };
  });
  return { results: { columns }, transfer };
}

/** The results as `assembleProfile`'s `preassembled` entries. */
export function unpackResults(results: ColumnResults): Map<number, AssembledColumn> {
  return new Map(results.columns.map(({ index, assembled }) => [index, { ...assembled, totals: new Map(assembled.totals) }]));
}

function plainOptions(o: ProfileOptions): unknown {
  return { ...o, rules: { ...o.rules, enabled: [...o.rules.enabled] }, types: { ...o.types }, levels: { ...o.levels } };
}
