import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CellClassifier, KIND_DATE, KIND_INTEGER, type CellReading } from '../../../../src/core/infer/classify-cell';
import { isoFromMs } from '../../../../src/core/infer/parse-date';

// The byte path is an optimisation of the text path: for any cell, `classifyBytes` on its UTF-8
// bytes must give the reading `classify` gives on its text (the oracle), and its "canonical" claim
// must hold: the bytes are then exactly String(value) for an integer, the ISO date for a date.
const TOKENS = ['', 'NA', 'N/A', 'n/a', 'null', 'NULL', 'NaN', '-', '?', 'None', '#N/A', 'ø'];
const enc = new TextEncoder();

const cell = fc.oneof(
  fc.integer({ min: -100000, max: 100000 }).map(String),
  fc.double({ noNaN: true, min: -1e6, max: 1e6 }).map((x) => x.toFixed(3)),
  fc.date({ min: new Date(Date.UTC(1900, 0, 1)), max: new Date(Date.UTC(2100, 0, 1)), noInvalidDate: true }).map((d) => d.toISOString().slice(0, 10)),
  fc.constantFrom('2023-02-29', '2024-02-29', '2024-13-01', '2024-04-31', '03/04/2024', '2024-01-01T10:00Z', '2024-01-01 10:00:30', '007', '+5', '-0', '1,234', '1e5'),
  fc.constantFrom(...TOKENS),
  fc.constantFrom('true', 'FALSE', 'Yes', 'no', 'nO', 'maybe', 'tru', 'north', 'x'),
  fc.string({ maxLength: 8 }),
  fc.string({ unit: 'grapheme', maxLength: 4 }),
).chain((core) => fc.tuple(fc.constantFrom('', ' ', '\t', '\u00a0', '\u3000'), fc.constant(core), fc.constantFrom('', ' ', '\u2003')).map(([a, b, c]) => a + b + c));

describe('CellClassifier.classifyBytes', () => {
  it('reads every cell as classify reads its text', () => {
    for (const sep of ['.', ','] as const) {
      const c = new CellClassifier(TOKENS, sep);
      fc.assert(
        fc.property(cell, (text) => {
          const want: CellReading = { kind: -1, value: -1, shape: 0 };
          const got: CellReading = { kind: -1, value: -1, shape: 0 };
          c.classify(text, want);
          const b = enc.encode(`|${text}|`);
          const canonical = c.classifyBytes(b, 1, b.length - 1, got);
          expect(got.kind, JSON.stringify(text)).toBe(want.kind);
          expect(Object.is(got.value, want.value), JSON.stringify(text)).toBe(true);
          if (canonical) {
            if (got.kind === KIND_INTEGER) expect(text).toBe(String(got.value));
            else if (got.kind === KIND_DATE) expect(text).toBe(isoFromMs(got.value, true));
            else throw new Error(`canonical for kind ${got.kind}`);
          }
        }),
        { numRuns: 8000 },
      );
    }
  });
});
