// Test helper: profiles bytes the way the CLI's workers do, in one thread: plan the ranges, run
// each, pass each state through serializeState -> structured clone (buffers transferred) ->
// deserializeState, join, assemble. Falls back to one pass exactly where the CLI does.
import { profileBytes } from '../../../../src/core/engine';
import type { ProfileOptions } from '../../../../src/core/options';
import { assembleProfile } from '../../../../src/core/profile/assemble-profile';
import { RangeJob } from '../../../../src/core/profile/job';
import { joinRangeStates } from '../../../../src/core/profile/join-range-states';
import { planRanges } from '../../../../src/core/profile/plan-ranges';
import { deserializeState, serializeState } from '../../../../src/core/profile/serialize-state';
import type { Profile } from '../../../../src/core/profile/types';
import { Utf8Validator } from '../../../../src/core/read/utf8-validator';

export interface RangedRun {
  profile: Profile;
  /** Ranges used; 1 when the plan or the boundary check fell back to one pass. */
  ranges: number;
}

export function profileInRanges(bytes: Uint8Array, options: ProfileOptions, parts: number, window = 64, chunk = 7): RangedRun {
  const read = (o: number, l: number) => bytes.subarray(o, o + l);
  const plan = planRanges(read, bytes.length, options, { name: null }, parts, { window, before: 8 });
  if ('fallback' in plan) return { profile: profileBytes(bytes, options).profile, ranges: 1 };
  let invalid = 0;
  const states = plan.tasks.map((t) => {
    const job = new RangeJob(t.plan);
    const check = new Utf8Validator();
    for (let at = t.from; at < t.to; at += chunk) {
      const part = bytes.subarray(at, Math.min(t.to, at + chunk));
      check.push(part);
      job.push(part);
    }
    check.end();
    invalid += check.invalid;
    const { data, transfer } = serializeState(job.end());
    return deserializeState(structuredClone(data, { transfer }));
  });
  // As the CLI: ill-formed UTF-8 is left to one pass, which says where the first one is.
  const merged = invalid > 0 ? null : joinRangeStates(states);
  if (!merged) return { profile: profileBytes(bytes, options).profile, ranges: 1 };
  const bom = merged.bomLength;
  return { profile: assembleProfile(merged, (o, l) => bytes.subarray(o + bom, o + bom + l)).profile, ranges: states.length };
}
