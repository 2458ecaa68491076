// Test helper: profiles bytes the way the CLI's workers do, in one thread: plan the ranges, run
// each, pass each state through serializeState -> structured clone (buffers transferred) ->
// deserializeState, join (about half of the columns joined and assembled "elsewhere", through
// structured clones as postMessage makes them), assemble. Falls back to one pass exactly where the
// CLI does.
import { profileBytes } from '../../../../src/core/engine';
import type { ProfileOptions } from '../../../../src/core/options';
import type { AssembledColumn } from '../../../../src/core/profile/assemble-column';
import { assembleWork, packColumns, pickColumnsToSend, unpackResults } from '../../../../src/core/profile/assemble-elsewhere';
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
  let pre: Map<number, AssembledColumn> | null = null;
  const merged = invalid > 0 ? null : joinRangeStates(states, (ranges) => {
    const send = pickColumnsToSend(ranges);
    if (send.length > 0) {
      const { work, transfer } = packColumns(ranges, send);
      const { results, transfer: back } = assembleWork(structuredClone(work, { transfer }));
      pre = unpackResults(structuredClone(results, { transfer: back }));
    }
    return new Set(send);
  });
  if (!merged) return { profile: profileBytes(bytes, options).profile, ranges: 1 };
  const bom = merged.bomLength;
  return { profile: assembleProfile(merged, (o, l) => bytes.subarray(o + bom, o + bom + l), pre).profile, ranges: states.length };
}
