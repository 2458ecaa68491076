// A small string-level reader of a text sample for dialect sniffing: the scanner's rules (RFC 4180,
// stray quotes kept literally, blank lines skipped) on a decoded string, for trying several
// delimiter and quote candidates on a few kilobytes. Not for whole files: it makes strings.

export interface SampleRecords {
  /** Records as lists of field texts (quotes removed, doubled quotes unescaped). */
  records: string[][];
  /** Fields properly wrapped in the quote character (closed, then a delimiter or line end). */
  quotedFields: number;
  /** True when the sample ended with a line break outside quotes (its last record is whole). */
  endsWithBreak: boolean;
  /** Line ends outside quotes, by kind. */
  lf: number;
  crlf: number;
  cr: number;
}

/**
 * Splits `sample` into at most `maxRecords` records with the given delimiter and quote characters.
 * Cost O(sample length). Example: `splitSample('a;"b;c"\n1;2\n', ';', '"', 10).records` is
 * `[['a', 'b;c'], ['1', '2']]`, with quotedFields 1.
 */
export function splitSample(sample: string, delimiter: string, quote: string, maxRecords: number): SampleRecords {
  const D = delimiter.charCodeAt(0);
  const Q = quote.length > 0 ? quote.charCodeAt(0) : -1;
  const n = sample.length;
  const out: SampleRecords = { records: [], quotedFields: 0, endsWithBreak: false, lf: 0, crlf: 0, cr: 0 };
  let i = sample.charCodeAt(0) === 0xfeff ? 1 : 0;
  while (i < n && out.records.length < maxRecords) {
    const c0 = sample.charCodeAt(i);
    if (c0 === 10 || c0 === 13) {
      i = lineEnd(sample, i, out); // a blank line
      continue;
    }
    const record: string[] = [];
    for (;;) {
      let text = '';
      if (sample.charCodeAt(i) === Q) {
        let from = i + 1;
        let closed = false;
        for (;;) {
          const j = sample.indexOf(quote, from);
          if (j < 0) {
            text += sample.slice(from);
            i = n;
            break;
          }
          text += sample.slice(from, j);
          if (sample.charCodeAt(j + 1) === Q) {
            text += quote;
            from = j + 2;
            continue;
          }
          i = j + 1;
          closed = true;
          break;
        }
        const next = i < n ? sample.charCodeAt(i) : -1;
        if (closed && (next === D || next === 10 || next === 13 || next === -1)) out.quotedFields++;
        else if (closed) text = quote + text.split(quote).join(quote + quote) + quote; // loose: as written
      }
      const from = i;
      while (i < n) {
        const c = sample.charCodeAt(i);
        if (c === D || c === 10 || c === 13) break;
        i++;
      }
      text += sample.slice(from, i);
      record.push(text);
      if (i < n && sample.charCodeAt(i) === D) {
        i++;
        continue;
      }
      break;
    }
    out.records.push(record);
    if (i < n) i = lineEnd(sample, i, out);
  }
  const last = sample.charCodeAt(n - 1);
  out.endsWithBreak = out.records.length < maxRecords ? last === 10 || last === 13 : true;
  return out;
}

function lineEnd(sample: string, i: number, out: SampleRecords): number {
  if (sample.charCodeAt(i) === 13) {
    if (sample.charCodeAt(i + 1) === 10) {
      out.crlf++;
      return i + 2;
    }
    out.cr++;
    return i + 1;
  }
  out.lf++;
  return i + 1;
}
