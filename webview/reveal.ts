// How the panel shows characters that could hide, reorder or break text. The core's
// revealInvisibles decides which characters count as hidden (one definition for the panel and the
// reports); the panel then draws each one as a marked token instead of a plain escape, so that a
// value holding the literal text "\u202E" still reads differently from one holding the control.
import { revealInvisibles } from '../src/core/markdown/reveal-invisibles';

export type Segment = { kind: 'text'; text: string } | { kind: 'mark'; text: string; title: string };

/** Names of the hidden characters a data file most often carries (Unicode names, shortened). */
const NAMES: Record<number, string> = {
  0x09: 'tab', 0x00: 'NUL', 0xa0: 'no-break space', 0x61c: 'Arabic letter mark', 0x200b: 'zero-width space',
  0x200c: 'zero-width non-joiner', 0x200d: 'zero-width joiner', 0x200e: 'left-to-right mark', 0x200f: 'right-to-left mark',
  0x202a: 'left-to-right embedding', 0x202b: 'right-to-left embedding', 0x202c: 'pop directional formatting',
  0x202d: 'left-to-right override', 0x202e: 'right-to-left override', 0x2066: 'left-to-right isolate',
  0x2067: 'right-to-left isolate', 0x2068: 'first strong isolate', 0x2069: 'pop directional isolate',
  0xfeff: 'byte-order mark (zero-width no-break space)',
};

/** Marks drawn for line breaks and for spaces at either end (which would otherwise vanish). */
export const BREAK_MARK = '↵';
export const SPACE_MARK = '␣';
export const CUT_MARK = '…';

function hex(cp: number): string {
  return `U+${cp.toString(16).toUpperCase().padStart(4, '0')}`;
}

function isHidden(ch: string): boolean {
  return revealInvisibles(ch, { maxLength: 2 }) !== ch;
}

/** Splits text into plain runs and marks; stops after `max` code points and says whether it cut. */
export function segments(text: string, max: number): { parts: Segment[]; cut: boolean } {
  const parts: Segment[] = [];
  let run = '';
  const flush = (): void => {
    if (run !== '') parts.push({ kind: 'text', text: run });
    run = '';
  };
  const mark = (shown: string, title: string): void => {
    flush();
    parts.push({ kind: 'mark', text: shown, title });
  };
  const points = Array.from(text);
  const cut = points.length > max;
  const kept = cut ? points.slice(0, max) : points;
  const leading = kept.findIndex((c) => c !== ' ');
  const firstSolid = leading < 0 ? kept.length : leading;
  let lastSolid = kept.length - 1;
  while (lastSolid >= 0 && kept[lastSolid] === ' ') lastSolid--;
  for (let i = 0; i < kept.length; i++) {
    const ch = kept[i] ?? '';
    const cp = ch.codePointAt(0) ?? 0;
    if (ch === ' ') {
      if (i < firstSolid || (i > lastSolid && !cut)) mark(SPACE_MARK, 'space at the edge of the value');
      else run += ch;
    } else if (ch === '\r') {
      if (kept[i + 1] === '\n') i++;
      mark(BREAK_MARK, 'line break');
    } else if (ch === '\n' || cp === 0x85 || cp === 0x2028 || cp === 0x2029) {
      mark(BREAK_MARK, 'line break');
    } else if (isHidden(ch)) {
      mark(hex(cp), NAMES[cp] ?? 'invisible or control character');
    } else {
      run += ch;
    }
  }
  flush();
  return { parts, cut };
}

/** The plain-text form, for canvas labels, tooltips and accessible names: marks as ⟨U+202E⟩. */
export function revealText(text: string, max: number): string {
  const { parts, cut } = segments(text, max);
  const body = parts.map((p) => (p.kind === 'text' ? p.text : p.text.startsWith('U+') ? `⟨${p.text}⟩` : p.text)).join('');
  return cut ? body + CUT_MARK : body;
}
