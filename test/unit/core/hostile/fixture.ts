// Test helper (not a test): the committed hostile corpus (test/fixtures/hostile/, see SOURCES.md there),
// and a job fed in chunks, as the shells feed it.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { createProfileJob, type ProfileResult } from '../../../../src/core/engine';
import { resolveOptions, type ProfileOptions } from '../../../../src/core/options';

export const HOSTILE_DIR = join(__dirname, '../../../fixtures/hostile');

export function hostileBytes(name: string): Uint8Array {
  return new Uint8Array(readFileSync(join(HOSTILE_DIR, name)));
}

/** Pushes `bytes` in chunks of `chunk` bytes (1 MiB, the CLI's read size, by default) and finishes. */
export function profileInChunks(bytes: Uint8Array, options: ProfileOptions = resolveOptions(), chunk = 1 << 20): ProfileResult {
  const job = createProfileJob(options, { name: 'hostile.csv', size: bytes.length });
  for (let at = 0; at < bytes.length; at += chunk) job.push(bytes.subarray(at, at + chunk));
  return job.finish((offset, length) => bytes.subarray(offset, offset + length));
}
