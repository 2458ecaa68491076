// Test entry for the web extension host (loaded by the workbench through extensionTestsPath).
// The browser build of mocha 11 sets the global `mocha`; the test files are required only after
// setup, so their top-level `suite(...)` calls find the tdd interface.
import 'mocha/mocha.js';
import { makeReporter } from './reporter';
import { loadSuiteFiles } from './suite-files';

declare const mocha: BrowserMocha;
interface BrowserMocha {
  setup(options: Record<string, unknown>): void;
  run(done: (failures: number) => void): void;
}

export function run(): Promise<void> {
  mocha.setup({ ui: 'tdd', reporter: makeReporter(), timeout: 30_000, color: false, ...(__ASSAY_GREP__ !== '' ? { grep: __ASSAY_GREP__ } : {}) });
  loadSuiteFiles();
  return new Promise((resolve, reject) => {
    try {
      mocha.run((failures) => (failures > 0 ? reject(new Error(`${failures} tests failed`)) : resolve()));
    } catch (e) {
      reject(e instanceof Error ? e : new Error(String(e)));
    }
  });
}
