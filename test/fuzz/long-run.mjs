#!/usr/bin/env node
// A long local run of the core fuzz test (test/unit/core/hostile/fuzz.test.ts), which CI runs for
// about 20 s. Usage: node test/fuzz/long-run.mjs [seconds, default 600] [seed]
// The same test reads ASSAY_FUZZ_SECONDS (and ASSAY_FUZZ_SEED to replay a failure fast-check printed).
import { spawnSync } from 'node:child_process';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
const seconds = Number(process.argv[2] ?? 600);
if (!(seconds > 0)) {
  console.error(`long-run: seconds must be a positive number, got ${process.argv[2]}`);
  process.exit(2);
}
const env = { ...process.env, ASSAY_FUZZ_SECONDS: String(seconds) };
if (process.argv[3] !== undefined) env.ASSAY_FUZZ_SEED = process.argv[3];
const vitest = join(root, 'node_modules', 'vitest', 'vitest.mjs');
const r = spawnSync(process.execPath, [vitest, 'run', 'test/unit/core/hostile/fuzz.test.ts'], { cwd: root, env, stdio: 'inherit' });
process.exit(r.status ?? 1);
