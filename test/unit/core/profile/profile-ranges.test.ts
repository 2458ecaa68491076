import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { profileBytes } from '../../../../src/core/engine';
import { resolveOptions } from '../../../../src/core/options';
import { profileRanges, splitAtRecords } from '../../../../src/core/profile/profile-ranges';

// The property the merge must have (issue: merged summaries equal one pass): for any file, reading
// it as 2 or 4 ranges split at record boundaries and merging gives the same profile as one pass.
// Generated files hold quoted fields with delimiters, doubled quotes and line breaks, so a split
// that ignored quoting would cut a record and change the counts.
const field = fc.oneof(
  fc.integer({ min: -50, max: 500 }).map(String),
  fc.double({ min: -1e3, max: 1e3, noNaN: true }).map((x) => x.toFixed(2)),
  fc.constantFrom('', 'NA', 'light', 'medium', 'dark', 'Dark', ' dark'),
  fc.string({ maxLength: 6 }).map((s) => `"${s.replaceAll('"', '""')},\n"`),
);

function csv(rows: string[][], eol: string): string {
  return ['a,b,c', ...rows.map((r) => r.join(','))].join(eol) + eol;
}

describe('profileRanges', () => {
  it('splits only at record starts', () => {
    const text = 'h\n"x\ny"\n"p\nq"\nz\n';
    const bytes = new TextEncoder().encode(text);
    for (const cut of splitAtRecords(bytes, 4, { delimiter: ',', quote: '"' })) {
      expect([0, 2, 8, 14]).toContain(cut);
    }
  });

  it('gives the one-pass profile for 2 and 4 ranges', () => {
    const options = resolveOptions({ rules: { enabled: ['tukey-fence', 'modified-z', 'not-a-number', 'ragged-row', 'duplicate-record', 'category-variant', 'mixed-missing-tokens'] } });
    fc.assert(
      fc.property(fc.array(fc.array(field, { minLength: 3, maxLength: 3 }), { minLength: 1, maxLength: 60 }), fc.constantFrom('\n', '\r\n'), (rows, eol) => {
        const bytes = new TextEncoder().encode(csv(rows, eol));
        const one = profileBytes(bytes, options).profile;
        for (const parts of [2, 4]) {
          const merged = profileRanges(bytes, options, parts).profile;
          expect(merged).toEqual(one);
        }
      }),
      { numRuns: 60 },
    );
  });
});
