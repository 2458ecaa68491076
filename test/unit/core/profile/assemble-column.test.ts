// Sorting a coded column's values by counting its codes: the same array, bit for bit, as
// Float64Array.prototype.sort of the values (ECMAScript's numeric order: −0 before +0), on
// generated columns where several codes share a value ("1" and "1.0") and rows have no value.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { resolveOptions, type ProfileOptions } from '../../../../src/core/options';
import { bisectLeft, bisectRight } from 'd3-array';
import { assembleColumn, sortedByCode } from '../../../../src/core/profile/assemble-column';
import { assembleProfile, columnContext } from '../../../../src/core/profile/assemble-profile';
import { planDialect, RangeJob } from '../../../../src/core/profile/job';

const bits = (a: Float64Array): number[] => Array.from(new Uint32Array(a.buffer, a.byteOffset, 2 * a.length));
const codesOf = (list: readonly number[]): Int32Array => Int32Array.from(list);

describe('sortedByCode', () => {
  it('runs its doc example', () => {
    expect(Array.from(sortedByCode(Float64Array.of(5, NaN, 2, 5), codesOf([0, -1, 1, 0]), 2) ?? [])).toEqual([2, 5, 5]);
  });

  it('equals sorting the values (fast-check)', () => {
    const codeValue = fc.constantFrom(-0, 0, 1, 1, -1, 2.5, 1e-310, -Infinity, Infinity, 7, 7);
    fc.assert(fc.property(fc.array(codeValue, { minLength: 1, maxLength: 12 }), fc.array(fc.nat(), { maxLength: 300 }), (values, picks) => {
      // Code c reads as values[c]; a pick past the codes is a row without a value (code -1, NaN).
      const codes = picks.map((p) => (p % (values.length + 1)) - 1);
      const rowValues = Float64Array.from(codes, (c) => (c < 0 ? NaN : values[c]!));
      const expected = Float64Array.from(rowValues.filter((v) => !Number.isNaN(v))).sort();
      const actual = sortedByCode(rowValues, codesOf(codes), values.length);
      expect(actual).not.toBeNull();
      expect(bits(actual!)).toEqual(bits(expected));
    }), { numRuns: 500 });
  });

  it('gives null when a code carries two values, or a value has no code', () => {
    expect(sortedByCode(Float64Array.of(1, 2), codesOf([0, 0]), 1)).toBeNull();
    expect(sortedByCode(Float64Array.of(0, -0), codesOf([0, 0]), 1)).toBeNull();
    expect(sortedByCode(Float64Array.of(1, 2), codesOf([0, -1]), 1)).toBeNull();
  });
});

describe('retainValues: false (the CLI)', () => {
  // The property is equality with the default (values kept for the session) plus the memory let go;
  // the oracle is the engine's own default run on the same bytes.
  const text = 'n,d,t\n' + Array.from({ length: 500 }, (_, i) => `${(i * 37) % 101},2024-01-${String((i % 28) + 1).padStart(2, '0')},${i % 3 ? 'x' : 'y'}`).join('\n') + '\n';
  const bytes = new TextEncoder().encode(text);

  it('gives the same profile and leaves no per-row arrays behind', () => {
    const read = (o: number, l: number) => bytes.subarray(o, o + l);
    const kept = assembleProfile(profileStateOf(bytes, resolveOptions({})), read);
    const st = profileStateOf(bytes, resolveOptions({ retainValues: false }));
    const { profile, session } = assembleProfile(st, read);
    expect(profile).toEqual(kept.profile);
    for (const acc of st.columns) {
      expect(acc.values).toBeNull();
      expect(acc.kinds.data.length).toBe(0);
      expect(acc.rows).toBe(500);
    }
    // Nothing is kept to re-bin from; the default session can.
    expect(session.rebin('n', { rule: 'sturges' }, 'nice')).toBeNull();
    expect(kept.session.rebin('n', { rule: 'sturges' }, 'nice')?.histogram).not.toBeNull();
  });

  it('keeps the values when groups are compared', () => {
    const st = profileStateOf(bytes, resolveOptions({ retainValues: false, groupBy: ['t'] }));
    const { profile } = assembleProfile(st, (o, l) => bytes.subarray(o, o + l));
    expect(profile.groups.length).toBeGreaterThan(0);
    expect(st.columns[0]!.values).not.toBeNull();
  });
});

function profileStateOf(bytes: Uint8Array, options: ProfileOptions) {
  const job = new RangeJob({ options, source: { name: 't.csv' }, encoding: 'utf-8', bomLength: 0, dialect: planDialect(bytes, options), names: null, startOffset: 0, declared: null });
  job.push(bytes);
  return job.end();
}

