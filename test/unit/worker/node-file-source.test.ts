// Desktop file reading in chunks: any chunking gives back the file's exact bytes, reads past the end
// are short, and close is idempotent.
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { nodeFileSource } from '../../../src/worker/node-file-source';

const dir = mkdtempSync(join(tmpdir(), 'assay-file-source-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('nodeFileSource', () => {
  const bytes = Uint8Array.from({ length: 10_000 }, (_, i) => (i * 31) % 256);
  const path = join(dir, 'data.bin');
  writeFileSync(path, bytes);

  it.each([1, 7, 4096, 10_000, 1 << 20])('reads the whole file back in chunks of %i bytes', (chunk) => {
    const source = nodeFileSource(path);
    expect(source.size).toBe(10_000);
    const parts: Uint8Array[] = [];
    for (let at = 0; at < source.size; at += chunk) parts.push(source.read(at, chunk));
    source.close();
    expect(Buffer.concat(parts)).toEqual(Buffer.from(bytes));
  });

  it('gives a short read at the end and an empty one past it; close twice is harmless', () => {
    const source = nodeFileSource(path);
    expect(source.read(9_995, 100)).toEqual(bytes.subarray(9_995));
    expect(source.read(20_000, 10).length).toBe(0);
    source.close();
    expect(() => source.close()).not.toThrow();
  });

  it('fails plainly for a missing file', () => {
    expect(() => nodeFileSource(join(dir, 'missing.csv'))).toThrow(/ENOENT/);
  });
});
