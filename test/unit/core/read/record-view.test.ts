// The view on its own, set up by hand as the scanner would. Expected texts follow RFC 4180 section 2
// (quotes removed, doubled quotes collapsed) and the scanner's documented lenient rules (a loose
// field reads as written; an unterminated one runs to the end).
import { describe, expect, it } from 'vitest';
import { FIELD_ESCAPED, FIELD_LOOSE, FIELD_QUOTED, FIELD_UNTERMINATED, MutableRecordView } from '../../../../src/core/read/record-view';

const enc = new TextEncoder();

function viewOf(text: string, cells: [number, number, number][], base = 0, offset = 500): MutableRecordView {
  const v = new MutableRecordView('"');
  const pad = new Uint8Array(base);
  const bytes = new Uint8Array([...pad, ...enc.encode(text)]);
  v.bytes = bytes;
  v.base = base;
  v.offset = offset;
  v.fieldCount = cells.length;
  v.starts = Int32Array.from(cells.map((c) => c[0]));
  v.ends = Int32Array.from(cells.map((c) => c[1]));
  v.flags = Uint8Array.from(cells.map((c) => c[2]));
  return v;
}

describe('MutableRecordView', () => {
  it('reads plain, quoted, escaped, loose and unterminated cells', () => {
    // a,"b,c","d""e","f"g,"h  (offsets relative to the record start)
    const text = 'a,"b,c","d""e","f"g,"h';
    const v = viewOf(text, [[0, 1, 0], [2, 7, FIELD_QUOTED], [8, 14, FIELD_QUOTED | FIELD_ESCAPED], [15, 19, FIELD_QUOTED | FIELD_LOOSE], [20, 22, FIELD_QUOTED | FIELD_UNTERMINATED]], 3);
    expect([0, 1, 2, 3, 4].map((i) => v.text(i))).toEqual(['a', 'b,c', 'd"e', '"f"g', 'h']);
    expect([v.start(1), v.end(1)]).toEqual([502, 507]);
    expect([v.valueStart(1), v.valueEnd(1)]).toEqual([6, 9]); // base 3: inside the quotes
    expect([v.valueStart(3), v.valueEnd(3)]).toEqual([18, 22]); // loose: the raw cell
    expect([v.quoted(0), v.quoted(1), v.escaped(2), v.escaped(3), v.loose(3)]).toEqual([false, true, true, false, true]);
  });
  it('decodes non-ASCII in short and long cells alike, and empty cells as ""', () => {
    const text = 'é,' + 'ü'.repeat(30) + ',"",';
    const v = viewOf(text, [[0, 2, 0], [3, 63, 0], [64, 66, FIELD_QUOTED], [67, 67, 0]]);
    expect([0, 1, 2, 3].map((i) => v.text(i))).toEqual(['é', 'ü'.repeat(30), '', '']);
  });
  it('rejects a field index out of range', () => {
    const v = viewOf('a', [[0, 1, 0]]);
    expect(() => v.text(1)).toThrow('field: expected 0 to 0, got 1');
    expect(() => v.start(-1)).toThrow(RangeError);
  });
});
