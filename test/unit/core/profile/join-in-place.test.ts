// The first range of a split sizes its per-row arrays for the later ranges too (RangePlan.appendBytes),
// so that joining writes their rows into room already there: the joined arrays are the first range's
// own buffers (no joined copy is allocated), through the transfer between threads as the CLI and the
// editor's worker make it, and the profile is still the one a single pass gives (itself checked
// against csv-spectrum, NIST StRD and the reference libraries elsewhere).
import { describe, expect, it } from 'vitest';
import { profileBytes } from '../../../../src/core/engine';
import { resolveOptions } from '../../../../src/core/options';
import { assembleProfile } from '../../../../src/core/profile/assemble-profile';
import { RangeJob } from '../../../../src/core/profile/job';
import { joinRangeStates } from '../../../../src/core/profile/join-range-states';
import { planRanges } from '../../../../src/core/profile/plan-ranges';
import { deserializeState, serializeState } from '../../../../src/core/profile/serialize-state';

/** About 12 MB of records (a quoted line break now and then), so that each of two ranges passes the 4 MiB after which arrays are sized. */
function records(): Uint8Array {
  const lines = ['k,x,t,note'];
  for (let i = 0; lines.length < 520_000; i++) lines.push(`${i},${(i % 997) / 8},w${i % 13},${i % 101 === 0 ? '"two\nlines"' : 'plain'}`);
  return new TextEncoder().encode(lines.join('\n') + '\n');
}

describe('joining ranges in place', () => {
  it('writes the later range into the first one\'s arrays, and the profile is one pass\'s', () => {
    const bytes = records();
    const options = resolveOptions({});
    const read = (o: number, l: number) => bytes.subarray(o, o + l);
    const plan = planRanges(read, bytes.length, options, { name: null }, 2);
    if ('fallback' in plan) throw new Error(plan.fallback);
    expect(plan.tasks.length).toBe(2);
    const [first, second] = plan.tasks as [(typeof plan.tasks)[0], (typeof plan.tasks)[0]];
    expect(first.plan.appendBytes).toBe(bytes.length - second.from);
    expect(second.plan.appendBytes).toBeUndefined();
    const states = plan.tasks.map((t) => {
      const job = new RangeJob(t.plan);
      for (let at = t.from; at < t.to; at += 1 << 20) job.push(bytes.subarray(at, Math.min(t.to, at + (1 << 20))));
      const { data, transfer } = serializeState(job.end());
      return deserializeState(structuredClone(data, { transfer }));
    });
    const a = states[0]!;
    const rows = a.records.rows + states[1]!.records.rows;
    // Room for both ranges' rows, kept through the transfer.
    expect(a.records.offsets.data.length).toBeGreaterThanOrEqual(rows);
    const before = {
      offsets: a.records.offsets.data.buffer, lines: a.records.lines.data.buffer,
      kinds: a.columns.map((c) => c.kinds.data.buffer), values: a.columns.map((c) => c.values?.data.buffer ?? null),
      codes: a.columns.map((c) => c.codes?.data.buffer ?? null),
    };
    const merged = joinRangeStates(states);
    if (merged === null) throw new Error('the cut was not at a record start');
    expect(merged.records.rows).toBe(rows);
    expect(merged.records.offsets.data.buffer).toBe(before.offsets);
    expect(merged.records.lines.data.buffer).toBe(before.lines);
    merged.columns.forEach((c, i) => {
      expect(c.kinds.data.buffer).toBe(before.kinds[i]);
      if (before.values[i]) expect(c.values?.data.buffer).toBe(before.values[i]);
      // A coded column keeps its buffer unless its codes had to widen (none here: 13 texts, 2 notes).
      if (before.codes[i] && c.codes) expect(c.codes.data.buffer).toBe(before.codes[i]);
    });
    const ranged = assembleProfile(merged, read).profile;
    expect(JSON.stringify(ranged)).toBe(JSON.stringify(profileBytes(bytes, options).profile));
  });

  it('leaves no room for later ranges when the ceiling would not allow it, and the profile does not change', () => {
    const bytes = records();
    // A share of 32 MB each: room for the first range's own rows (it holds about 27 MB here, measured
    // on this file), not for the second range's too (about 37 MB with them).
    const options = resolveOptions({ memoryLimitBytes: 2 * 32e6 });
    const read = (o: number, l: number) => bytes.subarray(o, o + l);
    const plan = planRanges(read, bytes.length, options, { name: null }, 2);
    if ('fallback' in plan) throw new Error(plan.fallback);
    const states = plan.tasks.map((t) => {
      const job = new RangeJob(t.plan);
      for (let at = t.from; at < t.to; at += 1 << 20) job.push(bytes.subarray(at, Math.min(t.to, at + (1 << 20))));
      return job.end();
    });
    const a = states[0]!;
    expect(states.map((st) => st.partial)).toEqual([false, false]);
    expect(a.records.offsets.data.length).toBeGreaterThanOrEqual(a.records.rows);
    expect(a.records.offsets.data.length).toBeLessThan(a.records.rows + states[1]!.records.rows);
    const merged = joinRangeStates(states);
    if (merged === null) throw new Error('the cut was not at a record start');
    // One pass with no ceiling: under the shared one nothing stopped.
    expect(JSON.stringify(assembleProfile(merged, read).profile)).toBe(JSON.stringify(profileBytes(bytes, resolveOptions({})).profile));
  });
});
