import { describe, expect, it } from 'vitest';
import { count, delimiterName, interval, num, percent, plural } from '../../../webview/format';

describe('panel number wording', () => {
  it('groups counts in threes with a narrow no-break space (SI Brochure, 9th ed., 5.4.4: digits in groups of three, from memory)', () => {
    expect(count(0)).toBe('0');
    expect(count(999)).toBe('999');
    expect(count(1000)).toBe('1\u202f000');
    expect(count(1234567)).toBe('1\u202f234\u202f567');
    expect(count(-4500)).toBe('-4\u202f500');
    expect(count(Number.NaN)).toBe('—');
  });

  it('writes statistics with the core formatter (same digits as the Markdown copy)', () => {
    expect(num(Math.PI, 4)).toBe('3.142');
    expect(num(null, 4)).toBe('—');
    expect(num(undefined, 4)).toBe('—');
  });

  it('writes bins as half-open intervals [a, b), the closed last one as [a, b] (common practice)', () => {
    expect(interval({ lower: 10, upper: 12.5, closed: false }, 4)).toBe('[10, 12.5)');
    expect(interval({ lower: 12.5, upper: 15, closed: true }, 4)).toBe('[12.5, 15]');
  });

  it('never shows a small non-zero share as 0.0 %', () => {
    expect(percent(0.125)).toBe('12.5\u00a0%');
    expect(percent(0)).toBe('0.0\u00a0%');
    expect(percent(0.0001)).toBe('<\u00a00.1\u00a0%');
    expect(percent(0.99999)).toBe('>\u00a099.9\u00a0%');
    expect(percent(1)).toBe('100.0\u00a0%');
    expect(percent(null)).toBe('—');
  });

  it('names delimiters, and spells an unusual one as a code point', () => {
    expect(delimiterName(',')).toBe('comma (,)');
    expect(delimiterName('\t')).toBe('tab');
    expect(delimiterName('\u001f')).toBe('U+001F');
    expect(plural(1, 'flag')).toBe('1 flag');
    expect(plural(2, 'flag')).toBe('2 flags');
  });
});
