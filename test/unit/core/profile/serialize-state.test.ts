import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { resolveOptions } from '../../../../src/core/options';
import { assembleProfile } from '../../../../src/core/profile/assemble-profile';
import { planDialect, RangeJob, type JobState } from '../../../../src/core/profile/job';
import { deserializeState, serializeState } from '../../../../src/core/profile/serialize-state';

// Round trip: a state sent to another thread (structured clone with its buffers transferred, as
// postMessage does; HTML Standard §2.7 "StructuredSerializeWithTransfer") must come back equal, and
// assemble into the same profile as the state that never left.
const enc = new TextEncoder();
const cell = fc.oneof(
  fc.integer({ min: -5, max: 50 }).map(String),
  fc.double({ min: -10, max: 10, noNaN: true }).map((x) => x.toFixed(3)),
  fc.constantFrom('', 'NA', 'x', 'y', ' z', '2024-01-31', '"q,""r"""', '"a\nb"'),
);

function stateOf(text: string, maxDistinct: number): JobState {
  const options = resolveOptions({ maxDistinct });
  const bytes = enc.encode(text);
  const job = new RangeJob({ options, source: { name: 'f.csv', size: bytes.length }, encoding: 'utf-8', bomLength: 0, dialect: planDialect(bytes, options), names: null, startOffset: 0, declared: null });
  job.push(bytes);
  return job.end();
}

/** Growable buffers compared by their used part (capacity is not state); `reading` is a scratch object. */
function snapshot(st: JobState): unknown {
  return JSON.parse(JSON.stringify(st, (k, v: unknown) => {
    if (k === 'reading') return undefined;
    if (v instanceof Map || v instanceof Set) return [...v];
    if (ArrayBuffer.isView(v)) return Array.from(v as unknown as ArrayLike<number>);
    if (v && typeof v === 'object' && 'length' in v && 'data' in v && ArrayBuffer.isView((v as { data: unknown }).data)) {
      const g = v as { data: Float64Array; length: number };
      return Array.from(g.data.subarray(0, g.length));
    }
    return Number.isNaN(v) ? 'NaN' : v;
  }));
}

describe('serializeState / deserializeState', () => {
  it('round-trips a state through a structured clone with transfer', () => {
    fc.assert(
      fc.property(fc.array(fc.array(cell, { minLength: 3, maxLength: 3 }), { minLength: 1, maxLength: 60 }), fc.constantFrom(3, 100000), (rows, maxDistinct) => {
        const text = ['a,b,c', ...rows.map((r) => r.join(','))].join('\n') + '\n';
        const want = snapshot(stateOf(text, maxDistinct));
        const wantProfile = assembleProfile(stateOf(text, maxDistinct), null).profile;
        const { data, transfer } = serializeState(stateOf(text, maxDistinct));
        const back = deserializeState(structuredClone(data, { transfer }));
        expect(snapshot(back)).toEqual(want);
        expect(assembleProfile(back, null).profile).toEqual(wantProfile);
      }),
      { numRuns: 60 },
    );
  });

  it('refuses a state with declared constraints', () => {
    const st = stateOf('a\n1\n', 10);
    st.declared = {} as never;
    expect(() => serializeState(st)).toThrow(/declared/);
  });
});
