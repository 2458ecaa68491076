// Test entry for the web extension host (loaded by the workbench through extensionTestsPath).
// The browser build of mocha 11 sets the global `mocha`; the test files are required only after
// setup, so their top-level `suite(...)` calls find the tdd interface.
import 'mocha/mocha.js';
import { AFTER_RELOAD, readReloadNote } from './reload-phase';
import { makeReporter } from './reporter';
import { loadSuiteFiles } from './suite-files';

declare const mocha: BrowserMocha;
interface BrowserMocha {
  setup(options: Record<string, unknown>): void;
  run(done: (failures: number) => void): void;
}

export async function run(): Promise<void> {
  // After the reload test reloaded the window, only the tests that check the reloaded window run.
  const note = await readReloadNote();
  // Mocha reads a grep string as a pattern; the title prefix is matched literally.
  const grep = note !== undefined ? new RegExp(AFTER_RELOAD.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')) : __ASSAY_GREP__;
  mocha.setup({ ui: 'tdd', reporter: makeReporter(false, note?.carried), timeout: 30_000, color: false, ...(grep !== '' ? { grep } : {}) });
  loadSuiteFiles();
  return new Promise((resolve, reject) => {
    try {
      mocha.run((failures) => (failures + (note?.carried.failed ?? 0) > 0 ? reject(new Error(`${failures} tests failed`)) : resolve()));
    } catch (e) {
      reject(e instanceof Error ? e : new Error(String(e)));
    }
  });
}
