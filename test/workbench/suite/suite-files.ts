// Replaced at bundle time (test/workbench/build-suite.mjs) by a module that requires every
// `*.test.ts` of this folder in name order. This body is what type-checking sees.
export function loadSuiteFiles(): void {
  throw new Error('suite-files: the suite must be bundled by test/workbench/build-suite.mjs');
}
