// Test entry for the desktop extension host (@vscode/test-electron): the same suite, Node mocha.
import Mocha from 'mocha';
import { makeReporter } from './reporter';
import { loadSuiteFiles } from './suite-files';

export function run(): Promise<void> {
  const mocha = new Mocha({ ui: 'tdd', reporter: makeReporter(true) as unknown as Mocha.ReporterConstructor, timeout: 30_000, color: false, ...(__ASSAY_GREP__ !== '' ? { grep: __ASSAY_GREP__ } : {}) });
  mocha.suite.emit('pre-require', globalThis, 'assay-suite', mocha);
  loadSuiteFiles();
  return new Promise((resolve, reject) => {
    mocha.run((failures) => (failures > 0 ? reject(new Error(`${failures} tests failed`)) : resolve()));
  });
}
