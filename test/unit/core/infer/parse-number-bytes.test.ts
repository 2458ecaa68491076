import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseNumber } from '../../../../src/core/infer/parse-number';
import { NUM_DECIMAL, NUM_NONE, NUM_PLAIN_INTEGER, parseNumberBytes, SHAPE_DIGITS, SHAPE_IRREGULAR, SHAPE_PADDED, SHAPE_TINY } from '../../../../src/core/infer/parse-number-bytes';

// Oracle: parseNumber on the same text (whose values are ECMAScript Number(), ECMA-262
// §7.1.4.1.1 StringToNumber, correctly rounded). The byte path must agree exactly: same accept /
// reject, same value bit for bit, same integer flag.
const enc = new TextEncoder();

function viaBytes(text: string, sep: '.' | ','): { value: number; integer: boolean } | null {
  // Embed the cell in other bytes, as it sits in a record.
  const b = enc.encode(`x;${text};y`);
  const out = { value: NaN, shape: 0 };
  const r = parseNumberBytes(b, 2, b.length - 2, sep, out);
  return r === NUM_NONE ? null : { value: out.value, integer: r !== NUM_DECIMAL };
}

const digits = (min: number, max: number) => fc.string({ unit: fc.constantFrom(...'0123456789'), minLength: min, maxLength: max });
const numberLike = fc.tuple(
  fc.constantFrom('', '+', '-'),
  digits(0, 18),
  fc.constantFrom('', '.', ','),
  digits(0, 18),
  fc.constantFrom('', 'e', 'E-', 'e+'),
  digits(0, 3),
).map(([s, i, d, f, e, x]) => s + i + d + f + (e ? e + x : ''));
const grouped = fc.tuple(digits(1, 3), fc.array(digits(3, 3), { minLength: 1, maxLength: 4 }), fc.constantFrom(',', '.'), fc.constantFrom('', '.5', ',25'))
  .map(([a, groups, g, tail]) => a + groups.map((x) => g + x).join('') + tail);
const anyText = fc.oneof(numberLike, grouped, fc.string({ maxLength: 12 }), fc.constantFrom('1e309', '-0', '-0.0', '0x1F', '∞', '1 000', '١٢'));

describe('parseNumberBytes', () => {
  it('agrees with parseNumber on generated text, for both decimal separators', () => {
    fc.assert(
      fc.property(anyText, fc.constantFrom<'.' | ','>('.', ','), (text, sep) => {
        const want = parseNumber(text, sep);
        const got = viaBytes(text, sep);
        expect(got === null, text).toBe(want === null);
        if (want && got) {
          expect(Object.is(got.value, want.value), text).toBe(true);
          expect(got.integer, text).toBe(want.integer);
        }
      }),
      { numRuns: 20000 },
    );
  });

  it('is exact: equals Number() on random doubles written with up to 17 significant digits', () => {
    // Number() (ECMA-262 StringToNumber) is correctly rounded; so must the fast path be.
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e12, max: 1e12 }), fc.integer({ min: 0, max: 12 }), (x, p) => {
        const text = x.toFixed(p);
        expect(Object.is(viaBytes(text, '.')?.value, Number(text) === 0 ? 0 : Number(text)), text).toBe(true);
      }),
      { numRuns: 20000 },
    );
  });

  it('reads the documented examples', () => {
    const b = enc.encode('-12.50');
    const out = { value: NaN, shape: 0 };
    expect(parseNumberBytes(b, 0, 6, '.', out)).toBe(NUM_DECIMAL);
    expect(out.value).toBe(-12.5);
    expect(parseNumberBytes(enc.encode('-125'), 0, 4, '.', out)).toBe(NUM_PLAIN_INTEGER);
    expect(viaBytes('1.234,5', ',')).toEqual({ value: 1234.5, integer: false });
    expect(viaBytes('007', '.')).toEqual({ value: 7, integer: true });
    expect(Object.is(viaBytes('-0', '.')?.value, 0)).toBe(true);
  });

  // The shape promises that the text follows from the value: checked against the language's own
  // formatting (ECMA-262 Number::toString and Number.prototype.toFixed), the reference for what
  // "written as String(value)" and "written as value.toFixed(k)" mean.
  it('says when a cell is written as String(value) or value.toFixed(digits), and never wrongly', () => {
    const shapeOf = (text: string, sep: '.' | ','): { r: number; value: number; shape: number } => {
      const b = enc.encode(`x;${text};y`);
      const out = { value: NaN, shape: -1 };
      const r = parseNumberBytes(b, 2, b.length - 2, sep, out);
      return { r, value: out.value, shape: out.shape };
    };
    let regular = 0;
    fc.assert(
      fc.property(fc.oneof(numberLike, anyText), fc.constantFrom<'.' | ','>('.', ','), (text, sep) => {
        const { r, value, shape } = shapeOf(text, sep);
        if (r === NUM_NONE || (shape & SHAPE_IRREGULAR) !== 0) return;
        regular++;
        const local = (t: string) => (sep === ',' ? t.replace('.', ',') : t);
        expect(local(value.toFixed(shape & SHAPE_DIGITS)), text).toBe(text);
        if ((shape & (SHAPE_PADDED | SHAPE_TINY)) === 0) expect(local(String(value)), text).toBe(text);
      }),
      { numRuns: 20000 },
    );
    expect(regular).toBeGreaterThan(1000);
  });

  it('marks the forms whose text does not follow from the value (documented examples)', () => {
    const shape = (text: string) => {
      const b = enc.encode(text);
      const out = { value: NaN, shape: -1 };
      parseNumberBytes(b, 0, b.length, '.', out);
      return out.shape;
    };
    // Each of these reads as a number whose String() or toFixed() is another text.
    for (const t of ['+5', '007', '-0', '-0.0', '.5', '5.', '1e3', '1,000', '0012.5']) expect(shape(t) & SHAPE_IRREGULAR, t).toBe(SHAPE_IRREGULAR);
    expect(shape('2.50')).toBe(2 | SHAPE_PADDED);
    expect(shape('-4.5')).toBe(1);
    expect(shape('0.0000001')).toBe(7 | SHAPE_TINY);
    expect(shape('0')).toBe(0);
    expect(shape('0.0')).toBe(1 | SHAPE_PADDED);
  });
});
