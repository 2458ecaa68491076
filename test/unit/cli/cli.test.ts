// End-to-end through the built command line (dist/cli.js; `npm test` builds before the unit tests).
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { Profile } from '../../../src/core/profile/types';

const root = join(__dirname, '../../..');
const cli = join(root, 'dist/cli.js');
const run = (args: string[]) => spawnSync(process.execPath, [cli, ...args], { encoding: 'utf8', cwd: root });
const dir = mkdtempSync(join(tmpdir(), 'assay-cli-'));
const file = (name: string, text: string) => {
  const p = join(dir, name);
  writeFileSync(p, text);
  return p;
};

// Exit statuses as documented in the usage text (0 done, 1 --fail-on met, 2 bad input or options):
// the convention of grep and diff (common practice).
describe('assay command line', () => {
  const clean = file('clean.csv', 'k,v\n1,10\n2,11\n3,12\n4,11\n5,10\n');
  const dirty = file('dirty.csv', 'k,v\n1,10\n2,eleven\n3,12\n4,11\n5,10\n');

  it('prints the profile as JSON with the documented members', () => {
    const r = run([clean, '--format', 'json']);
    expect(r.status).toBe(0);
    const p = JSON.parse(r.stdout) as Profile;
    expect(p).toMatchObject({ rows: 5, delimiter: ',', encoding: 'utf-8', ragged: [] });
    expect(Object.keys(p.columns[1]!)).toEqual(expect.arrayContaining(['name', 'type', 'level', 'count', 'missing', 'invalid', 'distinct', 'stats', 'histogram', 'frequencies', 'flags']));
    expect(p.columns[1]!.histogram!.edges.length).toBe(p.columns[1]!.histogram!.counts.length + 1);
  });

  it('prints the Markdown report and the text view with file:line:column', () => {
    expect(run([clean, '--format', 'markdown']).stdout).toContain('| Column');
    const text = run([dirty]).stdout;
    expect(text).toContain(`${dirty}:3:3: warning: not-a-number`);
  });

  it('gates a delivery with --fail-on', () => {
    expect(run([clean, '--fail-on', 'invalid']).status).toBe(0);
    const r = run([dirty, '--fail-on', 'invalid', '-q']);
    expect(r.status).toBe(1);
    expect(r.stderr).toBe('assay: 1 invalid cell found\n');
    expect(run([dirty, '--fail-on', 'flags']).status).toBe(1);
    expect(run([clean, '--fail-on', 'constraints']).status).toBe(0);
  });

  it('fails with one clear line and status 2 for bad input or options', () => {
    for (const args of [[join(dir, 'missing.csv')], [clean, '--bins', 'many'], [clean, '--format', 'xml'], [clean, '--nope'], [], [dir]]) {
      const r = run(args);
      expect(r.status, args.join(' ')).toBe(2);
      expect(r.stderr.trim().split('\n')).toHaveLength(1);
      expect(r.stderr.startsWith('assay: ')).toBe(true);
    }
  });

  it('refuses binary content with status 2', () => {
    const gz = join(dir, 'renamed.csv');
    writeFileSync(gz, new Uint8Array([0x1f, 0x8b, 8, 0, 0, 0, 0, 0, 0, 3, 1, 2, 3])); // gzip magic (RFC 1952)
    const r = run([gz]);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/^assay: .*does not look like delimited text.*gzip/);
  });

  it('stops at --memory-limit with the partial profile on stdout, the reason on stderr and status 2', () => {
    // 150 000 rows of two numbers hold well over 1 MB (at least 16 bytes per number: kept, and sorted for assembly).
    const big = file('big.csv', 'i,r\n' + Array.from({ length: 150_000 }, (_, i) => `${i},${i / 8}`).join('\n') + '\n');
    const r = run([big, '--format', 'json', '--memory-limit', '1', '-q']);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/^assay: .*big\.csv: Reading stopped near byte \d+ of the text: .* above the memory limit of 1 MB\./);
    const p = JSON.parse(r.stdout) as Profile;
    expect(p.partial).toBe(true);
    expect(p.rows).toBeLessThan(150_000);
    // The default ceiling (8192 MB) and none at all both read the whole file.
    for (const args of [[], ['--memory-limit', '0']]) expect((JSON.parse(run([big, '--format', 'json', ...args]).stdout) as Profile).rows).toBe(150_000);
  });

  it('summarises a column past --exact-limit by a rank sketch and says so', () => {
    const f = file('many.csv', 'v\n' + Array.from({ length: 3000 }, (_, i) => String((i * 7919) % 3001)).join('\n') + '\n');
    const sketched = JSON.parse(run([f, '--format', 'json', '--exact-limit', '1000']).stdout) as Profile;
    expect(sketched.columns[0]!.approximate?.method).toBe('rank-sketch');
    expect(JSON.parse(run([f, '--format', 'json']).stdout).columns[0].approximate).toBeNull();
    expect(run([f, '--exact-limit', '1000']).stdout).toMatch(/^v: This column has more values than are kept exactly \(3000\)/m);
    expect(run([f, '--exact-limit', '0']).status).toBe(2);
  });

  it('takes rule thresholds, levels and types as options', () => {
    // 1..9 and 20: type-7 Q1 3.25, Q3 7.75, IQR 4.5; fences at k = 1.5: 14.5 (20 is out); at k = 3: 21.25 (20 is in).
    const f = file('k.csv', 'v\n' + [1, 2, 3, 4, 5, 6, 7, 8, 9, 20].join('\n') + '\n');
    const flagged = (args: string[]) => (JSON.parse(run([f, '--format', 'json', '--rules', 'tukey-fence', ...args]).stdout) as Profile).columns[0]!.flags.length;
    expect(flagged([])).toBe(1);
    expect(flagged(['--tukey-k', '3'])).toBe(0);
    const p = JSON.parse(run([f, '--format', 'json', '--level', 'v=ordinal', '--type', 'v=decimal']).stdout) as Profile;
    expect(p.columns[0]).toMatchObject({ level: 'ordinal', levelSource: 'option', type: 'decimal' });
    expect(run([f, '--level', 'v=loud']).status).toBe(2);
    expect(run([f, '--tukey-k', '-1']).status).toBe(2);
  });

  it('compares groups with --group-by', () => {
    const p = JSON.parse(run([file('g.csv', 'g,x\na,1\na,3\nb,10\nb,14\nb,12\n'), '--group-by', 'g', '--format', 'json']).stdout) as Profile;
    // Hand-checkable: group b = 10, 12, 14 (mean 12, SD 2, median 12); a = 1, 3 (mean 2).
    expect(p.groups[0]).toMatchObject({ numeric: 'x', by: 'g', groups: [{ value: 'b', count: 3, mean: 12, sd: 2, median: 12 }, { value: 'a', count: 2, mean: 2 }] });
  });
});

// The W3C CSV on the Web Working Group's validation tests (subset; test/fixtures/csvw/SOURCES.md):
// valid cases exit 0, invalid ones exit 1 (a violated constraint or invalid metadata, named on stderr).
describe('W3C CSV on the Web validation tests through the CLI', () => {
  const fx = join(root, 'test/fixtures/csvw');
  interface Case { id: string; expect: 'valid' | 'invalid'; name: string; metadata: string; csv: string }
  const cases = JSON.parse(readFileSync(join(fx, 'cases.json'), 'utf8')) as Case[];
  for (const c of cases) {
    it(`${c.id} ${c.expect}: ${c.name}`, () => {
      const r = run([join(fx, c.csv), '--metadata', join(fx, c.metadata), '--fail-on', 'constraints', '--format', 'json', '-q']);
      if (c.expect === 'valid') expect(r.status, r.stderr).toBe(0);
      else {
        expect(r.status, r.stdout.slice(0, 400)).toBe(1);
        expect(r.stderr).toMatch(/constraint violation|metadata is invalid/);
      }
    });
  }
});
