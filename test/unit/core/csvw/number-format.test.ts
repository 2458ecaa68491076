// Expected readings follow "Metadata Vocabulary for Tabular Data" (W3C Recommendation 2015) §6.4.2 and
// the UAX #35 pattern symbols it lists; the W3C validation tests 158-171 and 282-304 exercise more.
import { describe, expect, it } from 'vitest';
import { compileNumberFormat, parseNumberPattern } from '../../../../src/core/csvw/number-format';

const fmt = (pattern: string | null, groupChar: string | null = null, decimalChar = '.') => ({ pattern, decimalChar, groupChar });
const value = (r: { ok: boolean; value?: number }) => (r.ok ? r.value : 'invalid');

describe('compileNumberFormat without a pattern', () => {
  it('uses sign, exponent, percent and per-mille (the standard: "-25%" is -0.25, "1E6" is 1000000)', () => {
    const { read } = compileNumberFormat('double', null);
    expect(value(read('-25%'))).toBe(-0.25);
    expect(value(read('1E6'))).toBe(1000000);
    expect(value(read('5‰'))).toBe(0.005);
    expect(value(read('.5'))).toBe(0.5);
  });

  it('allows NaN, INF and -INF for double only', () => {
    expect(compileNumberFormat('double', null).read('-INF')).toEqual({ ok: true, value: -Infinity });
    expect(compileNumberFormat('decimal', null).read('INF').ok).toBe(false);
    expect(compileNumberFormat('integer', null).read('NaN').ok).toBe(false);
  });

  it('refuses an exponent for decimal and integer, a decimal part for integer', () => {
    expect(compileNumberFormat('decimal', null).read('1.5E3')).toEqual({ ok: false, reason: 'has an exponent, and the datatype is decimal' });
    expect(compileNumberFormat('integer', null).read('3.2').ok).toBe(false);
    expect(compileNumberFormat('integer', null).read('-17')).toEqual({ ok: true, value: -17 });
  });

  it('reads the declared decimal and grouping characters; two grouping characters in a row are invalid', () => {
    const { read } = compileNumberFormat('decimal', fmt(null, '.', ','));
    expect(value(read('10.000,1'))).toBe(10000.1);
    expect(read('1..0,5')).toEqual({ ok: false, reason: 'has two grouping separators "." in a row' });
    expect(compileNumberFormat('decimal', null).read('1,000').ok).toBe(false);
  });
});

describe('parseNumberPattern', () => {
  it('takes a pattern apart (the doc comment example)', () => {
    expect(parseNumberPattern('#,##0.0#', '.', ',')).toMatchObject({ minInt: 1, primary: 3, secondary: 3, minFrac: 1, maxFrac: 2, fracGroup: null });
    expect(parseNumberPattern('#,##,#00', '.', ',')).toMatchObject({ minInt: 2, primary: 3, secondary: 2 });
    expect(parseNumberPattern('0.0##,###', '.', ',')).toMatchObject({ minFrac: 1, maxFrac: 6, fracGroup: 3 });
    expect(parseNumberPattern('#0.###E#0', '.', ',')).toMatchObject({ minExp: 1 });
  });

  it('says why a pattern is not one', () => {
    expect(parseNumberPattern('0#', '.', ',')).toBe('"#" after "0" in the integer part');
    expect(parseNumberPattern('0.#0', '.', ',')).toBe('"0" after "#" in the fraction');
    expect(parseNumberPattern('abc', '.', ',')).toBe('no digit symbols ("0" or "#")');
    expect(parseNumberPattern('0.0.0', '.', ',')).toBe('more than one decimal separator "."');
    expect(parseNumberPattern('#,,##0', '.', ',')).toBe('misplaced grouping separator "," in the integer part');
  });
});

describe('compileNumberFormat with a pattern', () => {
  it('reads the doc comment example: "#,##0" needs grouping', () => {
    const { read } = compileNumberFormat('integer', fmt('#,##0', ','));
    expect(read('1,234')).toEqual({ ok: true, value: 1234 });
    expect(read('1234').ok).toBe(false);
  });

  it('checks minimum integer digits and fraction digits', () => {
    const { read } = compileNumberFormat('decimal', fmt('00.0#'));
    expect(value(read('07.5'))).toBe(7.5);
    expect(read('7.5')).toEqual({ ok: false, reason: 'does not fit the pattern "00.0#": expected at least 2 integer digits, got 1' });
    expect(read('07.555')).toEqual({ ok: false, reason: 'does not fit the pattern "00.0#": expected 1 to 2 decimal digits, got 3' });
  });

  it('scales by a percent or per-mille sign in the pattern, and allows a sign after a prefix', () => {
    expect(value(compileNumberFormat('decimal', fmt('%000')).read('%-123'))).toBe(-1.23);
    expect(value(compileNumberFormat('decimal', fmt('000‰')).read('+123‰'))).toBe(0.123);
  });

  it('requires the exponent the pattern has, with a capital E', () => {
    const { read } = compileNumberFormat('double', fmt('0.0E0'));
    expect(value(read('1.5E3'))).toBe(1500);
    expect(read('1.5e3').ok).toBe(false);
    expect(read('1.5').ok).toBe(false);
  });

  it('reads a pattern with custom characters', () => {
    const { read } = compileNumberFormat('decimal', fmt('#.##0,00', '.', ','));
    expect(value(read('1.234,50'))).toBe(1234.5);
  });

  it('reports an unusable pattern and reads without it', () => {
    const c = compileNumberFormat('decimal', fmt('0#'));
    expect(c.problem).toBe('"#" after "0" in the integer part');
    expect(value(c.read('12.5'))).toBe(12.5);
  });
});
