// The file at a glance: its counts and dialect, the first-pass marker, the notices the engine
// raised, and the report action.
import type { Notice, Profile, Severity } from '../src/core/profile/types';
import { copy, profileFlagTotal, type PanelContext } from './context';
import { button, el, note, valueText, visible } from './dom';
import { count, delimiterName, encodingName, lineEndingName } from './format';

const NOTICE_WORD: Record<Severity, string> = { error: 'Problem', warning: 'Warning', information: 'Note', hint: 'Hint' };

function fact(label: string, value: string, attention = false, title?: string): HTMLDivElement {
  const box = el('div', { className: attention ? 'fact attention' : 'fact' },
    el('dt', { text: label }),
    el('dd', { text: value }));
  if (title) box.title = title;
  return box;
}

function bytes(n: number): string {
  if (n < 1024) return `${count(n)} B`;
  const units = ['KiB', 'MiB', 'GiB', 'TiB'];
  let v = n / 1024;
  let u = 0;
  while (v >= 1024 && u < units.length - 1) { v /= 1024; u++; }
  return `${v.toFixed(v < 10 ? 1 : 0)} ${units[u]}`;
}

function noticeItem(n: Notice): HTMLLIElement {
  const sev: Severity = Object.hasOwn(NOTICE_WORD, n.severity) ? n.severity : 'information';
  return el('li', { className: `notice sev-${sev}` },
    el('span', { className: 'notice-kind', text: NOTICE_WORD[sev] }),
    valueText(n.message, 500),
    n.line !== undefined ? el('span', { className: 'muted', text: ` (line ${count(n.line)})` }) : null);
}

/** The header notes say which column names were empty, repeated or carried a BOM, and what we call them. */
function headerNotes(p: Profile): HTMLElement | null {
  if (p.headerNotes.length === 0) return null;
  const problem = { empty: 'was empty', duplicate: 'repeats an earlier name', bom: 'began with a byte-order mark' } as const;
  const list = el('ul', { className: 'notices' });
  for (const h of p.headerNotes.slice(0, 50)) {
    const why = Object.hasOwn(problem, h.problem) ? problem[h.problem] : 'was changed';
    list.append(el('li', { className: 'notice sev-information' },
      el('span', { className: 'notice-kind', text: 'Header' }),
      `Field ${count(h.field + 1)} `, valueText(h.original, 40), ` ${why}; shown as `, valueText(h.name, 40), '.'));
  }
  if (p.headerNotes.length > 50) list.append(el('li', { className: 'muted', text: `and ${count(p.headerNotes.length - 50)} more header notes` }));
  return list;
}

export function headerStrip(ctx: PanelContext): HTMLElement {
  const p = ctx.profile;
  const title = el('h1', { className: 'file-title' }, valueText(ctx.fileLabel, 120));
  const actions = el('div', { className: 'header-actions' },
    button('Save report', () => copy(ctx, 'report'), 'btn'));
  const root = el('header', { className: 'strip' }, el('div', { className: 'strip-top' }, title, actions));

  if (p.partial) {
    root.append(el('p', { className: 'partial', text: '' },
      el('strong', { text: 'First pass — partial. ' }),
      `These figures cover the first ${count(p.rows)} records only; the full result replaces them when it is ready.`));
  }

  const flags = profileFlagTotal(p);
  const facts = el('dl', { className: 'facts-grid' },
    fact('Records', count(p.rows), false, 'data records, header excluded'),
    fact('Columns', count(p.columns.length)),
    fact('Ragged rows', count(p.raggedTotal), p.raggedTotal > 0, 'records with a different number of fields than the header'),
    fact('Duplicates', count(p.duplicateRecords), p.duplicateRecords > 0, 'duplicate records: identical to an earlier record'),
    fact('Flags', count(flags), flags > 0, 'candidates for review, not errors'),
    fact('Encoding', encodingName(p.encoding, p.bom)),
    fact('Delimiter', delimiterName(p.delimiter)),
    fact('Line ending', lineEndingName(p.lineEnding)));
  root.append(facts);
  const minor = [
    bytes(p.bytes), `${count(p.lines)} lines`, `${count(p.blankLines)} blank`,
    p.header ? 'header row' : 'no header row', `decimal ${p.decimalSeparator === ',' ? 'comma' : 'point'}`,
    `quote ${p.quote === '"' ? '"' : visible(p.quote, 4)}`,
  ];
  root.append(note(minor.join(' · '), 'muted minor'));

  if (p.notices.length > 0) {
    const list = el('ul', { className: 'notices' });
    for (const n of p.notices.slice(0, 50)) list.append(noticeItem(n));
    root.append(list);
  }
  const h = headerNotes(p);
  if (h) root.append(h);
  return root;
}
