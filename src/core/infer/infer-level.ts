// Level of measurement (Stevens 1946, "On the theory of scales of measurement", Science 103:677-680):
// nominal (categories), ordinal (ordered categories), interval (differences meaningful, arbitrary zero),
// ratio (a true zero, so ratios are meaningful). Data cannot prove its level; these are defaults with
// the reason shown, and the user can override them.
import type { ColumnType, Level } from '../profile/types';
import { ordinalOrder } from './ordinal-scales';

export interface LevelInput {
  name: string;
  type: ColumnType;
  /** Distinct non-missing values as written (for text), possibly capped. */
  distinctValues: readonly string[];
  distinct: number;
  count: number;
  min: number | null;
  max: number | null;
}

export interface LevelDecision {
  level: Level;
  reason: string;
  order: string[] | null;
}

const ID_NAME = /(^|[_\s-])(id|key|code|no|nr|number|serial|uuid|guid|sku|batch)$|^id[_\s-]|identifier/i;
const INTERVAL_NAME = /temp|celsius|fahrenheit|°c|°f|deg_?c|deg_?f|\byear\b|^year$|_year$|longitude|latitude|\blon\b|\blat\b/i;
const KELVIN_NAME = /kelvin|_k$|\(k\)/i;
const RATING_NAME = /rating|rank|grade|likert|stage|tier|level|score|stars/i;

export function inferLevel(c: LevelInput): LevelDecision {
  switch (c.type) {
    case 'boolean':
      return { level: 'nominal', reason: 'two categories (true/false)', order: null };
    case 'date':
    case 'datetime':
      return { level: 'interval', reason: 'dates: interval (differences are meaningful, the zero is a convention)', order: null };
    case 'text': {
      const order = c.distinct <= 20 ? ordinalOrder(c.distinctValues) : null;
      if (order) return { level: 'ordinal', reason: `ordered words ${order.join(' < ')}`, order };
      return { level: 'nominal', reason: 'unordered categories (text)', order: null };
    }
    case 'integer':
    case 'decimal': {
      if (c.type === 'integer' && ID_NAME.test(c.name) && c.distinct >= 0.95 * c.count && c.count > 1) {
        return { level: 'nominal', reason: 'identifier: whole numbers named like an id, nearly all distinct', order: null };
      }
      if (c.type === 'integer' && RATING_NAME.test(c.name) && c.distinct <= 11 && c.min !== null && c.max !== null && c.min >= 0 && c.max <= 10) {
        return { level: 'ordinal', reason: `rating scale: whole numbers ${c.min}-${c.max} named like a rating`, order: null };
      }
      if (KELVIN_NAME.test(c.name) && (c.min ?? 0) >= 0) {
        return { level: 'ratio', reason: 'absolute temperature (kelvin): ratio', order: null };
      }
      if (INTERVAL_NAME.test(c.name)) {
        return { level: 'interval', reason: 'a scale with an arbitrary zero (temperature in °C/°F, calendar year, coordinate): interval', order: null };
      }
      if (c.min !== null && c.min < 0) return { level: 'interval', reason: 'negative values present: interval', order: null };
      return { level: 'ratio', reason: 'non-negative measure: ratio', order: null };
    }
  }
}
