// A plain-text mocha reporter for both hosts: one line per test, the error of each failure, and one
// machine-readable summary line the runner reads (`[assay-result] {"passed":N,"failed":M}`).
import type * as MochaTypes from 'mocha';

export const RESULT_MARK = '[assay-result]';

export interface Tally { passed: number; failed: number; pending: number }

/** The counts so far of the running reporter (the reload test carries them into the reloaded window). */
export const tally: Tally = { passed: 0, failed: 0, pending: 0 };

/**
 * `closingLine`: print `N passed, N failed` too (the desktop runner cannot read the result mark).
 * `carried`: results of the suite's life before a window reload, counted in.
 */
export function makeReporter(closingLine = false, carried: Tally = { passed: 0, failed: 0, pending: 0 }): new (runner: MochaTypes.Runner) => object {
  return class AssayReporter {
    constructor(runner: MochaTypes.Runner) {
      Object.assign(tally, carried);
      const t0 = Date.now();
      const name = (t: MochaTypes.Runnable): string => t.titlePath().join(' › ');
      runner.on('pass', (t: MochaTypes.Test) => {
        tally.passed++;
        console.log(`  ✓ ${name(t)} (${t.duration ?? 0} ms)`);
      });
      runner.on('fail', (t: MochaTypes.Runnable, err: Error) => {
        tally.failed++;
        console.log(`  ✗ ${name(t)}\n      ${String(err?.stack ?? err).split('\n').slice(0, 6).join('\n      ')}`);
      });
      runner.on('pending', (t: MochaTypes.Test) => {
        tally.pending++;
        console.log(`  - ${name(t)} (skipped)`);
      });
      runner.on('end', () => {
        const { passed, failed, pending } = tally;
        console.log(`${RESULT_MARK} ${JSON.stringify({ passed, failed, pending, ms: Date.now() - t0 })}`);
        if (closingLine) console.log(`${passed} passed, ${failed} failed`);
      });
    }
  };
}
