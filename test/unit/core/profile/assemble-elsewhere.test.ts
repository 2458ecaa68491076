// Columns assembled in "another thread" (here: through structured clones with their buffers
// transferred, as postMessage does) give the profile one thread gives, byte for byte. The oracle is
// the engine's own one-thread assembly of an identical state: the property is equality, not values.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { resolveOptions, type ProfileOptions } from '../../../../src/core/options';
import { assembleWork, packColumns, pickColumnsToSend, unpackResults } from '../../../../src/core/profile/assemble-elsewhere';
import { assembleProfile } from '../../../../src/core/profile/assemble-profile';
import { planDialect, RangeJob } from '../../../../src/core/profile/job';

const enc = new TextEncoder();

function state(bytes: Uint8Array, options: ProfileOptions) {
  const job = new RangeJob({ options, source: { name: 't.csv' }, encoding: 'utf-8', bomLength: 0, dialect: planDialect(bytes, options), names: null, startOffset: 0, declared: null });
  job.push(bytes);
  return job.end();
}

const cell = fc.oneof(
  fc.double({ min: -1e6, max: 1e6, noNaN: true }).map((x) => String(Math.round(x * 100) / 100)),
  fc.integer({ min: -50, max: 50 }).map(String),
  fc.constantFrom('', 'NA', ' north', 'north', 'North', 'south', '2024-02-30', '2024-03-01', 'x'),
);
const table = fc.array(fc.tuple(cell, cell, fc.double({ min: 0, max: 100, noNaN: true }), fc.constantFrom('a', 'b', 'c')), { minLength: 1, maxLength: 300 });

describe('assembling columns elsewhere', () => {
  it('gives the one-thread profile for any split of the columns', () => {
    fc.assert(fc.property(table, fc.boolean(), (rows, small) => {
      // A small distinct cap also sends columns past their cap (Misra–Gries counters, sketch).
      const options = resolveOptions({ maxDistinct: small ? 5 : 100_000, rules: { enabled: ['tukey-fence', 'modified-z', 'z-score', 'near-constant', 'surrounding-whitespace', 'category-variant', 'not-a-number', 'duplicate-key'] } });
      const text = 'p,q,r,s\n' + rows.map((r) => r.join(',')).join('\n') + '\n';
      const bytes = enc.encode(text);
      const read = (o: number, l: number) => bytes.subarray(o, o + l);
      const here = assembleProfile(state(bytes, options), read).profile;

      const st = state(bytes, options);
      const send = [1, 2];
      const { work, transfer } = packColumns(st, send);
      const { results, transfer: back } = assembleWork(structuredClone(work, { transfer }));
      const split = assembleProfile(st, read, unpackResults(structuredClone(results, { transfer: back }))).profile;
      expect(JSON.stringify(split)).toBe(JSON.stringify(here));
    }), { numRuns: 40 });
  });

  it('splits the work into near halves and keeps group-by columns here', () => {
    const text = 'a,b,c,d\n' + Array.from({ length: 100 }, (_, i) => `${i},x${i % 3},${i / 2},y`).join('\n') + '\n';
    const st = state(enc.encode(text), resolveOptions({ groupBy: ['b'] }));
    // Numeric a and c weigh 3 each, text b and d 1 each: one numeric column goes, b never does.
    const send = pickColumnsToSend(st);
    expect(send).not.toContain(1);
    expect(send.filter((i) => i === 0 || i === 2)).toHaveLength(1);
  });
});
