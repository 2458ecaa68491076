// A range's JobState as data that survives the structured clone between threads (postMessage),
// with its large typed arrays listed for transfer instead of copying. A worker profiles one byte
// range, sends `serializeState(state)`, and the main thread rebuilds it with `deserializeState`
// and merges the ranges in order (merge-states.ts).
import { CellClassifier } from '../infer/classify-cell';
import { resolveOptions, type ProfileOptions, type RuleId } from '../options';
import { accumulatorLimits, ColumnAccumulator, GrowableFloat64, type AccumulatorParts } from './column-accumulator';
import type { JobState, RecordState } from './job';
import { RecordKeySet } from './record-key-set';

/** Options with the rule set as a list; `resolveOptions` rebuilds (and freezes) the rest. */
type PlainOptions = Omit<ProfileOptions, 'rules'> & { rules: Omit<ProfileOptions['rules'], 'enabled'> & { enabled: RuleId[] } };

export interface SerializedState {
  options: PlainOptions;
  rest: Omit<JobState, 'options' | 'columns' | 'records' | 'declared'>;
  columns: AccumulatorParts[];
  records: Omit<RecordState, 'offsets' | 'lines' | 'seen'> & {
    offsets: Float64Array;
    lines: Float64Array;
    seen: { slots: Int32Array; size: number };
  };
}

/**
 * The state as structured-clone-safe data, and the buffers to transfer with it. The state must not
 * be used afterwards when the buffers are transferred (they then belong to the receiver). States
 * with CSV on the Web declarations are not sent between threads (their checks keep per-record
 * memory that does not merge); profile such files in one range.
 * @example const { data, transfer } = serializeState(job.end()); port.postMessage(data, transfer);
 */
export function serializeState(st: JobState): { data: SerializedState; transfer: ArrayBuffer[] } {
  if (st.declared !== null) throw new Error('serializeState: a state with declared constraints cannot be moved, got one with metadata');
  const { options, columns, records, declared, ...rest } = st;
  void declared;
  const { offsets, lines, seen, ...recordRest } = records;
  const data: SerializedState = {
    options: { ...options, rules: { ...options.rules, enabled: [...options.rules.enabled] } },
    rest: { ...rest },
    columns: columns.map((c) => c.toParts()),
    records: {
      ...recordRest,
      offsets: offsets.data.subarray(0, offsets.length),
      lines: lines.data.subarray(0, lines.length),
      seen: { slots: seen.slots, size: seen.size },
    },
  };
  const buffers = new Set<ArrayBuffer>();
  const add = (a: ArrayBufferView | null): void => {
    if (a && a.buffer instanceof ArrayBuffer && a.buffer.byteLength > 0) buffers.add(a.buffer);
  };
  for (const c of data.columns) accumulatorBuffers(c, buffers);
  const r = data.records;
  for (const a of [r.offsets, r.lines, r.seen.slots]) add(a);
  return { data, transfer: [...buffers] };
}

/** Rebuilds the JobState that `serializeState` described (taking over its typed arrays). */
export function deserializeState(data: SerializedState): JobState {
  const options = resolveOptions(data.options);
  const classifier = new CellClassifier(options.missingTokens, data.rest.dialect.decimalSeparator);
  const limits = accumulatorLimits(options);
  const { offsets, lines, seen, ...recordRest } = data.records;
  const records: RecordState = {
    ...recordRest,
    offsets: growable(offsets),
    lines: growable(lines),
    seen: RecordKeySet.from(seen.slots, seen.size),
  };
  return {
    ...data.rest,
    options,
    columns: data.columns.map((p) => ColumnAccumulator.fromParts(p, classifier, limits)),
    records,
    declared: null,
  };
}

/** The sent entries, with the room their buffer has past them (see RangePlan.appendBytes: a join fills it in place). */
function growable(a: Float64Array): GrowableFloat64 {
  const g = new GrowableFloat64(1);
  g.data = a.byteOffset === 0 && a.buffer instanceof ArrayBuffer ? new Float64Array(a.buffer) : a;
  g.length = a.length;
  return g;
}

/** Adds the buffers of an accumulator's parts to `into`, for transfer to another thread. */
export function accumulatorBuffers(c: AccumulatorParts, into: Set<ArrayBuffer>): void {
  const add = (a: ArrayBufferView | null): void => {
    if (a && a.buffer instanceof ArrayBuffer && a.buffer.byteLength > 0) into.add(a.buffer);
  };
  for (const a of [c.kinds, c.values, c.codes, c.categoryCounts, c.hll, c.tokenCounts, c.dense]) add(a);
  const d = c.dictionary;
  for (const a of [d.table, d.filter, d.arena, d.starts, d.lengths, d.hashes, d.values]) add(a);
  if (c.valueSketch) for (const a of [...c.valueSketch.numbers.levels, ...c.valueSketch.instants.levels]) add(a);
}
