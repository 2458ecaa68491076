import { describe, expect, it } from 'vitest';
import { splitFileAtRecords } from '../../../../src/core/profile/split-file';

// Record starts by RFC 4180 §2 (a line break outside quotes ends a record), read off the text.
const enc = new TextEncoder();
const bd = { delimiter: 44, quote: 34 };

describe('splitFileAtRecords', () => {
  it('cuts only at record starts, reading windows', () => {
    const bytes = enc.encode('h\n"x\ny"\n"p\nq"\nz\n');
    const reads: number[] = [];
    const read = (o: number, l: number) => {
      reads.push(l);
      return bytes.subarray(o, o + l);
    };
    const cuts = splitFileAtRecords(read, bytes.length, 0, 4, bd, { window: 8, before: 2 });
    for (const c of cuts) expect([0, 2, 8, 14]).toContain(c);
    expect(Math.max(...reads)).toBeLessThanOrEqual(16);
  });

  it('never cuts between the CR and LF of a line end', () => {
    const bytes = enc.encode('a,b\r\n1,2\r\n3,4\r\n5,6\r\n');
    const cuts = splitFileAtRecords((o, l) => bytes.subarray(o, o + l), bytes.length, 0, 3, bd);
    for (const c of cuts.slice(1)) expect(bytes[c - 1]).toBe(0x0a);
  });

  it('drops targets with no record start after them', () => {
    const bytes = enc.encode('a,b\n1,"long quoted\nfield that runs to the end"');
    expect(splitFileAtRecords((o, l) => bytes.subarray(o, o + l), bytes.length, 0, 2, bd, { window: 4 })).toEqual([0]);
  });
});
