// Gates for pipelines (`--fail-on`): which kinds of findings make a delivery fail.
import type { Profile } from './profile/types';

export type FailOn = 'flags' | 'invalid' | 'constraints';

/** Plain-words reasons why the profile fails the given gates; empty when it passes. */
export function failOnReasons(profile: Profile, gates: readonly FailOn[]): string[] {
  const reasons: string[] = [];
  const total = (pred: (rule: string) => boolean) =>
    profile.columns.reduce((n, c) => n + c.flagTotals.filter((t) => pred(t.rule)).reduce((m, t) => m + t.total, 0), 0) +
    profile.recordFlagTotals.filter((t) => pred(t.rule)).reduce((m, t) => m + t.total, 0);
  if (gates.includes('flags')) {
    const n = total(() => true);
    if (n > 0) reasons.push(`${n} flag${n === 1 ? '' : 's'} found`);
  }
  if (gates.includes('invalid')) {
    const n = profile.columns.reduce((m, c) => m + c.invalid, 0);
    if (n > 0) reasons.push(`${n} invalid cell${n === 1 ? '' : 's'} found`);
  }
  if (gates.includes('constraints')) {
    const n = total((rule) => rule === 'constraint' || rule === 'duplicate-key');
    const meta = profile.notices.filter((x) => x.code === 'metadata' && x.severity === 'error');
    if (n > 0) reasons.push(`${n} constraint violation${n === 1 ? '' : 's'} found`);
    if (meta.length > 0) reasons.push(`the metadata is invalid (${meta.length} problem${meta.length === 1 ? '' : 's'})`);
  }
  return reasons;
}
