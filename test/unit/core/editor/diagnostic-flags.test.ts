// Which flags become problems: enabled rules only, at most `max`, strongest first, counted rest.
// Data: the planted fixture (test/workbench/fixtures/planted.csv, see SOURCES.md).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { profileText } from '../../../../src/core/engine';
import { DEFAULT_RULES, resolveOptions } from '../../../../src/core/options';
import type { Flag, Profile } from '../../../../src/core/profile/types';
import { diagnosticFlags, moreFlagsMessage } from '../../../../src/core/editor/diagnostic-flags';

const text = readFileSync(join(__dirname, '../../../workbench/fixtures/planted.csv'), 'utf8');
const { profile } = profileText(text, resolveOptions({}));
const all = new Set<string>(DEFAULT_RULES);
const where = (fs: Flag[]) => fs.map((f) => `${f.line}:${f.rule}`);

describe('diagnosticFlags', () => {
  it('shows every flag in file order when under the cap (10 flags on 8 cells)', () => {
    const plan = diagnosticFlags(profile, { enabled: all, max: 1000 });
    expect(where(plan.shown)).toEqual([
      '5:category-variant', '5:surrounding-whitespace', '8:not-a-number', '14:category-variant', '26:tukey-fence',
      '30:mixed-missing-tokens', '42:modified-z', '42:tukey-fence', '42:tukey-fence', '44:ragged-row',
    ]);
    expect(plan).toMatchObject({ found: 10, notShown: 0 });
  });

  it('keeps the strongest under the cap: the 2 warnings (not a number, ragged row) and the first information flag', () => {
    const plan = diagnosticFlags(profile, { enabled: all, max: 3 });
    expect(where(plan.shown)).toEqual(['8:not-a-number', '26:tukey-fence', '44:ragged-row']);
    expect(plan.notShown).toBe(7);
  });

  it('drops a disabled rule at once and counts nothing of it', () => {
    const plan = diagnosticFlags(profile, { enabled: new Set([...all].filter((r) => r !== 'tukey-fence')), max: 1000 });
    expect(plan.shown.some((f) => f.rule === 'tukey-fence')).toBe(false);
    expect(plan.found).toBe(7);
  });

  it('counts findings beyond the engine\'s per-rule cap as not shown', () => {
    const capped: Profile = { ...profile, columns: profile.columns.map((c) => (c.name === 'y' ? { ...c, flagTotals: c.flagTotals.map((t) => (t.rule === 'tukey-fence' ? { ...t, total: 500 } : t)) } : c)) };
    const plan = diagnosticFlags(capped, { enabled: all, max: 1000 });
    expect(plan.shown.length).toBe(10);
    expect(plan.notShown).toBe(498);
  });

  it('a cap of 0 shows nothing and counts everything', () => {
    expect(diagnosticFlags(profile, { enabled: all, max: 0 })).toMatchObject({ shown: [], notShown: 10 });
  });
});

describe('moreFlagsMessage', () => {
  it('says how many and where to see them', () => {
    expect(moreFlagsMessage(5, 1000)).toMatch(/^Assay: 5 more flags are not shown as problems \(the setting assay\.diagnostics\.max shows 1000\)\. Open the profile/);
    expect(moreFlagsMessage(1, 3)).toMatch(/^Assay: 1 more flag is not shown/);
  });
});
