// Byte codes are ASCII (ANSI X3.4 / RFC 20): `,` 0x2C, `;` 0x3B, tab 0x09, `|` 0x7C, `"` 0x22, `'` 0x27.
import { describe, expect, it } from 'vitest';
import { byteDialect, checkByteDialect } from '../../../../src/core/read/byte-dialect';

describe('byteDialect', () => {
  it('turns characters into byte codes', () => {
    expect(byteDialect({ delimiter: ';', quote: '"' })).toEqual({ delimiter: 0x3b, quote: 0x22 });
    expect(byteDialect({ delimiter: '\t', quote: "'" })).toEqual({ delimiter: 0x09, quote: 0x27 });
    expect(byteDialect({ delimiter: '|', quote: null })).toEqual({ delimiter: 0x7c, quote: -1 });
  });
  it('refuses what the byte scanner cannot match, in one line', () => {
    expect(() => byteDialect({ delimiter: '§', quote: '"' })).toThrow('delimiter: expected one ASCII character, got "§"');
    expect(() => byteDialect({ delimiter: ',,', quote: '"' })).toThrow(/delimiter/);
    expect(() => byteDialect({ delimiter: '\n', quote: '"' })).toThrow(/line break/);
    expect(() => byteDialect({ delimiter: '"', quote: '"' })).toThrow(/must differ/);
  });
  it('checks codes given directly', () => {
    expect(() => checkByteDialect({ delimiter: 0x2c, quote: -1 })).not.toThrow();
    expect(() => checkByteDialect({ delimiter: 0x100, quote: 0x22 })).toThrow(/delimiter/);
    expect(() => checkByteDialect({ delimiter: 0x2c, quote: 0x0d })).toThrow(/quote/);
  });
});
