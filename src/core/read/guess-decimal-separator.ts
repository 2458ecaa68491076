// Which character separates the integer and fractional parts of numbers in the sample. A decimal
// comma is common in files written with a European locale, where `;` then delimits fields
// (common practice: a spreadsheet in such a locale saves "CSV" with `;` because `,` is taken).

export interface DecimalGuess {
  separator: '.' | ',';
  reason: string;
}

// Unambiguous forms, and the ambiguous "1,234" / "1.234" (three digits after one separator:
// a decimal with three places, or a thousands group).
const COMMA_GROUPED = /^[-+]?\d{1,3}(\.\d{3})+,\d+$/; // 1.234,5
const DOT_GROUPED = /^[-+]?\d{1,3}(,\d{3})+\.\d+$/; // 1,234.5
const COMMA_GROUPS = /^[-+]?\d{1,3}(\.\d{3}){2,}$/; // 1.234.567: dots group, so a comma is decimal
const DOT_GROUPS = /^[-+]?\d{1,3}(,\d{3}){2,}$/; // 1,234,567
const COMMA_DECIMAL = /^[-+]?(\d*),(\d+)$/;
const DOT_DECIMAL = /^[-+]?(\d*)\.(\d+)$/;

/**
 * Counts number-like fields of each form over `records` and picks the separator with more
 * unambiguous evidence; with none, `,` when only "1,234"-like fields appear and the delimiter is
 * not `,`, otherwise `.`. Cost O(fields).
 * Example: fields `12,5` and `3,75` with delimiter `;` give `,`.
 */
export function guessDecimalSeparator(records: readonly (readonly string[])[], delimiter: string): DecimalGuess {
  let comma = 0;
  let dot = 0;
  let ambiguousComma = 0;
  let commaExample = '';
  let dotExample = '';
  for (const record of records) {
    for (const raw of record) {
      const v = raw.trim();
      if (v.length === 0 || v.length > 40) continue;
      let m: RegExpExecArray | null;
      if (COMMA_GROUPED.test(v) || COMMA_GROUPS.test(v)) {
        comma++;
        commaExample ||= v;
      } else if (DOT_GROUPED.test(v) || DOT_GROUPS.test(v)) {
        dot++;
        dotExample ||= v;
      } else if ((m = COMMA_DECIMAL.exec(v)) !== null) {
        if (m[2]!.length === 3 && m[1] !== '' && m[1] !== '0' && m[1]!.length <= 3) ambiguousComma++;
        else {
          comma++;
          commaExample ||= v;
        }
      } else if (DOT_DECIMAL.exec(v) !== null) {
        dot++;
        dotExample ||= v;
      }
    }
  }
  if (comma > dot) {
    return { separator: ',', reason: `decimal separator ",": ${comma} number${comma === 1 ? '' : 's'} like "${commaExample}" use a decimal comma, ${dot} a decimal point` };
  }
  if (dot > comma) {
    return { separator: '.', reason: `decimal separator ".": ${dot} number${dot === 1 ? '' : 's'} like "${dotExample}" use a decimal point, ${comma} a decimal comma` };
  }
  if (comma === 0 && ambiguousComma > 0 && delimiter !== ',') {
    return { separator: ',', reason: `decimal separator ",": numbers like "1,234" could be either, and a decimal comma is usual with the delimiter "${delimiter}"` };
  }
  return { separator: '.', reason: comma === 0 ? 'decimal separator ".": no decimal numbers in the sample decide it; "." is the default' : `decimal separator ".": as many numbers use a decimal comma as a decimal point (${comma}); "." is the default` };
}
