// The fixtures workspace both runners open: a fresh copy per run under test-output/ (git-ignored),
// so the tests' edits and created files never touch the sources; the demo file is added when present.
import { cpSync, existsSync, mkdirSync, rmSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
export const ROOT = join(here, '..', '..');
export const OUTPUT_DIR = join(ROOT, 'test-output');
export const SCREENSHOT_DIR = join(OUTPUT_DIR, 'screenshots');

export function prepareWorkspace(name = 'workbench-workspace') {
  const workspace = join(OUTPUT_DIR, name);
  rmSync(workspace, { recursive: true, force: true });
  cpSync(join(here, 'fixtures'), workspace, { recursive: true });
  const demo = join(ROOT, 'demo', 'roastery-batches.csv');
  if (existsSync(demo)) cpSync(demo, join(workspace, 'roastery-batches.csv'));
  mkdirSync(join(workspace, '.assay-ack'), { recursive: true });
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  return workspace;
}
