// Which flags a file shows as editor problems, so that a file with a million findings stays
// responsive: at most `max`, the strongest first (warning before information before hint, then file
// order), and a count of the rest for one summary problem on the header. Pure.
import type { Flag, FlagTotal, Profile, Severity } from '../profile/types';

export interface DiagnosticPlan {
  /** The flags to show, in file order. */
  shown: Flag[];
  /** Findings of the enabled rules that are not shown (beyond `max`, or beyond the engine's per-rule cap). */
  notShown: number;
  /** Findings of the enabled rules in all (kept or not). */
  found: number;
}

const RANK: Record<Severity, number> = { error: 0, warning: 1, information: 2, hint: 3 };

function rank(s: Severity): number {
  return Object.hasOwn(RANK, s) ? RANK[s] : 3;
}

function byPosition(a: Flag, b: Flag): number {
  return a.line - b.line || a.row - b.row || (a.field ?? -1) - (b.field ?? -1) || (a.rule < b.rule ? -1 : a.rule > b.rule ? 1 : 0);
}

/** Findings of the enabled rules: the rule totals where the engine counted them, else the kept flags. */
function countFound(flags: readonly Flag[], totals: readonly FlagTotal[], on: (rule: string) => boolean): number {
  const kept = flags.filter((f) => on(f.rule)).length;
  const total = totals.filter((t) => on(t.rule)).reduce((s, t) => s + t.total, 0);
  return Math.max(kept, total);
}

/**
 * Plans the problems of one file: flags of rules in `enabled` only (a rule switched off disappears at
 * once, before the new profile arrives), at most `max` of them. Cost: O(f log f).
 * Example: 3 flags (warning, hint, information) with max 2 show the warning and the information
 * flag, in file order, and notShown 1.
 */
export function diagnosticFlags(profile: Profile, options: { enabled: ReadonlySet<string>; max: number }): DiagnosticPlan {
  const on = (rule: string): boolean => options.enabled.has(rule);
  let found = countFound(profile.recordFlags, profile.recordFlagTotals, on);
  const candidates = profile.recordFlags.filter((f) => on(f.rule));
  for (const c of profile.columns) {
    found += countFound(c.flags, c.flagTotals, on);
    for (const f of c.flags) if (on(f.rule)) candidates.push(f);
  }
  const max = Math.max(0, Math.floor(options.max));
  const shown = candidates.length <= max ? candidates.sort(byPosition)
    : candidates.sort((a, b) => rank(a.severity) - rank(b.severity) || byPosition(a, b)).slice(0, max).sort(byPosition);
  return { shown, notShown: Math.max(0, found - shown.length), found };
}

/** The summary problem's words. Example: moreFlagsMessage(5, 1000) starts "Assay: 5 more flags are not shown". */
export function moreFlagsMessage(notShown: number, max: number): string {
  const what = notShown === 1 ? '1 more flag is' : `${notShown} more flags are`;
  return `Assay: ${what} not shown as problems (the setting assay.diagnostics.max shows ${max}). `
    + 'Open the profile beside the file (Assay: Open Profile to the Side) to review them, or list the kept ones with Assay: Show Flagged Cells.';
}
