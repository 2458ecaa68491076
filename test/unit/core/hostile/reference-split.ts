// Test helper (not a test): an independent count of the records of a delimited text, for the
// accounting property. Written from the rules, not from the engine's scanner: it reads a JS string
// character by character (the scanner reads UTF-8 bytes with a state table), so the two agree only
// if both follow the same rules:
// - RFC 4180 section 2: fields separated by the delimiter; a field that starts with the quote runs
//   to the next lone quote, `""` inside it being one quote; records end at a line break outside
//   quotes. Line breaks are LF, CRLF or CR alone (RFC 4180 names CRLF; the others are common practice).
// - The engine's documented leniency (src/core/read/record-scanner.ts header comment): a quote inside
//   an unquoted field is a character; text after a closing quote makes the field "loose" up to the
//   next delimiter or line end; a quote never closed makes the rest of the text one last record;
//   a line break at the start of a record is a blank line, not a record, except in a table of one
//   column after its first record (there an empty line is one empty field, as RFC 4180 reads it).

export interface ReferenceCount {
  /** Field count of each record, in order. */
  fields: number[];
  /** 1-based line where each record starts. */
  lines: number[];
  blankLines: number;
  /** Line breaks, plus one for a last line without one. */
  lineCount: number;
  /** Line where a quote that is never closed opened; null when every quote closes. */
  unterminatedLine: number | null;
  /** Fields read leniently (a stray quote, or text after a closing quote). */
  looseFields: number;
}

export function referenceSplit(text: string, delimiter: string, quote: string): ReferenceCount {
  const n = text.length;
  const isBreak = (k: number): boolean => text[k] === '\n' || text[k] === '\r';
  const breakLength = (k: number): number => (text[k] === '\r' && text[k + 1] === '\n' ? 2 : 1);
  const fields: number[] = [];
  const lines: number[] = [];
  let line = 1;
  let blankLines = 0;
  let looseFields = 0;
  let unterminatedLine: number | null = null;
  let i = 0;
  /** Moves over a line break at i, counting it. */
  const pastBreak = (): void => {
    i += breakLength(i);
    line++;
  };

  while (i < n) {
    const oneColumn = fields.length > 0 && fields[0] === 1;
    if (isBreak(i) && !oneColumn) {
      blankLines++;
      pastBreak();
      continue;
    }
    lines.push(line);
    let count = 0;
    let open = true;
    while (open) {
      count++;
      if (text[i] === quote) {
        const opened = line;
        i++;
        let closed = false;
        while (i < n) {
          if (text[i] === quote) {
            if (text[i + 1] === quote) {
              i += 2;
              continue;
            }
            i++;
            closed = true;
            break;
          }
          if (isBreak(i)) pastBreak();
          else i++;
        }
        if (!closed) {
          unterminatedLine = opened;
          open = false;
          break;
        }
        if (i < n && text[i] !== delimiter && !isBreak(i)) {
          looseFields++;
          while (i < n && text[i] !== delimiter && !isBreak(i)) i++;
        }
      } else {
        let stray = false;
        while (i < n && text[i] !== delimiter && !isBreak(i)) {
          if (text[i] === quote) stray = true;
          i++;
        }
        if (stray) looseFields++;
      }
      if (i < n && text[i] === delimiter) i++; // another field follows (an empty one at the very end)
      else open = false;
    }
    fields.push(count);
    if (i < n) pastBreak();
  }
  const last = text[n - 1];
  const lineCount = line - 1 + (n > 0 && last !== '\n' && last !== '\r' ? 1 : 0);
  return { fields, lines, blankLines, lineCount, unterminatedLine, looseFields };
}
