// Runs the enabled rules of src/core/rules on one column and turns their hits into pending flags.
// Numeric rules read the row-indexed values; text rules read the cells as written, as the column's
// category codes with the dictionary's texts (no cell text was kept per row, and none is made), so
// they need the dictionary uncapped.
import { KIND_MASK, KIND_MISSING } from '../infer/classify-cell';
import type { RuleId } from '../options';
import { categoryVariant } from '../rules/category-variant';
import { recode, type CodedCells } from '../rules/coded-cells';
import { duplicateKey } from '../rules/duplicate-key';
import { generalizedEsd } from '../rules/generalized-esd';
import { grubbs } from '../rules/grubbs';
import { mixedMissingTokens } from '../rules/mixed-missing-tokens';
import { modifiedZ } from '../rules/modified-z';
import { nearConstant } from '../rules/near-constant';
import { surroundingWhitespace } from '../rules/surrounding-whitespace';
import { tukeyFence } from '../rules/tukey-fence';
import type { RuleResult } from '../rules/types';
import { zScore } from '../rules/z-score';
import type { FlagInput, PendingFlag } from './column-flags';
import type { NumericStats } from './types';

export interface RuleOutcome {
  pending: PendingFlag[];
  /** True totals per rule (hits are capped). */
  totals: Map<RuleId, number>;
  /** Rules that did not run on this column, and why. */
  skipped: { rule: RuleId; reason: string }[];
}

export function ruleFlags(input: FlagInput, outcome: RuleOutcome): void {
  const { column, ctx, rowValues } = input;
  const sorted = input.sorted ?? undefined;
  const r = ctx.options.rules;
  const on = (id: RuleId) => r.enabled.has(id);
  const maxFlags = r.maxFlagsPerRule;
  const field = column.index;
  const take = (res: RuleResult, withValue: boolean): void => {
    if (res.skipped) {
      outcome.skipped.push({ rule: res.rule, reason: res.skipped });
      return;
    }
    outcome.totals.set(res.rule, (outcome.totals.get(res.rule) ?? 0) + res.total);
    for (const h of res.hits) {
      const p: PendingFlag = { row: h.index + 1, field, rule: res.rule, severity: h.severity, message: h.message };
      if (withValue && typeof h.value === 'string') p.value = h.value;
      for (const k of ['score', 'threshold', 'lower', 'upper'] as const) {
        const v = h[k];
        if (v !== undefined && Number.isFinite(v)) p[k] = v;
      }
      if (h.fix !== undefined) p.fix = h.fix;
      outcome.pending.push(p);
    }
  };

  const numeric = column.type === 'integer' || column.type === 'decimal';
  // Outlier rules measure distances, so they need at least an interval scale; an identifier or a
  // rating has no meaningful "far".
  if (numeric && rowValues && column.stats && 'mean' in column.stats && (column.level === 'interval' || column.level === 'ratio')) {
    const s: NumericStats = column.stats;
    if (on('tukey-fence')) take(tukeyFence(rowValues, s, { k: r.tukeyK, farK: r.tukeyFarK, maxFlags, sorted }), false);
    if (on('modified-z')) take(modifiedZ(rowValues, s, { threshold: r.modifiedZThreshold, maxFlags, sorted }), false);
    if (on('z-score')) take(zScore(rowValues, s, { threshold: r.zThreshold, maxFlags, sorted }), false);
    if (on('grubbs')) take(grubbs(rowValues, { alpha: r.grubbsAlpha, maxFlags }), false);
    if (on('generalized-esd')) take(generalizedEsd(rowValues, { maxOutliers: r.esdMaxOutliers, alpha: r.esdAlpha, maxFlags }), false);
    if (on('out-of-domain') && column.level === 'ratio' && s.min < 0) {
      // A ratio level was set (declared or by option) although negatives exist: a measure with a true zero cannot be negative.
      for (let i = 0; i < rowValues.length; i++) {
        if (rowValues[i]! < 0) {
          outcome.pending.push({ row: i + 1, field, rule: 'out-of-domain', severity: 'information', message: `${rowValues[i]} is negative, but "${column.name}" is a ratio measure (a true zero), which cannot be below 0 — a candidate for review` });
          outcome.totals.set('out-of-domain', (outcome.totals.get('out-of-domain') ?? 0) + 1);
        }
      }
    }
  }

  const textRules: RuleId[] = ['surrounding-whitespace', 'category-variant', 'mixed-missing-tokens', 'near-constant', 'duplicate-key'];
  if (!textRules.some(on)) return;
  if (!input.codes) {
    for (const rule of textRules.filter(on)) outcome.skipped.push({ rule, reason: 'the column has more distinct values than are kept exactly' });
    return;
  }
  const cells = cellsAsWritten(input);
  const tokens = new Set(ctx.missingTokens);
  // Called once per distinct text.
  const isMissing = (cell: string) => tokens.has(cell.trim());
  if (on('surrounding-whitespace')) take(surroundingWhitespace(cells, { isMissing, maxFlags }), true);
  if (on('category-variant') && !numeric && column.type !== 'date' && column.type !== 'datetime') take(categoryVariant(cells, { isMissing, maxFlags }), true);
  if (on('mixed-missing-tokens')) take(mixedMissingTokens(cells, { isMissing, maxFlags }), true);
  if (on('near-constant')) take(nearConstant(cells, { share: r.nearConstantShare, isMissing, maxFlags }), true);
  if (on('duplicate-key')) take(duplicateKey(cells, { name: column.name, declared: ctx.primaryKey, isMissing, maxFlags }), true);
}

/**
 * Every cell of the column as written, coded: the dictionary entry, the missing token, or '' for
 * an absent field. Missing and absent cells get codes past the dictionary's; `recode` merges any
 * that spell the same text and numbers the texts in order of first appearance.
 */
function cellsAsWritten(input: FlagInput): CodedCells {
  const { acc, ctx } = input;
  const labels = [...acc.categories.keys()];
  const base = labels.length;
  // One slot per missing-token kind, then one for an absent field.
  const tokenSlots = KIND_MASK + 1 - KIND_MISSING;
  for (let t = 0; t < tokenSlots; t++) labels.push(ctx.missingTokens[t] ?? '');
  labels.push('');
  const absent = base + tokenSlots;
  const codes = input.codes!;
  const kinds = acc.kinds.view();
  return recode(codes.length, (i) => {
    const c = codes[i]!;
    if (c >= 0) return c;
    const kind = kinds[i]! & KIND_MASK;
    return kind >= KIND_MISSING ? base + kind - KIND_MISSING : absent;
  }, labels);
}
