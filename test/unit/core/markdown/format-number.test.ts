import { describe, expect, it } from 'vitest';
import { checkSignificantDigits, formatNumber, NO_NUMBER } from '../../../../src/core/markdown/format-number';

describe('formatNumber', () => {
  it('runs the doc comment examples', () => {
    expect(formatNumber(Math.PI)).toBe('3.142'); // pi = 3.14159..., 4 significant digits (common practice)
    expect(formatNumber(0.000012346)).toBe('1.235e-5');
    // 0.000012345 is stored as 1.23449999...e-5 (IEEE 754 double), so it rounds down: correct, not a bug.
    expect(formatNumber(0.000012345)).toBe('1.234e-5');
  });

  it('writes null and NaN as an em dash, never "NaN" or "null"', () => {
    expect(NO_NUMBER).toBe('—');
    expect(formatNumber(null)).toBe('—');
    expect(formatNumber(Number.NaN)).toBe('—');
    expect(formatNumber(Infinity)).toBe('∞');
    expect(formatNumber(-Infinity)).toBe('-∞');
  });

  it('never writes -0', () => {
    expect(formatNumber(-0)).toBe('0');
    expect(formatNumber(-0.4, 1)).toBe('-0.4');
    expect(formatNumber(-1e-300)).toBe('-1e-300');
  });

  it('writes integers in full, without grouping', () => {
    expect(formatNumber(0)).toBe('0');
    expect(formatNumber(42)).toBe('42');
    expect(formatNumber(123456789)).toBe('123456789');
    expect(formatNumber(-10000002)).toBe('-10000002'); // NIST StRD NumAcc1 certified mean is 10000002
    expect(formatNumber(999999999999999)).toBe('999999999999999');
    expect(formatNumber(1e15)).toBe('1e+15');
  });

  it('rounds to significant digits and drops trailing zeros', () => {
    // NIST StRD Michelso: certified mean 299.852400000000, s 0.0790105478190518.
    expect(formatNumber(299.8524)).toBe('299.9');
    expect(formatNumber(0.0790105478190518)).toBe('0.07901');
    expect(formatNumber(0.0790105478190518, 6)).toBe('0.0790105');
    // NIST StRD Mavro: s = 0.000429123454003053.
    expect(formatNumber(0.000429123454003053)).toBe('0.0004291');
    expect(formatNumber(2.5)).toBe('2.5');
    expect(formatNumber(0.1 + 0.2)).toBe('0.3');
    expect(formatNumber(1 / 3)).toBe('0.3333');
    expect(formatNumber(2 / 3, 2)).toBe('0.67');
  });

  it('switches to exponent notation for very small and very large non-integers', () => {
    expect(formatNumber(0.0001)).toBe('0.0001');
    expect(formatNumber(0.00001)).toBe('1e-5');
    expect(formatNumber(6.02214076e23)).toBe('6.022e+23'); // Avogadro constant (SI 2019, exact)
    expect(formatNumber(-1.5e-7)).toBe('-1.5e-7');
  });

  it('keeps the integer digits of large non-integers instead of cutting them', () => {
    expect(formatNumber(12345.67)).toBe('12346');
    expect(formatNumber(1000000.2)).toBe('1000000'); // NIST StRD NumAcc3 certified mean 1000000.2
    expect(formatNumber(1000000.2, 8)).toBe('1000000.2');
  });

  it('handles rounding that carries into a new digit', () => {
    expect(formatNumber(9.99996)).toBe('10');
    expect(formatNumber(999.96)).toBe('1000');
    expect(formatNumber(0.099996)).toBe('0.1');
  });

  it('rejects a number of digits that cannot be used, in the project message pattern', () => {
    expect(() => formatNumber(1, 0)).toThrow('significantDigits: expected a whole number from 1 to 17, got 0');
    expect(() => checkSignificantDigits(2.5)).toThrow(/got 2\.5$/);
    expect(() => checkSignificantDigits(18)).toThrow(RangeError);
    expect(checkSignificantDigits(17)).toBe(17);
  });
});
