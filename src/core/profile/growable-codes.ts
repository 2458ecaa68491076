// Category codes per row in the narrowest array that holds them: one byte per row while a column
// has fewer than 255 distinct values, two below 65 535, four beyond. Most columns with codes at all
// (those under the distinct cap) are low-cardinality, so this cuts their per-row memory by 2-4x.

/**
 * A growable array of codes >= -1 (-1: no code), stored as code + 1 and widened on demand.
 * @example const c = new GrowableCodes(); c.push(3); c.push(-1); c.push(70000); c.view() // Int32Array [3, -1, 70000]
 */
export class GrowableCodes {
  data: Uint8Array | Uint16Array | Int32Array = new Uint8Array(16);
  length = 0;
  private max = 0xff;

  push(code: number): void {
    const v = code + 1;
    if (v > this.max) this.widen(v);
    if (this.length === this.data.length) this.grow(this.length * 2);
    this.data[this.length++] = v;
  }

  /** Code of row i (-1: none). */
  get(i: number): number {
    return this.data[i]! - 1;
  }

  /** The codes as Int32Array (a new array; -1 where a row has no code). */
  view(): Int32Array {
    const out = new Int32Array(this.length);
    const d = this.data;
    for (let i = 0; i < out.length; i++) out[i] = d[i]! - 1;
    return out;
  }

  /** Makes room for `n` codes exactly (when the final size is known). */
  reserve(n: number): void {
    if (n > this.data.length) this.grow(n);
  }

  /**
   * Appends `src`'s codes, each code c as `remap[c]` (-1, or a code past `remap`, as -1): how a
   * later range's codes join this one's dictionary. One pass over typed arrays, widened once.
   * @example a.appendMapped(b, Int32Array.of(2, 0)) // b's codes 0, 1, -1 are appended as 2, 0, -1
   */
  appendMapped(src: GrowableCodes, remap: ArrayLike<number>): void {
    const s = src.data;
    const n = src.length;
    let top = 0;
    for (let j = 0; j < n; j++) if (s[j]! > top) top = s[j]!;
    // Stored values (code + 1) -> stored values; 0 stays 0 (no code).
    const table = new Int32Array(top + 1);
    let max = 0;
    for (let v = 1; v <= top; v++) {
      const m = v - 1 < remap.length ? remap[v - 1]! + 1 : 0;
      table[v] = m > 0 ? m : 0;
      if (m > max) max = m;
    }
    if (max > this.max) this.widen(max);
    this.reserve(this.length + n);
    const d = this.data;
    const at = this.length;
    for (let j = 0; j < n; j++) d[at + j] = table[s[j]!]!;
    this.length = at + n;
  }

  /** Takes over stored data (code + 1 per row), e.g. from another thread. */
  adopt(data: Uint8Array | Uint16Array | Int32Array, length: number): void {
    this.data = data;
    this.length = length;
    this.max = data instanceof Uint8Array ? 0xff : data instanceof Uint16Array ? 0xffff : 0x7fffffff;
  }

  private widen(v: number): void {
    const next = v <= 0xffff ? new Uint16Array(this.data.length) : new Int32Array(this.data.length);
    next.set(this.data.subarray(0, this.length));
    this.data = next;
    this.max = next instanceof Uint16Array ? 0xffff : 0x7fffffff;
  }

  private grow(capacity: number): void {
    const cap = Math.max(16, capacity);
    const next = this.data instanceof Uint8Array ? new Uint8Array(cap) : this.data instanceof Uint16Array ? new Uint16Array(cap) : new Int32Array(cap);
    next.set(this.data.subarray(0, this.length));
    this.data = next;
  }
}
