// Test helper (not a test): random tables serialised by the rules of RFC 4180 section 2 (fields with
// a delimiter, quote or line break are quoted; quotes inside are doubled), for property tests.
import fc from 'fast-check';

const ALPHABET = ['a', 'b', 'Z', '0', '7', ' ', '.', '-', ',', ';', '\t', '|', '"', "'", '\r', '\n', 'é', 'ß', '中', '😀', '\u00a0'];

export interface Table {
  delimiter: string;
  quote: string;
  newline: string;
  finalNewline: boolean;
  rows: string[][];
  forceQuote: boolean[][];
}

export const tableArb: fc.Arbitrary<Table> = fc
  .record({
    delimiter: fc.constantFrom(',', ';', '\t', '|'),
    quote: fc.constantFrom('"', "'"),
    newline: fc.constantFrom('\n', '\r\n', '\r'),
    finalNewline: fc.boolean(),
    rows: fc.array(fc.array(fc.array(fc.constantFrom(...ALPHABET), { maxLength: 6 }).map((cs) => cs.join('')), { minLength: 1, maxLength: 6 }), { minLength: 1, maxLength: 12 }),
    seed: fc.array(fc.boolean(), { minLength: 72, maxLength: 72 }),
  })
  .map(({ seed, ...t }): Table => ({ ...t, forceQuote: t.rows.map((r, i) => r.map((_, j) => seed[(i * 6 + j) % 72]!)) }));

/** The table as text, with the string index where each record starts. */
export function serialise(t: Table): { text: string; recordStarts: number[] } {
  let text = '';
  const recordStarts: number[] = [];
  t.rows.forEach((row, i) => {
    recordStarts.push(text.length);
    text += row
      .map((f, j) => {
        const must = [t.delimiter, t.quote, '\r', '\n'].some((c) => f.includes(c)) || (row.length === 1 && f === '');
        return must || t.forceQuote[i]![j] ? t.quote + f.split(t.quote).join(t.quote + t.quote) + t.quote : f;
      })
      .join(t.delimiter);
    if (i < t.rows.length - 1 || t.finalNewline) text += t.newline;
  });
  return { text, recordStarts };
}

/** 1-based line and UTF-16 column of string index `at`, counting CR, LF and CRLF as one break each. */
export function lineAndColumn(text: string, at: number): { line: number; column: number } {
  let line = 1;
  let lineStart = 0;
  for (let i = 0; i < at; i++) {
    const c = text[i];
    if (c === '\r' || (c === '\n' && text[i - 1] !== '\r')) line++;
    if (c === '\r' || c === '\n') lineStart = i + 1;
  }
  return { line, column: at - lineStart + 1 };
}

export function dialectOf(t: Table) {
  return { delimiter: t.delimiter.charCodeAt(0), quote: t.quote.charCodeAt(0) };
}
