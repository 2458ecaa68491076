// Where a profiling job reads its bytes from: the whole input in memory (document text, or a file the
// host read through workspace.fs), or a file the Node worker reads itself, chunk by chunk.

/** Random-access, synchronous reads (a worker may block: it is not the extension host). */
export interface ByteSource {
  readonly size: number;
  /** Up to `length` bytes from `offset` (fewer at the end of the input). */
  read(offset: number, length: number): Uint8Array;
  close(): void;
}

/** Opens a file by path; only the Node worker has one. */
export type OpenFile = (path: string) => ByteSource;

export function memorySource(bytes: Uint8Array): ByteSource {
  return {
    size: bytes.length,
    read: (offset, length) => bytes.subarray(offset, Math.min(bytes.length, offset + length)),
    close: () => undefined,
  };
}

/** UTF-8 bytes of a document's text, BOM-free, as the engine's offsets expect. */
export function textSource(text: string): ByteSource {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  return memorySource(new TextEncoder().encode(body));
}
