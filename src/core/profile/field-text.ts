// A cell's value from its raw bytes (as `spanOfField` bounds them): quotes removed, doubled quotes
// collapsed. Used only for the few cells that are flagged, so clarity beats speed here.
const decoder = new TextDecoder();

export function fieldTextAt(buf: Uint8Array, start: number, end: number, quote: number): string {
  if (quote >= 0 && end - start >= 1 && buf[start] === quote) {
    const closed = end - start >= 2 && buf[end - 1] === quote;
    const inner = decoder.decode(buf.subarray(start + 1, closed ? end - 1 : end));
    const q = String.fromCharCode(quote);
    return inner.replaceAll(q + q, q);
  }
  return decoder.decode(buf.subarray(start, end));
}
