import { describe, expect, it } from 'vitest';
import { revealInvisibles } from '../../../../src/core/markdown/reveal-invisibles';

describe('revealInvisibles', () => {
  it('runs the doc comment example', () => {
    expect(revealInvisibles(' a\r\nb\u202E')).toBe('␠a↵b\\u202E');
  });

  it('shows every kind of line break as one mark', () => {
    expect(revealInvisibles('a\r\nb\rc\nd\u2028e\u2029f\u0085g')).toBe('a↵b↵c↵d↵e↵f↵g');
    expect(revealInvisibles('\r\n\r\n')).toBe('↵↵');
  });

  it('shows bidirectional controls (Unicode UAX #9) as escapes', () => {
    const controls = [0x200e, 0x200f, 0x202a, 0x202b, 0x202c, 0x202d, 0x202e, 0x2066, 0x2067, 0x2068, 0x2069, 0x061c];
    for (const cp of controls) {
      expect(revealInvisibles(`x${String.fromCodePoint(cp)}y`)).toBe(`x\\u${cp.toString(16).toUpperCase().padStart(4, '0')}y`);
    }
  });

  it('shows NUL, other C0 and C1 controls, DEL, zero-width and odd spaces', () => {
    expect(revealInvisibles('a\u0000b\u0007c\tde\u007f\u009b')).toBe('a\\u0000b\\u0007c\\u0009de\\u007F\\u009B');
    expect(revealInvisibles('a\u200bb\ufeffc\u00a0d\u202fe\u3000f')).toBe('a\\u200Bb\\uFEFFc\\u00A0d\\u202Fe\\u3000f');
  });

  it('shows tag characters and unpaired surrogates', () => {
    expect(revealInvisibles('ok\u{E0041}\u{E007F}')).toBe('ok\\u{E0041}\\u{E007F}');
    expect(revealInvisibles('a\ud800b\udc00')).toBe('a\\uD800b\\uDC00');
    expect(revealInvisibles('😀')).toBe('😀');
  });

  it('marks leading and trailing spaces only', () => {
    expect(revealInvisibles('  a b  ')).toBe('␠␠a b␠␠');
    expect(revealInvisibles('   ')).toBe('␠␠␠');
    expect(revealInvisibles('')).toBe('');
  });

  it('cuts long text at maxLength code points with an ellipsis, never inside a surrogate pair', () => {
    expect(revealInvisibles('x'.repeat(10_000))).toBe(`${'x'.repeat(200)}…`);
    expect(revealInvisibles('x'.repeat(200))).toBe('x'.repeat(200));
    expect(revealInvisibles('abcdef', { maxLength: 3 })).toBe('abc…');
    expect(revealInvisibles('😀😀😀', { maxLength: 2 })).toBe('😀😀…');
    expect(revealInvisibles('abc', { maxLength: Infinity })).toBe('abc');
    expect(() => revealInvisibles('a', { maxLength: 0 })).toThrow('maxLength: expected a number of at least 1, got 0');
  });
});