describe('what the session keeps (retainValues, the editor)', () => {
  // Numbers (a by-value column and a coded one), dates and one text column; some rows empty.
  const rows = Array.from({ length: 3000 }, (_, i) => [
    i % 17 === 0 ? '' : String(((i * 7919) % 1000) / 10),
    String((i * 31) % 50),
    `2025-${String((i % 12) + 1).padStart(2, '0')}-${String((i % 28) + 1).padStart(2, '0')}`,
    i % 5 ? 'kiln' : 'dryer',
  ].join(','));
  const bytes = new TextEncoder().encode('reading,count,day,unit\n' + rows.join('\n') + '\n');
  const read = (o: number, l: number) => bytes.subarray(o, o + l);

  it('holds each typed column once: its row values, no sorted copy', () => {
    const st = profileStateOf(bytes, resolveOptions({}));
    for (const [i, acc] of st.columns.entries()) {
      const a = assembleColumn(acc, st.names[i]!, i, columnContext(st, i));
      // Every typed array the result holds, each buffer once.
      const buffers = new Set<ArrayBufferLike>();
      const walk = (v: unknown): void => {
        if (ArrayBuffer.isView(v)) buffers.add(v.buffer);
        else if (v && typeof v === 'object') for (const x of Object.values(v)) walk(x);
      };
      walk(a);
      const held = [...buffers].reduce((s, b) => s + b.byteLength, 0);
      if (a.column.type === 'text') expect(held).toBe(0);
      else {
        expect(a.rowValues).not.toBeNull();
        // The row values (8 bytes a row, with room to grow) and nothing of the same size beside them.
        expect(held).toBe(a.rowValues!.buffer.byteLength);
        expect(held).toBeLessThan(2 * 8 * 3000);
      }
    }
  });

  it('answers standings and re-bins as from the sorted values (d3-array bisect; the profile\'s own histogram)', () => {
    const { profile, session } = assembleProfile(profileStateOf(bytes, resolveOptions({})), read);
    for (const name of ['reading', 'count']) {
      const col = profile.columns.find((c) => c.name === name)!;
      const values = rows.map((r) => r.split(',')[name === 'reading' ? 0 : 1]!).filter((t) => t !== '').map(Number);
      const sorted = Float64Array.from(values).sort();
      for (const probe of [-1, 0, 3, 12.5, 25, 49, 50, 99.9, 1000]) {
        const below = bisectLeft(sorted, probe);
        const equal = bisectRight(sorted, probe) - below;
        expect(session.standing(name, probe)).toEqual({ below, equal, n: sorted.length, percentile: (100 * (below + equal / 2)) / sorted.length });
      }
      // The same rule again gives the histogram the profile was assembled with.
      const again = session.rebin(name, { rule: col.histogram!.rule } as Parameters<typeof session.rebin>[1], col.histogram!.edgeMode);
      expect(again?.histogram).toEqual(col.histogram);
      // Another column in between, then back: the one sorted column kept is made again.
      expect(session.rebin(name === 'reading' ? 'count' : 'reading', { rule: 'sturges' }, 'nice')?.histogram).not.toBeNull();
      expect(session.rebin(name, { rule: 'count', count: 4 }, 'exact')?.histogram?.counts.reduce((s, c) => s + c, 0)).toBe(sorted.length);
    }
    const day = session.standing('day', Date.UTC(2025, 5, 15));
    expect(day?.n).toBe(3000);
    expect(session.standing('unit', 1)).toBeNull();
  });

  it('lets a text column\'s few number-like cells go, and still compares groups by it', () => {
    // Lot codes, one in 50 of them digits only (a number to the reader): typed text all the same.
    const text = 'lot,weight\n' + Array.from({ length: 2000 }, (_, i) => `${i % 50 === 0 ? String(1000 + i) : `L${i % 7}`},${(i % 13) + 0.5}`).join('\n') + '\n';
    const b = new TextEncoder().encode(text);
    const st = profileStateOf(b, resolveOptions({}));
    expect(st.columns[0]!.values).not.toBeNull();
    const { profile, session } = assembleProfile(st, (o, l) => b.subarray(o, o + l));
    expect(profile.columns[0]!.type).toBe('text');
    expect(st.columns[0]!.values).toBeNull();
    expect(st.columns[1]!.values).not.toBeNull();
    // Group means by lot against a plain computation over the same cells.
    const rowsOf = text.trim().split('\n').slice(1).map((l) => l.split(','));
    const mean = (lot: string) => {
      const xs = rowsOf.filter((r) => r[0] === lot).map((r) => Number(r[1]));
      return xs.reduce((a, x) => a + x, 0) / xs.length;
    };
    const g = session.compareGroups('weight', 'lot');
    expect(g?.groups.find((x) => x.value === 'L3')?.mean).toBeCloseTo(mean('L3'), 12);
  });
});
