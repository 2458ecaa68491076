import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { profileBytes } from '../../../../src/core/engine';
import { resolveOptions } from '../../../../src/core/options';
import { planRanges } from '../../../../src/core/profile/plan-ranges';
import { profileInRanges } from './range-harness';

// The property parallel workers must have (issue 7: "1, 2 and 4 workers give identical profiles on
// generated files with quoted line breaks"): the one-pass profile (the oracle) equals the profile
// of 2 or 4 ranges cut by planRanges, sent between threads as serialized states and merged.
// Quoted cells hold delimiters, doubled quotes, LF and CRLF, so that a cut inside quotes would
// change the counts; the look-ahead window is tiny so that the cut is often undecided.
const cell = fc.oneof(
  fc.integer({ min: -50, max: 500 }).map(String),
  fc.double({ min: -1e3, max: 1e3, noNaN: true }).map((x) => x.toFixed(2)),
  fc.constantFrom('', 'NA', 'light', 'medium', 'dark', 'Dark', ' dark', '2024-02-29', 'true'),
  fc.string({ maxLength: 6 }).map((s) => `"${s.replaceAll('"', '""')},\n"`),
  fc.constantFrom('"a\r\nb"', '"""x"""', '"line\n\nbreaks"', '"\n"'),
);
const enc = new TextEncoder();

function file(rows: string[][], eol: string, bom: boolean): Uint8Array {
  const text = ['a,b,c', ...rows.map((r) => r.join(','))].join(eol) + eol;
  const b = enc.encode(text);
  if (!bom) return b;
  const out = new Uint8Array(b.length + 3);
  out.set([0xef, 0xbb, 0xbf]);
  out.set(b, 3);
  return out;
}

describe('planRanges + serialized range states', () => {
  const options = resolveOptions({ rules: { enabled: ['tukey-fence', 'modified-z', 'not-a-number', 'ragged-row', 'duplicate-record', 'category-variant', 'mixed-missing-tokens', 'duplicate-key'] } });

  // As the CLI, the ranged runs also let each column's rows go once it is assembled.
  const letGo = resolveOptions({ ...options, rules: { ...options.rules, enabled: [...options.rules.enabled] }, retainValues: false });

  it('gives the one-pass profile for 1, 2 and 4 workers', () => {
    let split = 0;
    fc.assert(
      fc.property(
        fc.array(fc.array(cell, { minLength: 3, maxLength: 3 }), { minLength: 1, maxLength: 80 }),
        fc.constantFrom('\n', '\r\n'), fc.boolean(), fc.integer({ min: 16, max: 200 }), fc.boolean(),
        (rows, eol, bom, window, retain) => {
          const bytes = file(rows, eol, bom);
          const one = profileBytes(bytes, options).profile;
          for (const parts of [1, 2, 4]) {
            const run = profileInRanges(bytes, retain ? options : letGo, parts, window);
            if (run.ranges > 1) split++;
            expect(run.profile).toEqual(one);
          }
        },
      ),
      { numRuns: 150 },
    );
    // The property must have been tested on split files, not only on fallbacks.
    expect(split).toBeGreaterThan(100);
  });

  it('leaves ill-formed UTF-8 to one pass, which says where it is', () => {
    const rows = Array.from({ length: 40 }, (_, i) => `${i},x${i},"q\n${i}"`);
    const bytes = enc.encode(['a,b,c', ...rows].join('\n') + '\n');
    bytes[200] = 0xff;
    const run = profileInRanges(bytes, options, 4);
    expect(run.ranges).toBe(1);
    expect(run.profile).toEqual(profileBytes(bytes, options).profile);
  });

  it('falls back to one pass where a split cannot be exact', () => {
    const read = (b: Uint8Array) => (o: number, l: number) => b.subarray(o, o + l);
    const utf16 = new Uint8Array([0xff, 0xfe, 0x61, 0, 0x0a, 0]);
    expect(planRanges(read(utf16), utf16.length, options, { name: null }, 2)).toEqual({ fallback: 'utf-16le text is re-encoded in one pass' });
    const small = enc.encode('a,b\n');
    expect('fallback' in planRanges(read(small), small.length, options, { name: null }, 2)).toBe(true);
    const meta = planRanges(read(small), small.length, options, { name: null, metadata: { text: '{}', location: 'x' } }, 2);
    expect(meta).toEqual({ fallback: 'CSV on the Web metadata is checked in one pass' });
  });
});
