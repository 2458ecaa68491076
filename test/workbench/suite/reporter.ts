// A plain-text mocha reporter for both hosts: one line per test, the error of each failure, and one
// machine-readable summary line the runner reads (`[assay-result] {"passed":N,"failed":M}`).
import type * as MochaTypes from 'mocha';

export const RESULT_MARK = '[assay-result]';

/** `closingLine`: print `N passed, N failed` too (the desktop runner cannot read the result mark). */
export function makeReporter(closingLine = false): new (runner: MochaTypes.Runner) => object {
  return class AssayReporter {
    constructor(runner: MochaTypes.Runner) {
      let passed = 0;
      let failed = 0;
      let pending = 0;
      const t0 = Date.now();
      const name = (t: MochaTypes.Runnable): string => t.titlePath().join(' › ');
      runner.on('pass', (t: MochaTypes.Test) => {
        passed++;
        console.log(`  ✓ ${name(t)} (${t.duration ?? 0} ms)`);
      });
      runner.on('fail', (t: MochaTypes.Runnable, err: Error) => {
        failed++;
        console.log(`  ✗ ${name(t)}\n      ${String(err?.stack ?? err).split('\n').slice(0, 6).join('\n      ')}`);
      });
      runner.on('pending', (t: MochaTypes.Test) => {
        pending++;
        console.log(`  - ${name(t)} (skipped)`);
      });
      runner.on('end', () => {
        console.log(`${RESULT_MARK} ${JSON.stringify({ passed, failed, pending, ms: Date.now() - t0 })}`);
        if (closingLine) console.log(`${passed} passed, ${failed} failed`);
      });
    }
  };
}
