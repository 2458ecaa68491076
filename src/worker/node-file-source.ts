// Desktop only: reads a file by path in chunks, so a file larger than VS Code hands to extensions
// never has to be held whole in memory.
import { closeSync, fstatSync, openSync, readSync } from 'node:fs';
import type { ByteSource } from './byte-source';

export function nodeFileSource(path: string): ByteSource {
  const fd = openSync(path, 'r');
  let open = true;
  const size = fstatSync(fd).size;
  return {
    size,
    read(offset, length) {
      const n = Math.max(0, Math.min(length, size - offset));
      const buf = new Uint8Array(n);
      let done = 0;
      while (done < n) {
        const got = readSync(fd, buf, done, n - done, offset + done);
        if (got === 0) break;
        done += got;
      }
      return done === n ? buf : buf.subarray(0, done);
    },
    close() {
      if (open) { open = false; closeSync(fd); }
    },
  };
}
