// The per-profile flag index. Data: the planted fixture (test/workbench/fixtures/planted.csv, see
// SOURCES.md): line 42 (record 41) has two flags on x and one on y; record 43 is ragged.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { profileText } from '../../../../src/core/engine';
import { resolveOptions } from '../../../../src/core/options';
import { cellFlags, recordFlags } from '../../../../src/extension/editor/flags-at';

const text = readFileSync(join(__dirname, '../../../workbench/fixtures/planted.csv'), 'utf8');
const { profile } = profileText(text, resolveOptions({}));

describe('cellFlags and recordFlags', () => {
  it('find the flags of a cell and of a record', () => {
    expect(cellFlags(profile, 41, 1).map((f) => f.rule).sort()).toEqual(['modified-z', 'tukey-fence']);
    expect(cellFlags(profile, 41, 2).map((f) => f.rule)).toEqual(['tukey-fence']);
    expect(cellFlags(profile, 41, 0)).toEqual([]);
    expect(recordFlags(profile, 43).map((f) => f.rule)).toEqual(['ragged-row']);
    expect(recordFlags(profile, 41)).toEqual([]);
  });

  it('builds the index once per profile object', () => {
    expect(cellFlags(profile, 41, 1)).toBe(cellFlags(profile, 41, 1));
  });
});
