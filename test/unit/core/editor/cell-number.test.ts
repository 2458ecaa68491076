// The number a cell stands for: plain decimal numbers (the engine's parseNumber) and ISO 8601 dates
// as milliseconds since 1970-01-01T00:00Z (the engine's parseDate).
import { describe, expect, it } from 'vitest';
import { cellNumber } from '../../../../src/core/editor/cell-number';

describe('cellNumber', () => {
  it('runs the doc comment examples', () => {
    expect(cellNumber(' 245.57', 'decimal', '.')).toBe(245.57);
    // 2024-02-29 is day 19782 after 1970-01-01 (19782 × 86 400 000 ms; computed by hand from the calendar).
    expect(cellNumber('2024-02-29', 'date', '.')).toBe(1709164800000);
  });

  it('reads a decimal comma where the file uses one, and nothing for text, numeric dates or non-numbers', () => {
    expect(cellNumber('1,5', 'decimal', ',')).toBe(1.5);
    expect(cellNumber('six', 'decimal', '.')).toBeNull();
    expect(cellNumber('12', 'text', '.')).toBeNull();
    expect(cellNumber('29/02/2024', 'date', '.')).toBeNull();
  });
});
