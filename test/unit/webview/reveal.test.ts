import { describe, expect, it } from 'vitest';
import { revealText, segments } from '../../../webview/reveal';

describe('revealing hidden characters in the panel', () => {
  it('marks bidirectional controls with their code point and Unicode name (UAX #9 explicit formatting characters)', () => {
    const { parts } = segments('a\u202Eb', 80);
    expect(parts).toEqual([
      { kind: 'text', text: 'a' },
      { kind: 'mark', text: 'U+202E', title: 'right-to-left override' },
      { kind: 'text', text: 'b' },
    ]);
    expect(revealText('x\u2066y\u2069', 80)).toBe('x⟨U+2066⟩y⟨U+2069⟩');
  });

  it('shows one mark per line break, CRLF included, and marks spaces only at the edges', () => {
    expect(revealText('a\r\nb\nc\rd', 80)).toBe('a↵b↵c↵d');
    expect(revealText('  a b ', 80)).toBe('␣␣a b␣');
  });

  it('leaves plain and right-to-left letters alone', () => {
    expect(revealText('Ελληνικά שלום', 80)).toBe('Ελληνικά שלום');
  });

  it('cuts by code points without splitting a surrogate pair, and says it cut', () => {
    const text = '😀'.repeat(10);
    const { parts, cut } = segments(text, 3);
    expect(cut).toBe(true);
    expect(parts).toEqual([{ kind: 'text', text: '😀😀😀' }]);
    expect(revealText(text, 3)).toBe('😀😀😀…');
    // A space where the value was cut is not the value's edge.
    expect(revealText('ab  cd', 3)).toBe('ab …');
  });

  it('marks a lone surrogate, which would otherwise render as nothing', () => {
    expect(revealText('a\ud800b', 80)).toBe('a⟨U+D800⟩b');
  });
});
