// Decides a column's type from the kinds its cells read as. A family (numbers, dates, booleans)
// wins when it holds more than half of the non-missing cells; the rest of the cells are then
// `invalid` for that type. Below half, the column is text: a few numbers among words are words.
import type { ColumnType } from '../profile/types';
import {
  KIND_BOOLEAN, KIND_DATE, KIND_DATETIME, KIND_DECIMAL, KIND_IMPOSSIBLE, KIND_INTEGER, KIND_SLASH,
} from './classify-cell';

export interface KindCounts {
  integer: number;
  decimal: number;
  boolean: number;
  date: number;
  datetime: number;
  slash: number;
  text: number;
  impossible: number;
}

export type SlashOrder = 'day-first' | 'month-first' | null;

export interface TypeDecision {
  type: ColumnType;
  reason: string;
  /** For each cell kind, whether it fits the type. */
  fits: (kind: number) => boolean;
  slashOrder: SlashOrder;
}

/**
 * @param slashValid how many numeric dates are valid when read day-first and month-first.
 */
export function inferType(
  k: KindCounts,
  forced: ColumnType | null,
  slashValid: { dayFirst: number; monthFirst: number },
): TypeDecision {
  const nonMissing = k.integer + k.decimal + k.boolean + k.date + k.datetime + k.slash + k.text + k.impossible;
  const numeric = k.integer + k.decimal;
  let slashOrder: SlashOrder = null;
  if (k.slash > 0 && slashValid.dayFirst !== slashValid.monthFirst) {
    slashOrder = slashValid.dayFirst > slashValid.monthFirst ? 'day-first' : 'month-first';
  }
  const slashUsable = slashOrder ? k.slash : 0;
  const dates = k.date + k.datetime + slashUsable + k.impossible;

  const make = (type: ColumnType, reason: string): TypeDecision => ({ type, reason, fits: fitsFor(type, slashOrder), slashOrder });
  if (forced) return make(forced, 'declared');
  if (nonMissing === 0) return make('text', 'no non-missing cells');
  const half = nonMissing / 2;
  const rest = (n: number) => (nonMissing - n > 0 ? ` (${nonMissing - n} ${nonMissing - n === 1 ? 'does' : 'do'} not)` : '');
  if (numeric > half && numeric >= dates) {
    const type: ColumnType = k.decimal > 0 ? 'decimal' : 'integer';
    return make(type, `${numeric} of ${nonMissing} non-missing cells read as ${type === 'decimal' ? 'numbers' : 'whole numbers'}${rest(numeric)}`);
  }
  if (dates > half) {
    const type: ColumnType = k.datetime > 0 ? 'datetime' : 'date';
    let reason = `${dates} of ${nonMissing} non-missing cells read as ${type === 'date' ? 'dates' : 'dates and times'}${rest(dates)}`;
    if (slashOrder) reason += ` (numeric dates read ${slashOrder}: ${slashOrder === 'day-first' ? 'a first part above 12 appears' : 'a second part above 12 appears'})`;
    return make(type, reason);
  }
  if (k.slash > half && !slashOrder) {
    return make('text', `${k.slash} cells look like dates, but day-first and month-first readings fit equally well, so they are kept as text`);
  }
  if (k.boolean > half) return make('boolean', `${k.boolean} of ${nonMissing} non-missing cells read as true/false or yes/no${rest(k.boolean)}`);
  return make('text', numeric + dates + k.boolean > 0
    ? `text: only ${numeric + dates + k.boolean} of ${nonMissing} non-missing cells read as numbers, dates or booleans`
    : 'text: no cell reads as a number, date or boolean');
}

export function fitsFor(type: ColumnType, slashOrder: SlashOrder): (kind: number) => boolean {
  switch (type) {
    case 'integer': return (kind) => kind === KIND_INTEGER;
    case 'decimal': return (kind) => kind === KIND_INTEGER || kind === KIND_DECIMAL;
    case 'boolean': return (kind) => kind === KIND_BOOLEAN;
    case 'date':
    case 'datetime': return (kind) => kind === KIND_DATE || kind === KIND_DATETIME || (kind === KIND_SLASH && slashOrder !== null);
    case 'text': return (kind) => kind >= KIND_INTEGER && kind <= KIND_IMPOSSIBLE && kind !== 0;
  }
}

