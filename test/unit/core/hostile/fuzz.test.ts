// Issue 6, "Fuzzing": random and mutated bytes into the core for a bounded time. For every input:
// no exception escapes (profiling, re-binning, group comparison, the Markdown, text and HTML
// reports), the profile is plain JSON equal to its JSON round trip (no NaN, Infinity, undefined or
// class instances), the accounting of accounting.ts holds, and pushing the bytes in any chunks gives
// the same profile as one push.
//
// Time: ASSAY_FUZZ_SECONDS (default 20) is shared among the properties below; each stops when its
// share is used (fast-check `interruptAfterTimeLimit`; an interrupted run that found nothing passes).
// A long local run: `node test/fuzz/long-run.mjs [seconds]`. To replay a failure, set ASSAY_FUZZ_SEED
// to the seed fast-check printed (and the property's path, if given, in ASSAY_FUZZ_PATH).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createProfileJob, profileBytes, type ProfileResult } from '../../../../src/core/engine';
import { renderHtmlReport } from '../../../../src/core/html';
import { renderReport } from '../../../../src/core/markdown';
import { resolveOptions, ALL_RULES, OptionError, type ProfileOptions, type ProfileOptionsInput } from '../../../../src/core/options';
import { renderText } from '../../../../src/core/text/render-text';
import { accountingProblems } from './accounting';
import { jsonProblems } from './plain-json';

const SECONDS = Number(process.env.ASSAY_FUZZ_SECONDS ?? 20);
const SEED = process.env.ASSAY_FUZZ_SEED === undefined ? undefined : Number(process.env.ASSAY_FUZZ_SEED);
const PATH = process.env.ASSAY_FUZZ_PATH;
/** Shares of the time, by property. */
const SHARES = { bytes: 0.2, text: 0.15, mutated: 0.3, options: 0.15, chunks: 0.2 };

function params(share: number): fc.Parameters<unknown> {
  return {
    interruptAfterTimeLimit: Math.max(500, SECONDS * 1000 * share),
    numRuns: 10_000_000, // the time limit ends the run
    ...(SEED === undefined ? {} : { seed: SEED }),
    ...(PATH === undefined ? {} : { path: PATH }),
  };
}
const timeout = (share: number) => SECONDS * 1000 * share + 60_000;

const enc = new TextEncoder();
const defaults = resolveOptions();

/** Everything a shell does with a profile; throws if anything does. */
function everyUse(result: ProfileResult): void {
  const { profile, session } = result;
  expect(jsonProblems(profile)).toEqual([]);
  expect(JSON.parse(JSON.stringify(profile))).toStrictEqual(profile);
  for (const c of profile.columns) {
    if (c.type === 'integer' || c.type === 'decimal') {
      const r = session.rebin(c.name, { rule: 'sturges' }, 'exact');
      expect(jsonProblems(r)).toEqual([]);
      const other = profile.columns.find((x) => x.type === 'text' || x.type === 'boolean');
      if (other) expect(jsonProblems(session.compareGroups(c.name, other.name))).toEqual([]);
    }
  }
  expect(typeof renderReport(profile)).toBe('string');
  expect(typeof renderText(profile, { fileLabel: 'fuzz.csv', significantDigits: 4 })).toBe('string');
  expect(typeof renderHtmlReport(profile)).toBe('string');
}

function check(bytes: Uint8Array, options: ProfileOptions = defaults): ProfileResult {
  const result = profileBytes(bytes, options, { name: 'fuzz.csv' });
  everyUse(result);
  expect(accountingProblems(bytes, result)).toEqual([]);
  return result;
}

