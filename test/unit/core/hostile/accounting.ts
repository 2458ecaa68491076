// Test helper (not a test): the accounting rule of issue 6 ("records parsed + records reported as
// malformed = records in the file; nothing is silently dropped"), made exact for this engine.
//
// For a file the engine reads as text, with R the records an independent reader finds
// (reference-split.ts, on the text decoded as the profile says, with the profile's delimiter and quote):
//   R = profile.rows + (1 if the first record is the header), and the record index has one entry per row
//       at the line where the reference says that record starts;
//   blank lines skipped = profile.blankLines; lines = profile.lines;
//   records whose field count differs from the first record's = profile.raggedTotal (listed up to 1000);
//   for every column, count + missing = rows (a cell a short record lacks counts as missing);
//   an unclosed quote is reported (notice `unterminated-quote` at the line where it opened), and
//   leniently read fields are reported (notice `loose-quotes` with their number).
// Malformed records are not set aside: a ragged record is a row and is reported as ragged, so the
// sum above holds with nothing dropped. A file the engine refuses (notice `not-delimited-text`)
// is accounted as a whole: no rows, no columns, and the notice says why.
import type { ProfileResult } from '../../../../src/core/engine';
import { referenceSplit } from './reference-split';

const BOM_LENGTH = { 'utf-8': 3, 'utf-16le': 2, 'utf-16be': 2, 'windows-1252': 0 } as const;

/** The file's text as the engine read it: decoded by the profile's encoding, without the mark. */
export function decodedText(bytes: Uint8Array, result: ProfileResult): string {
  const p = result.profile;
  const skip = p.bom ? BOM_LENGTH[p.encoding] : 0;
  // Streaming, as the engine decodes: Node 20.18.3+ decodes windows-1252 as Latin-1 in a one-shot
  // decode() (nodejs/node#60888); the streaming path goes through ICU and is right.
  const decoder = new TextDecoder(p.encoding, { ignoreBOM: true });
  return decoder.decode(bytes.subarray(skip), { stream: true }) + decoder.decode();
}

/** Every way the profile fails the accounting of `bytes`; empty when it holds. */
export function accountingProblems(bytes: Uint8Array, result: ProfileResult): string[] {
  const p = result.profile;
  const out: string[] = [];
  const check = (ok: boolean, what: string): void => {
    if (!ok) out.push(what);
  };
  if (p.notices.some((n) => n.code === 'not-delimited-text')) {
    check(p.rows === 0 && p.columns.length === 0, `refused, yet ${p.rows} rows and ${p.columns.length} columns`);
    return out;
  }
  const ref = referenceSplit(decodedText(bytes, result), p.delimiter, p.quote);
  const records = ref.fields.length;
  const headerRecords = p.header && records > 0 ? 1 : 0;
  check(p.rows + headerRecords === records, `rows ${p.rows} + header ${headerRecords} != ${records} records`);
  check(p.blankLines === ref.blankLines, `blankLines ${p.blankLines} != ${ref.blankLines}`);
  check(p.lines === ref.lineCount, `lines ${p.lines} != ${ref.lineCount}`);
  const width = ref.fields[0] ?? 0;
  check(p.columns.length === width, `${p.columns.length} columns != ${width} fields in the first record`);
  const data = ref.fields.slice(headerRecords);
  const dataLines = ref.lines.slice(headerRecords);
  const ragged = data.flatMap((f, i) => (f === width ? [] : [{ row: i + 1, line: dataLines[i]!, fields: f, expected: width }]));
  check(p.raggedTotal === ragged.length, `raggedTotal ${p.raggedTotal} != ${ragged.length}`);
  check(JSON.stringify(p.ragged) === JSON.stringify(ragged.slice(0, 1000)), `ragged list ${JSON.stringify(p.ragged).slice(0, 200)} != ${JSON.stringify(ragged.slice(0, 5))}`);
  check(result.index.offsets.length === p.rows, `index has ${result.index.offsets.length} offsets for ${p.rows} rows`);
  check(JSON.stringify([...result.index.lines]) === JSON.stringify(dataLines), 'record lines differ from the reference');
  for (const c of p.columns) check(c.count + c.missing === p.rows, `column ${c.index}: count ${c.count} + missing ${c.missing} != ${p.rows} rows`);
  const unterminated = p.notices.find((n) => n.code === 'unterminated-quote');
  if (ref.unterminatedLine === null) check(unterminated === undefined, 'unterminated-quote notice without an unclosed quote');
  else check(unterminated?.line === ref.unterminatedLine, `unclosed quote on line ${ref.unterminatedLine}, notice ${JSON.stringify(unterminated)}`);
  const loose = p.notices.find((n) => n.code === 'loose-quotes');
  if (ref.looseFields === 0) check(loose === undefined, 'loose-quotes notice without a loose field');
  else check(loose?.message.startsWith(`${ref.looseFields} field`) === true, `${ref.looseFields} loose fields, notice ${loose?.message}`);
  return out;
}
