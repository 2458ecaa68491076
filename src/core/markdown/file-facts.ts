// How the file was read: the facts a reader needs before trusting any statistic.
import type { Profile } from '../profile/types';
import { revealInvisibles } from './reveal-invisibles';
import type { TableContext, TableSpec } from './table-spec';

const CHARACTER_NAMES: Record<string, string> = {
  ',': 'comma', ';': 'semicolon', '\t': 'tab', '|': 'vertical bar', ' ': 'space', ':': 'colon',
  '"': 'double quote', '\'': 'single quote', '.': 'full stop',
};

/** A delimiter or quote written so it can be read: `, (comma)`, `tab (U+0009)`, `^ (U+005E)`. */
export function describeCharacter(ch: string): string {
  const cp = ch.codePointAt(0) ?? 0;
  const code = `U+${cp.toString(16).toUpperCase().padStart(4, '0')}`;
  const name = CHARACTER_NAMES[ch];
  if (ch === '\t' || ch === ' ') return `${name} (${code})`;
  return name ? `${ch} (${name})` : `${revealInvisibles(ch)} (${code})`;
}

export function fileFactsSpec(profile: Profile, ctx: TableContext): TableSpec {
  const first = profile.ragged[0];
  const ragged = profile.raggedTotal === 0 ? '0'
    : `${profile.raggedTotal}${first ? `; first at line ${first.line}: ${first.fields} fields, ${first.expected} expected` : ''}`;
  return {
    caption: { file: ctx.file, column: null, method: 'how the file was read' },
    headers: ['Fact', 'Value'],
    align: ['left', 'left'],
    rows: [
      ['Records', String(profile.rows)],
      ['Columns', String(profile.columns.length)],
      ['Header row', profile.header ? 'yes' : 'no'],
      ['Encoding', profile.bom ? `${profile.encoding} with byte order mark` : profile.encoding],
      ['Delimiter', describeCharacter(profile.delimiter)],
      ['Quote', describeCharacter(profile.quote)],
      ['Decimal separator', describeCharacter(profile.decimalSeparator)],
      ['Line ending', profile.lineEnding],
      ['Size', `${profile.bytes} bytes, ${profile.lines} lines`],
      ['Blank lines', String(profile.blankLines)],
      ['Ragged rows', ragged],
      ['Duplicate records', String(profile.duplicateRecords)],
      ['Coverage', profile.partial ? `first pass: the first ${profile.rows} records only` : 'the whole file'],
    ],
    notes: [],
  };
}
