import { describe, expect, it } from 'vitest';
import { parseNumber } from '../../../../src/core/infer/parse-number';

// Expected values: ECMAScript Number() (ECMA-262 §7.1.4.1.1, StringToNumber) for the plain decimal
// forms, which is correctly rounded; the grouping and decimal-comma forms are common practice
// (CLDR number patterns: groups of three, "," or "." as the group separator).
describe('parseNumber', () => {
  it('reads plain decimal notation like Number()', () => {
    for (const t of ['0', '12', '-3', '+5', '1.5', '-0.25', '.5', '5.', '1e3', '1E-3', '-2.5e+10', '007']) {
      expect(parseNumber(t, '.')?.value).toBe(Number(t));
    }
  });
  it('tells whole numbers from decimals by how they are written', () => {
    expect(parseNumber('12', '.')).toEqual({ value: 12, integer: true });
    expect(parseNumber('12.0', '.')).toEqual({ value: 12, integer: false });
    expect(parseNumber('1e3', '.')).toEqual({ value: 1000, integer: false });
    expect(parseNumber('90071992547409931', '.')?.integer).toBe(false); // beyond 2^53: not exact
  });
  it('reads -0 as 0', () => {
    expect(Object.is(parseNumber('-0', '.')?.value, 0)).toBe(true);
  });
  it('accepts strict digit grouping only', () => {
    expect(parseNumber('1,234.5', '.')?.value).toBe(1234.5);
    expect(parseNumber('1,234,567', '.')?.value).toBe(1234567);
    expect(parseNumber('1.234,5', ',')?.value).toBe(1234.5);
    expect(parseNumber('1,2', '.')).toBeNull();
    expect(parseNumber('12,34', '.')).toBeNull();
    expect(parseNumber('1234,567', '.')).toBeNull();
  });
  it('reads a decimal comma when told to', () => {
    expect(parseNumber('12,5', ',')?.value).toBe(12.5);
    expect(parseNumber('-0,75', ',')?.value).toBe(-0.75);
    expect(parseNumber('12,5', '.')).toBeNull();
  });
  it('rejects what is not plain decimal notation', () => {
    for (const t of ['', '+', '-', '.', 'e5', '1e', '0x1F', '∞', 'Infinity', 'NaN', '1e309', '-1e309', '1 000', '12abc', '1.2.3', '--1']) {
      expect(parseNumber(t, '.'), t).toBeNull();
    }
  });
});