/** Plausible CSV to mutate: a header and typed rows, quoted where needed. */
const validCsv = fc
  .record({
    delimiter: fc.constantFrom(',', ';', '\t', '|'),
    eol: fc.constantFrom('\n', '\r\n'),
    rows: fc.array(
      fc.tuple(fc.integer({ min: -1000, max: 1000 }), fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.constantFrom('red', 'green', 'blue', 'NA', ''),
        fc.date({ min: new Date('1850-01-01'), max: new Date('2100-12-31'), noInvalidDate: true }), fc.string({ maxLength: 8 })),
      { minLength: 1, maxLength: 40 },
    ),
  })
  .map(({ delimiter, eol, rows }) => {
    const q = (s: string) => (/["\r\n]/.test(s) || s.includes(delimiter) ? `"${s.replace(/"/g, '""')}"` : s);
    const lines = [['id', 'amount', 'colour', 'day', 'note'].join(delimiter)];
    for (const [i, x, c, d, s] of rows) lines.push([String(i), String(x), c, d.toISOString().slice(0, 10), q(s)].join(delimiter));
    return enc.encode(lines.join(eol) + eol);
  });

type Mutation = { kind: 'flip' | 'set' | 'insert' | 'delete' | 'repeat' | 'truncate'; at: number; value: number };
const mutation: fc.Arbitrary<Mutation> = fc.record({
  kind: fc.constantFrom('flip', 'flip', 'set', 'insert', 'delete', 'repeat', 'truncate'),
  at: fc.nat(),
  value: fc.nat({ max: 255 }),
});

/** Applies bit flips, byte changes, insertions, deletions, a repeated slice, a cut. */
function mutate(base: Uint8Array, mutations: readonly Mutation[]): Uint8Array {
  let b = Array.from(base);
  for (const m of mutations) {
    if (b.length === 0) break;
    const at = m.at % b.length;
    if (m.kind === 'flip') b[at] = b[at]! ^ (1 << (m.value % 8));
    else if (m.kind === 'set') b[at] = m.value;
    else if (m.kind === 'insert') b.splice(at, 0, m.value);
    else if (m.kind === 'delete') b.splice(at, 1);
    else if (m.kind === 'repeat') b.splice(at, 0, ...b.slice(at, at + 1 + (m.value % 64)));
    else b = b.slice(0, at);
  }
  return new Uint8Array(b);
}

const optionsInput: fc.Arbitrary<ProfileOptionsInput> = fc.record(
  {
    header: fc.boolean(),
    delimiter: fc.constantFrom(',', ';', '\t', '|', ' ', '"', 'é', '\n'),
    quote: fc.constantFrom('"', "'", ',', ''),
    decimalSeparator: fc.constantFrom('.', ','),
    encoding: fc.constantFrom('utf-8', 'utf-16le', 'utf-16be', 'windows-1252'),
    bins: fc.oneof(
      fc.constantFrom('sqrt', 'sturges', 'rice', 'doane', 'scott', 'fd', 'auto').map((rule) => ({ rule }) as const),
      fc.integer({ min: 1, max: 50 }).map((count) => ({ rule: 'count', count }) as const),
      fc.double({ min: 1e-3, max: 1e3, noNaN: true }).map((width) => ({ rule: 'width', width }) as const),
    ),
    edges: fc.constantFrom('nice', 'exact'),
    quantileType: fc.integer({ min: 1, max: 9 }),
    topN: fc.integer({ min: 1, max: 5 }),
    maxDistinct: fc.integer({ min: 1, max: 20 }),
    maxSortedDistinct: fc.integer({ min: 1, max: 20 }),
    maxRecords: fc.integer({ min: 1, max: 30 }),
  },
  { requiredKeys: [] },
).map((o) => ({ ...o, rules: { enabled: ALL_RULES, maxFlagsPerRule: 3 } }));

/** Splits `bytes` at the given points (sorted, deduplicated). */
function chunksOf(bytes: Uint8Array, cuts: readonly number[]): Uint8Array[] {
  const points = [...new Set(cuts.map((c) => c % (bytes.length + 1)))].sort((a, b) => a - b);
  const out: Uint8Array[] = [];
  let from = 0;
  for (const p of [...points, bytes.length]) {
    out.push(bytes.subarray(from, p));
    from = p;
  }
  return out;
}

describe('fuzzing the core', () => {
  it('survives random bytes', () => {
    fc.assert(fc.property(fc.uint8Array({ maxLength: 3000 }), (bytes) => void check(bytes)), params(SHARES.bytes));
  }, timeout(SHARES.bytes));

  it('survives random text, any code point, as UTF-8', () => {
    fc.assert(fc.property(fc.string({ unit: 'binary', maxLength: 500 }), (text) => void check(enc.encode(text))), params(SHARES.text));
  }, timeout(SHARES.text));

  it('survives mutated CSV (bit flips, changed, inserted and deleted bytes, repeats, cuts)', () => {
    fc.assert(
      fc.property(validCsv, fc.array(mutation, { minLength: 1, maxLength: 12 }), (base, ms) => void check(mutate(base, ms))),
      params(SHARES.mutated),
    );
  }, timeout(SHARES.mutated));

  it('survives mutated CSV under any options (forced dialect and encoding, every rule, small caps)', () => {
    fc.assert(
      fc.property(validCsv, fc.array(mutation, { maxLength: 6 }), optionsInput, (base, ms, input) => {
        const bytes = mutate(base, ms);
        let options: ProfileOptions;
        try {
          options = resolveOptions(input);
        } catch (e) {
          // A delimiter or quote the reader cannot use is refused up front, with a message.
          expect(e).toBeInstanceOf(OptionError);
          return;
        }
        const result = profileBytes(bytes, options, { name: 'fuzz.csv' });
        everyUse(result);
        // With a cap on records the profile is partial, so only the whole-file accounting is skipped.
        if (input.maxRecords === undefined) expect(accountingProblems(bytes, result)).toEqual([]);
      }),
      params(SHARES.options),
    );
  }, timeout(SHARES.options));

  it('gives the same profile for any chunking, across the 64 KiB head as well', () => {
    fc.assert(
      fc.property(validCsv, fc.array(mutation, { maxLength: 4 }), fc.integer({ min: 1, max: 40 }), fc.array(fc.nat(), { minLength: 1, maxLength: 12 }), (base, ms, copies, cuts) => {
        // Repeating the body makes inputs from a few bytes to past the 64 KiB the job reads before deciding.
        const one = mutate(base, ms);
        const bytes = new Uint8Array(one.length * copies);
        for (let k = 0; k < copies; k++) bytes.set(one, k * one.length);
        const whole = check(bytes);
        const job = createProfileJob(defaults, { name: 'fuzz.csv' });
        for (const c of chunksOf(bytes, cuts)) job.push(c);
        const chunked = job.finish((offset, length) => bytes.subarray(offset, offset + length));
        expect(chunked.profile).toStrictEqual(whole.profile);
      }),
      params(SHARES.chunks),
    );
  }, timeout(SHARES.chunks));
});
