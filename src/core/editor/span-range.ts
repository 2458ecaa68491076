// A flag's span as an editor range: 0-based lines and characters (UTF-16 code units), end exclusive,
// which is how editors (VS Code's Position/Range, the Language Server Protocol) count. The engine
// writes spans 1-based for people ("line 9, column 1"); this is the one place that shifts them. Pure.
import type { CellSpan } from '../profile/types';

export interface LineCharacter {
  /** 0-based line. */
  line: number;
  /** 0-based character on the line, in UTF-16 code units. */
  character: number;
}

export interface LineRange {
  start: LineCharacter;
  /** Exclusive. */
  end: LineCharacter;
}

/**
 * The editor range of a span: both ends one line and one character lower. Cost: O(1).
 * Example: spanRange({ startLine: 9, startColumn: 1, endLine: 9, endColumn: 7, ... })
 * → { start: { line: 8, character: 0 }, end: { line: 8, character: 6 } }.
 */
export function spanRange(span: CellSpan): LineRange {
  return {
    start: { line: span.startLine - 1, character: span.startColumn - 1 },
    end: { line: span.endLine - 1, character: span.endColumn - 1 },
  };
}

/** Negative when `a` is before `b`, 0 when equal, positive after (line first, then character). */
export function comparePositions(a: LineCharacter, b: LineCharacter): number {
  return a.line - b.line || a.character - b.character;
}
