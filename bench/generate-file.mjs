// Writes the seeded benchmark file: 12 columns of invented data chosen to exercise every path of
// the engine (integers, decimals of four shapes, categories of three cardinalities with quoted
// cells holding delimiters and doubled quotes, ISO dates, a sparse column). The same seed and size
// always give the same bytes, so figures from different runs compare.
import { closeSync, openSync, writeSync } from 'node:fs';

export const GENERATOR_VERSION = 1;

export const HEADER = ['id', 'gauge', 'flow', 'spike', 'balance', 'small_count', 'large_count', 'region', 'product', 'code', 'day', 'sparse'];

/** sfc32 (Chris Doty-Humphrey's Small Fast Counting generator, public domain): 32-bit state words, period >= 2^32. */
function sfc32(a, b, c, d) {
  return () => {
    a >>>= 0; b >>>= 0; c >>>= 0; d >>>= 0;
    const t = (a + b) | 0;
    a = b ^ (b >>> 9);
    b = (c + (c << 3)) | 0;
    c = (c << 21) | (c >>> 11);
    d = (d + 1) | 0;
    const r = (t + d) | 0;
    c = (c + r) | 0;
    return (r >>> 0) / 4294967296;
  };
}

const REGIONS = ['north', 'south', 'east', 'west', 'centre'];
const DAY_MS = 86_400_000;
const FIRST_DAY = Date.UTC(2015, 0, 1);

/**
 * Generates about `bytes` bytes of CSV into `path` (whole records; the last ends with a line break).
 * Returns the number of data records and bytes written.
 */
export function generateFile(path, bytes, seed = 20240611) {
  const rand = sfc32(0x9e3779b9, 0x243f6a88, 0xb7e15162, seed >>> 0);
  for (let i = 0; i < 20; i++) rand();
  let spare = NaN;
  const normal = () => {
    // Marsaglia's polar method: two independent standard normals per accepted pair.
    if (!Number.isNaN(spare)) {
      const s = spare;
      spare = NaN;
      return s;
    }
    let u, v, s;
    do {
      u = rand() * 2 - 1;
      v = rand() * 2 - 1;
      s = u * u + v * v;
    } while (s >= 1 || s === 0);
    const f = Math.sqrt((-2 * Math.log(s)) / s);
    spare = v * f;
    return u * f;
  };
  const products = Array.from({ length: 1200 }, (_, i) => `item-${String(i).padStart(4, '0')}`);
  // Some product names carry the delimiter or quotes, and so are quoted in the file.
  products[7] = '"item-0007, large"';
  products[11] = '"item-0011 ""promo"""';
  products[500] = '"item-0500, ""twin"" pack"';
  const alphabet = 'abcdefghijklmnopqrstuvwxyz0123456789';
  const code = () => {
    let s = '';
    for (let i = 0; i < 10; i++) s += alphabet[(rand() * 36) | 0];
    const r = rand();
    if (r < 0.01) return `"${s.slice(0, 5)},${s.slice(5)}"`;
    if (r < 0.015) return `"${s.slice(0, 4)} ""${s.slice(4)}"""`;
    return s;
  };
  const days = Array.from({ length: 3650 }, (_, i) => new Date(FIRST_DAY + i * DAY_MS).toISOString().slice(0, 10));
  const fd = openSync(path, 'w');
  let written = 0;
  let rows = 0;
  const head = HEADER.join(',') + '\n';
  writeSync(fd, head);
  written += Buffer.byteLength(head);
  const batch = [];
  try {
    while (written < bytes) {
      batch.length = 0;
      let batchBytes = 0;
      for (let k = 0; k < 20000 && written + batchBytes < bytes; k++) {
        rows++;
        const gauge = (50 + 10 * normal()).toFixed(3);
        const flow = Math.exp(2 + 0.75 * normal()).toFixed(2);
        const spike = rand() < 0.001 ? (1e6 * (1 + 999 * rand())).toFixed(1) : (100 + 5 * normal()).toFixed(1);
        const balance = ((rand() * 2 - 1) * 1000).toFixed(4);
        const small = (rand() * 101) | 0;
        const large = (rand() * 1_000_000) | 0;
        const region = REGIONS[Math.min(4, (-Math.log(1 - rand()) * 1.5) | 0)];
        const product = products[(rand() * rand() * 1200) | 0];
        const day = days[(rand() * 3650) | 0];
        const sparse = rand() < 0.2 ? '' : (rand() * 100).toFixed(2);
        const line = `${rows},${gauge},${flow},${spike},${balance},${small},${large},${region},${product},${code()},${day},${sparse}\n`;
        batch.push(line);
        batchBytes += line.length; // ASCII only
      }
      const text = batch.join('');
      writeSync(fd, text);
      written += batchBytes;
    }
  } finally {
    closeSync(fd);
  }
  return { rows, bytes: written };
}
