// Issue 6: "every job ... has a memory ceiling with a clear error when exceeded". The data is built
// here (row i holds i and i / 8 as decimals); expected figures follow from how it is built and from
// how many bytes a Float64Array element takes (8, ECMAScript's TypedArray table: common practice).
import { describe, expect, it } from 'vitest';
import { createProfileJob } from '../../../../src/core/engine';
import { OptionError, resolveOptions } from '../../../../src/core/options';
import { planDialect, RangeJob } from '../../../../src/core/profile/job';
import { profileInRanges } from '../profile/range-harness';

const MiB = 1 << 20;
const ROWS = 400_000;
const enc = new TextEncoder();
const text = 'id,ratio\n' + Array.from({ length: ROWS }, (_, i) => `${i},${i / 8}\n`).join('');
const bytes = enc.encode(text);

function oneJob(memoryLimitBytes: number | null) {
  const job = createProfileJob(resolveOptions({ memoryLimitBytes }), { name: 'limit.csv' });
  for (let at = 0; at < bytes.length; at += MiB) job.push(bytes.subarray(at, at + MiB));
  return job.finish().profile;
}

describe('the memory ceiling', () => {
  it('without a ceiling every record is profiled', () => {
    const p = oneJob(null);
    expect([p.rows, p.partial, p.notices.some((n) => n.code === 'memory-limit')]).toEqual([ROWS, false, false]);
  });

  it('past the ceiling reading stops: a partial profile of the records before, and an error that says why', () => {
    // Two numeric columns keep at least 2 x 8 bytes per row, counted twice (as read, and sorted for
    // assembly): 4 MiB is passed well before 400 000 rows (at most about 131 000).
    const p = oneJob(4 * MiB);
    expect(p.partial).toBe(true);
    expect(p.rows).toBeGreaterThan(0);
    expect(p.rows).toBeLessThan(4 * MiB / 32);
    const notice = p.notices.find((n) => n.code === 'memory-limit');
    expect(notice?.severity).toBe('error');
    expect(notice?.message).toMatch(/^Reading stopped near byte \d+ of the text: the summaries would need about \d+ MB, above the memory limit of 4 MB\. The profile covers only the records before that point\. Raise the limit \(setting assay\.memoryLimitMB; --memory-limit on the command line\) or profile a part of the file\.$/);
    // Not the first-pass notice, which promises an exact profile to follow.
    expect(p.notices.some((n) => n.code === 'partial')).toBe(false);
    // What was read is summarised exactly: the ids are 0..rows-1.
    const id = p.columns[0]!;
    expect(id.count).toBe(p.rows);
    expect(id.stats && 'max' in id.stats ? id.stats.max : null).toBe(p.rows - 1);
  });

  it('the estimate is never below the typed arrays the job holds', () => {
    const plan = { options: resolveOptions(), source: { name: null }, encoding: 'utf-8' as const, bomLength: 0, dialect: planDialect(bytes, resolveOptions()), names: null, startOffset: 0, declared: null };
    const job = new RangeJob(plan);
    job.push(bytes);
    const st = job.end();
    let held = st.records.offsets.data.byteLength + st.records.lines.data.byteLength;
    for (const c of st.columns) held += c.kinds.data.byteLength + (c.values?.data.byteLength ?? 0);
    expect(job.heldBytes()).toBeGreaterThanOrEqual(held);
    // And it counts the assembly's sorted copy: at least 2 x 8 bytes per value of the two numeric columns.
    expect(job.heldBytes()).toBeGreaterThanOrEqual(ROWS * 2 * 16);
  });

  it('in parallel ranges the ceiling is shared out, and the profile is a prefix of the file (no gap)', () => {
    const run = profileInRanges(bytes, resolveOptions({ memoryLimitBytes: 8 * MiB }), 4, 4096, 64 * 1024);
    const p = run.profile;
    expect(run.ranges).toBe(4);
    expect(p.partial).toBe(true);
    expect(p.notices.filter((n) => n.code === 'memory-limit')).toHaveLength(1);
    // Rows are 0.. in order: a prefix holds ids 0..rows-1 exactly once each.
    const id = p.columns[0]!;
    expect(id.distinct).toBe(p.rows);
    expect(id.stats && 'max' in id.stats ? id.stats.max : null).toBe(p.rows - 1);
    expect(p.rows).toBeLessThan(ROWS);
  });

  it('a ceiling that is not a positive whole number of bytes is refused', () => {
    expect(() => resolveOptions({ memoryLimitBytes: 0 })).toThrow(OptionError);
    expect(() => resolveOptions({ memoryLimitBytes: 1.5 })).toThrow('memoryLimitBytes: expected a positive whole number, got 1.5');
  });
});
