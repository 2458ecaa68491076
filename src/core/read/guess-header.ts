// Whether the first record names the columns. Evidence, strongest first:
// 1. a text value above a column whose later values are numbers or dates: a header;
// 2. a number or date above such a column: data;
// 3. a first-record value that recurs below in its own column: data (names do not repeat as values);
// otherwise a header, the common case (and the undecidable one).

export interface HeaderGuess {
  header: boolean;
  reason: string;
}

const ISO_DATE = /^\d{4}-\d{1,2}-\d{1,2}([T ]\d{1,2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:?\d{2})?)?$/;
const OTHER_DATE = /^(\d{1,2}[./-]\d{1,2}[./-]\d{2,4}|\d{4}[./]\d{1,2}[./]\d{1,2})$/;
const NUMBER_DOT = /^[-+]?(\d+(\.\d*)?|\.\d+)([eE][-+]?\d+)?%?$|^[-+]?\d{1,3}(,\d{3})+(\.\d+)?$/;
const NUMBER_COMMA = /^[-+]?(\d+(,\d*)?|,\d+)([eE][-+]?\d+)?%?$|^[-+]?\d{1,3}(\.\d{3})+(,\d+)?$/;

/** A number (in the given decimal convention) or a date: what a header name almost never is. */
function typed(value: string, decimal: '.' | ','): boolean {
  const v = value.trim();
  if (v.length === 0) return false;
  return (decimal === '.' ? NUMBER_DOT : NUMBER_COMMA).test(v) || ISO_DATE.test(v) || OTHER_DATE.test(v);
}

function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

/**
 * Applies the evidence above to the records of a sample. Cost O(fields).
 * Example: `[['name', 'weight'], ['a', '1.5'], ['b', '2']]` gives a header (a name above numbers).
 */
export function guessHeader(records: readonly (readonly string[])[], decimal: '.' | ','): HeaderGuess {
  const first = records[0];
  if (first === undefined) return { header: true, reason: 'header assumed: the sample has no records to decide from' };
  const rest = records.slice(1);
  const labels: number[] = [];
  const numbersFirst: number[] = [];
  for (let j = 0; j < first.length; j++) {
    let filled = 0;
    let typedBelow = 0;
    for (const r of rest) {
      const v = r[j];
      if (v === undefined || v.trim() === '') continue;
      filled++;
      if (typed(v, decimal)) typedBelow++;
    }
    if (filled === 0 || typedBelow * 10 < filled * 8) continue;
    const top = first[j]!;
    if (typed(top, decimal)) numbersFirst.push(j);
    else if (top.trim() !== '') labels.push(j);
  }
  if (labels.length > 0) {
    const j = labels[0]!;
    return { header: true, reason: `header: the first record has text ("${first[j]}") above numbers or dates in ${plural(labels.length, 'column')}` };
  }
  if (numbersFirst.length > 0) {
    const j = numbersFirst[0]!;
    return { header: false, reason: `no header: the first record already holds numbers or dates ("${first[j]}") where later records do, in ${plural(numbersFirst.length, 'column')}` };
  }
  const filledFirst = first.filter((v) => v.trim() !== '');
  if (rest.length === 0) {
    if (filledFirst.length > 0 && filledFirst.every((v) => typed(v, decimal))) {
      return { header: false, reason: 'no header: the only record holds numbers or dates, not names' };
    }
    return { header: true, reason: 'header: the only record is made of names' };
  }
  for (let j = 0; j < first.length; j++) {
    const top = first[j]!;
    if (top.trim() === '') continue;
    if (rest.some((r) => r[j] === top)) {
      return { header: false, reason: `no header: "${top}", in the first record, recurs below in column ${j + 1}, as data values do` };
    }
  }
  if (new Set(filledFirst).size === filledFirst.length) {
    return { header: true, reason: 'header: the first record\'s values are distinct and none recurs below in its column' };
  }
  return { header: true, reason: 'header assumed: nothing in the sample decides it' };
}
