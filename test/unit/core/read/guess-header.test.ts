// Expected answers follow the evidence rules in the source's header comment, on samples written for
// the test (common practice: a header row names the columns, and names are not numbers or dates).
import { describe, expect, it } from 'vitest';
import { guessHeader } from '../../../../src/core/read/guess-header';

describe('guessHeader', () => {
  it('the doc example: a name above numbers', () => {
    expect(guessHeader([['name', 'weight'], ['a', '1.5'], ['b', '2']], '.')).toEqual({ header: true, reason: 'header: the first record has text ("weight") above numbers or dates in 1 column' });
  });
  it('dates below text count like numbers', () => {
    expect(guessHeader([['when'], ['2021-03-04'], ['04.03.2021'], ['3/4/2021']], '.').header).toBe(true);
  });
  it('numbers in the decimal-comma convention', () => {
    expect(guessHeader([['12,5', '1'], ['3,75', '2']], ',').header).toBe(false);
    expect(guessHeader([['price'], ['12,5'], ['1.234,5']], ',').header).toBe(true);
  });
  it('a single record of numbers is data; of names, a header', () => {
    expect(guessHeader([['1', '2.5']], '.').header).toBe(false);
    expect(guessHeader([['a', 'b']], '.').header).toBe(true);
  });
  it('no records: a header is assumed', () => {
    expect(guessHeader([], '.').header).toBe(true);
  });
  it('duplicate names in the first record do not, alone, say "no header"', () => {
    expect(guessHeader([['x', 'x'], ['a', 'b'], ['c', 'd']], '.')).toEqual({ header: true, reason: 'header assumed: nothing in the sample decides it' });
  });
});
