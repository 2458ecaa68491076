// The status bar's words, kept apart from `vscode` so the exact text is unit-tested.
import type { Profile } from '../../core/profile/types';

/**
 * All findings the engine counted (not only the ones it kept), cells and records: per column the rule
 * totals, or the kept list when longer. The panel counts the same way (webview/context.ts).
 */
export function flagCount(profile: Profile): number {
  const sum = (ts: { total: number }[]): number => ts.reduce((s, t) => s + t.total, 0);
  let n = Math.max(sum(profile.recordFlagTotals), profile.recordFlags.length);
  for (const c of profile.columns) n += Math.max(sum(c.flagTotals), c.flags.length);
  return n;
}

const whole = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });

function plural(n: number, one: string, many: string): string {
  return `${whole.format(n)} ${n === 1 ? one : many}`;
}

/** e.g. "1,204 records · 7 flags", or "first 20,000 records · 3 flags" for a first pass. */
export function statusText(profile: Profile): string {
  const records = profile.partial ? `first ${plural(profile.rows, 'record', 'records')}` : plural(profile.rows, 'record', 'records');
  return `${records} · ${plural(flagCount(profile), 'flag', 'flags')}`;
}
