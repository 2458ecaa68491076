// NIST StRD univariate summary statistics (test/fixtures/stats/strd, SOURCES.md there): each data
// set written as a one-column CSV and profiled through the whole engine (reading, number parsing,
// accumulation, assembly) must meet the certified mean and SD at GNU GSL's tolerances.
import { describe, expect, it } from 'vitest';
import { profileText } from '../../../../src/core/engine';
import { resolveOptions } from '../../../../src/core/options';
import type { NumericStats } from '../../../../src/core/profile/types';
import { CERTIFIED, strd } from '../stats/strd';

const rel = (got: number, want: number) => Math.abs(got - want) / Math.abs(want);

describe('NIST StRD through the engine', () => {
  for (const c of CERTIFIED) {
    it(`${c.name}: n, mean and sd as certified`, () => {
      const values = strd(c.name);
      // The values as the .dat file writes them: the text, not the parsed doubles, goes through the engine.
      const text = 'y\n' + values.map((v) => String(v)).join('\n') + '\n';
      const { profile } = profileText(text, resolveOptions());
      const col = profile.columns[0]!;
      const s = col.stats as NumericStats;
      expect(col.count).toBe(c.n);
      expect(rel(s.mean, c.mean)).toBeLessThanOrEqual(c.meanTol);
      expect(rel(s.sd, c.sd)).toBeLessThanOrEqual(c.sdTol);
    });
  }
});
