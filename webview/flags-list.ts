// A column's (or the file's record-level) flags: each entry is a button that asks the host to
// select the cell in the editor. The wording keeps to what a flag is: a candidate for review.
import type { Flag, FlagTotal, Severity } from '../src/core/profile/types';
import { copy, reveal, type PanelContext } from './context';
import { append, button, clear, el, note, section, valueText, visible } from './dom';
import { count } from './format';

/** Entries drawn at first and per "show more", so that 10 000 flags do not build 10 000 buttons at once. */
export const FLAG_PAGE = 100;

const SEVERITY_WORD: Record<Severity, string> = { error: 'strong', warning: 'check', information: 'note', hint: 'hint' };

export const FLAG_CAUTION = 'Flags are candidates for review, not errors. Change or remove a value only for a reason found outside these statistics (a recording fault, a unit mix-up, a known bad batch); being extreme is not such a reason.';

function flagEntry(ctx: PanelContext, f: Flag): HTMLLIElement {
  const where = f.field === null ? `row ${count(f.row)} · line ${count(f.line)} (whole record)` : `row ${count(f.row)} · line ${count(f.line)}`;
  // Class names come from our own table, never from the profile's text.
  const sev: Severity = Object.hasOwn(SEVERITY_WORD, f.severity) ? f.severity : 'hint';
  const b = el('button', { className: 'flag' },
    el('span', { className: `severity sev-${sev}`, text: SEVERITY_WORD[sev] }),
    el('span', { className: 'flag-where', text: where }),
    el('span', { className: 'flag-rule', text: visible(f.rule, 40) }),
    el('span', { className: 'flag-value' }, valueText(f.value, 60)),
    el('span', { className: 'flag-message' }, valueText(f.message, 300)),
  );
  b.type = 'button';
  b.title = 'Select this cell in the editor';
  b.addEventListener('click', () => reveal(ctx, f.row, f.field));
  return el('li', {}, b);
}

function totalsLine(flags: Flag[], totals: FlagTotal[]): string {
  if (totals.length === 0) return `${count(flags.length)} found.`;
  const parts = totals.filter((t) => t.total > 0).map((t) => (t.kept < t.total ? `${visible(t.rule, 40)} ${count(t.total)} (${count(t.kept)} listed)` : `${visible(t.rule, 40)} ${count(t.total)}`));
  return parts.join(' · ');
}

/** The flags section; `column` is null for record-level findings. `skipped` lists rules that did not run, and why. */
export function flagsSection(ctx: PanelContext, flags: Flag[], totals: FlagTotal[], column: string | null, title = 'Flags: candidates for review', skipped: { rule: string; reason: string }[] = []): HTMLElement {
  const none = flags.length === 0 && totals.every((t) => t.total === 0);
  const tools = none ? [] : [button('Copy as Markdown', () => copy(ctx, 'flags', column ?? undefined), 'btn secondary')];
  const { root, body } = section(title, 'h3', ...tools);
  root.classList.add('flags');
  const notRun = skipped.length === 0 ? null
    : note(`Not run here: ${skipped.slice(0, 20).map((s) => `${visible(s.rule, 40)} (${visible(s.reason, 200)})`).join('; ')}.`, 'muted');
  if (none) {
    append(body, note('No flags: no rule found anything to review here.'), notRun);
    return root;
  }
  append(body, note(FLAG_CAUTION, 'caution'), note(totalsLine(flags, totals), 'muted'), notRun);
  const list = el('ul', { className: 'flag-list' });
  body.append(list);
  const more = el('div', { className: 'more' });
  body.append(more);
  let shown = 0;
  const page = (): void => {
    const next = flags.slice(shown, shown + FLAG_PAGE);
    for (const f of next) list.append(flagEntry(ctx, f));
    shown += next.length;
    clear(more);
    if (shown < flags.length) {
      const b = button(`Show ${count(Math.min(FLAG_PAGE, flags.length - shown))} more (${count(flags.length - shown)} left)`, () => {
        const focusTarget = shown;
        page();
        // Keep keyboard users in place: focus the first entry just added.
        list.children[focusTarget]?.querySelector('button')?.focus();
      }, 'btn secondary');
      more.append(b);
    }
  };
  page();
  return root;
}
