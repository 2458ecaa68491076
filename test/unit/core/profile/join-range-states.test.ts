import { describe, expect, it } from 'vitest';
import { resolveOptions } from '../../../../src/core/options';
import { planDialect, RangeJob, type JobState } from '../../../../src/core/profile/job';
import { joinRangeStates } from '../../../../src/core/profile/join-range-states';

// A cut is right when the range before it ends at a record boundary (RFC 4180 §2: a line break
// ends a record only outside quotes); the expected outcomes follow from reading the text.
const enc = new TextEncoder();
const options = resolveOptions();

function ranges(text: string, cuts: number[]): JobState[] {
  const bytes = enc.encode(text);
  const dialect = planDialect(bytes, options);
  const bounds = [0, ...cuts, bytes.length];
  let names: string[] | null = null;
  return bounds.slice(0, -1).map((from, k) => {
    const job = new RangeJob({ options, source: { name: null }, encoding: 'utf-8', bomLength: 0, dialect, names, startOffset: from, declared: null });
    job.push(bytes.subarray(from, bounds[k + 1]));
    const st = job.end();
    if (k === 0) names = st.names;
    return st;
  });
}

describe('joinRangeStates', () => {
  const text = 'id,note\n1,"a\nb"\n2,c\n';
  it('joins ranges cut at record starts', () => {
    const st = joinRangeStates(ranges(text, [16]));
    expect(st?.records.rows).toBe(2);
    expect(st?.scan.lineBreaks).toBe(4);
  });
  it('refuses a cut after a line break inside quotes (the range before ends inside a quoted field)', () => {
    expect(joinRangeStates(ranges(text, [13]))).toBeNull();
  });
  it('refuses a cut in the middle of a line', () => {
    expect(joinRangeStates(ranges(text, [18]))).toBeNull();
  });
});
