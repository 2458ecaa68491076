// Runs the same workbench suite in desktop VS Code through @vscode/test-electron (Node extension
// host, worker_threads worker). Needs to download VS Code 1.137.0 once, so it is not part of CI on
// machines without network; `npm run test:desktop` where it can.
//   ASSAY_WORKBENCH_BREAK=1 / ASSAY_WORKBENCH_GREP=<text> as for run.mjs;
//   ASSAY_VSCODE_EXECUTABLE=<path> uses an installed VS Code instead of downloading one.
import { execFileSync } from 'node:child_process';
import { join } from 'node:path';
import { buildSuite } from './build-suite.mjs';
import { ROOT, prepareWorkspace } from './workspace.mjs';

const { runTests } = await import('@vscode/test-electron');

execFileSync(process.execPath, [join(ROOT, 'esbuild.mjs')], { cwd: ROOT, stdio: 'inherit' });
const suite = await buildSuite('node');
const workspace = prepareWorkspace('desktop-workspace');
try {
  const code = await runTests({
    ...(process.env.ASSAY_VSCODE_EXECUTABLE ? { vscodeExecutablePath: process.env.ASSAY_VSCODE_EXECUTABLE } : { version: '1.137.0' }),
    extensionDevelopmentPath: ROOT,
    extensionTestsPath: suite,
    launchArgs: [workspace, '--disable-extensions', '--disable-workspace-trust', '--skip-welcome', '--skip-release-notes'],
  });
  process.exit(code);
} catch (e) {
  console.error(`desktop: ${e instanceof Error ? e.message : String(e)}`);
  console.log('0 passed, 1 failed');
  process.exit(1);
}
