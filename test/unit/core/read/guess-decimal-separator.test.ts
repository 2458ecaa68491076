// Expected answers: common practice for number formats (a decimal comma with `.` grouping in many
// European locales, a decimal point with `,` grouping in English-speaking ones); "1,234" is ambiguous.
import { describe, expect, it } from 'vitest';
import { guessDecimalSeparator } from '../../../../src/core/read/guess-decimal-separator';

describe('guessDecimalSeparator', () => {
  it('the doc example: 12,5 and 3,75 with ";"', () => {
    expect(guessDecimalSeparator([['12,5', '3,75']], ';').separator).toBe(',');
  });
  it('grouped forms decide both ways', () => {
    expect(guessDecimalSeparator([['1.234,5'], ['1.234.567']], ';').separator).toBe(',');
    expect(guessDecimalSeparator([['1,234.5'], ['1,234,567']], ',').separator).toBe('.');
  });
  it('"1,234" alone is a decimal comma only with a delimiter other than ","', () => {
    expect(guessDecimalSeparator([['1,234'], ['2,500']], ';').separator).toBe(',');
    expect(guessDecimalSeparator([['1,234']], '\t').separator).toBe(',');
    expect(guessDecimalSeparator([['1,234']], ',').separator).toBe('.');
  });
  it('the majority wins, and "." is the default', () => {
    expect(guessDecimalSeparator([['0,5', '1.5', '2.5']], ';').separator).toBe('.');
    expect(guessDecimalSeparator([['a', '12']], ';')).toEqual({ separator: '.', reason: 'decimal separator ".": no decimal numbers in the sample decide it; "." is the default' });
  });
});
