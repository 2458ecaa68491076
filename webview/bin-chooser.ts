// The bin rule chooser: a named rule, a number of bins or a width. The resulting rule name and
// bin count come back from the host in the histogram's label and are shown beside the chooser.
import type { BinChoice, BinRuleId } from '../src/core/options';
import { button, el, uid } from './dom';

// Names, with the published definition as the option's tooltip (from the rules' usual statements).
const RULES: [BinRuleId | 'count' | 'width', string, string][] = [
  ['fd', 'Freedman-Diaconis', 'width 2 IQR / n^(1/3) (Freedman & Diaconis 1981)'],
  ['scott', 'Scott', 'width 3.49 SD / n^(1/3) (Scott 1979)'],
  ['sturges', 'Sturges', 'log2(n) + 1 bins (Sturges 1926)'],
  ['doane', 'Doane', 'Sturges corrected for skewness (Doane 1976)'],
  ['rice', 'Rice', '2 n^(1/3) bins'],
  ['sqrt', 'Square root', '√n bins'],
  ['auto', 'Auto', 'chosen by the engine from the data'],
  ['count', 'Fixed number of bins…', 'you give the number of bins'],
  ['width', 'Fixed bin width…', 'you give the width'],
];

export interface BinChooser {
  root: HTMLElement;
  /** Shows the label of the histogram on screen, or a message. */
  show(text: string, pending?: boolean): void;
}

export function binChooser(initial: BinChoice, onChoose: (choice: BinChoice) => void): BinChooser {
  const selectId = uid('bins');
  const select = el('select');
  select.id = selectId;
  for (const [value, label, title] of RULES) {
    const o = el('option', { text: label, title });
    o.value = value;
    select.append(o);
  }
  select.value = initial.rule;
  const amountId = uid('bin-amount');
  const amount = el('input', { className: 'amount' });
  amount.id = amountId;
  amount.type = 'number';
  amount.min = '0';
  amount.step = 'any';
  const amountLabel = el('label', { className: 'amount-label' });
  amountLabel.htmlFor = amountId;
  const apply = button('Apply', () => submit(), 'btn secondary');
  const custom = el('span', { className: 'custom' }, amountLabel, amount, apply);
  const result = el('output', { className: 'bin-result' });
  result.setAttribute('aria-live', 'polite');
  const error = el('span', { className: 'field-error' });

  const syncCustom = (): void => {
    const rule = select.value;
    custom.hidden = rule !== 'count' && rule !== 'width';
    amountLabel.textContent = rule === 'count' ? 'bins' : 'width';
    amount.step = rule === 'count' ? '1' : 'any';
    amount.min = rule === 'count' ? '1' : '0';
  };
  if (initial.rule === 'count') amount.value = String(initial.count);
  if (initial.rule === 'width') amount.value = String(initial.width);
  syncCustom();

  function submit(): void {
    error.textContent = '';
    const rule = select.value;
    if (rule === 'count') {
      const n = Number(amount.value);
      if (!Number.isInteger(n) || n < 1 || n > 10_000) { error.textContent = 'a whole number from 1 to 10 000'; return; }
      onChoose({ rule: 'count', count: n });
    } else if (rule === 'width') {
      const w = Number(amount.value);
      if (!(w > 0) || !Number.isFinite(w)) { error.textContent = 'a positive number'; return; }
      onChoose({ rule: 'width', width: w });
    } else {
      onChoose({ rule: rule as BinRuleId });
    }
  }
  select.addEventListener('change', () => {
    syncCustom();
    if (custom.hidden) submit();
    else amount.focus();
  });
  amount.addEventListener('keydown', (e) => { if (e.key === 'Enter') submit(); });

  const label = el('label', { text: 'Bins' });
  label.htmlFor = selectId;
  const root = el('div', { className: 'chooser' }, label, select, custom, error, result);
  return {
    root,
    show(text, pending = false) {
      result.textContent = text;
      result.classList.toggle('pending', pending);
    },
  };
}
