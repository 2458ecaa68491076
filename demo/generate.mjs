// Writes demo/roastery-batches.csv: an invented coffee roastery's batch log (one record per roast),
// seeded so the file is the same on every run, with a few planted problems of the kind deliveries
// carry. The data is invented for the demo only; no test checks statistics against it.
//   node demo/generate.mjs
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

function mulberry32(seed) {
  return () => {
    seed |= 0;
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
const rand = mulberry32(20261202);
const normal = (mean, sd) => {
  const u = 1 - rand();
  const v = rand();
  return mean + sd * Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
};
const pick = (list, weights) => {
  let r = rand() * weights.reduce((a, b) => a + b, 0);
  for (let i = 0; i < list.length; i++) {
    r -= weights[i];
    if (r <= 0) return list[i];
  }
  return list[list.length - 1];
};

const origins = ['Ethiopia', 'Colombia', 'Kenya', 'Brazil', 'Guatemala', 'Sumatra', 'Costa Rica', 'Rwanda'];
const originWeights = [18, 20, 12, 22, 10, 8, 6, 4];
const processes = ['washed', 'natural', 'honey'];
const levels = ['light', 'medium', 'dark'];
const roasters = ['AK', 'MB', 'SO', 'TW'];
const lossByLevel = { light: 13.2, medium: 15.4, dark: 17.9 };
const tempByLevel = { light: 196, medium: 201, dark: 206 };

const header = ['batch_id', 'roast_date', 'origin', 'process', 'roast_level', 'green_weight_kg', 'roasted_weight_kg',
  'weight_loss_pct', 'charge_temp_c', 'roast_minutes', 'cupping_score', 'roaster', 'notes'];
const rows = [];
const start = Date.UTC(2025, 0, 6);
const N = 1200;
for (let i = 0; i < N; i++) {
  const day = new Date(start + Math.floor(i / 4) * 86400000 * 0.8);
  const level = pick(levels, [3, 5, 2]);
  const green = Math.max(4, normal(12, 1.8));
  const loss = normal(lossByLevel[level], 0.9);
  const roasted = green * (1 - loss / 100);
  const score = Math.min(92.5, normal(level === 'light' ? 86 : level === 'medium' ? 84.5 : 82.5, 1.4));
  rows.push([
    `RB-${String(i + 1).padStart(5, '0')}`,
    day.toISOString().slice(0, 10),
    pick(origins, originWeights),
    pick(processes, [6, 3, 1]),
    level,
    green.toFixed(2),
    roasted.toFixed(2),
    loss.toFixed(1),
    normal(tempByLevel[level], 2.5).toFixed(1),
    normal(level === 'dark' ? 13.5 : 11.5, 0.8).toFixed(1),
    score.toFixed(2),
    pick(roasters, [4, 3, 2, 1]),
    rand() < 0.06 ? pick(['first crack early', 'drum cleaned before batch', 'sample roast, "cupping only"', 'fan speed, raised'], [1, 1, 1, 1]) : '',
  ]);
}

// Planted problems, each a kind that a delivery check should surface.
rows[57][5] = 'twelve'; // a word in a numeric column
rows[112][8] = '2015.0'; // an extreme reading: a slipped decimal point
rows[640][8] = '1.99'; // another slipped reading, far below
rows[203][10] = 'NA'; // missing tokens of several spellings in one column
rows[204][10] = 'n/a';
rows[205][10] = '';
rows[390][10] = '-';
rows[301][2] = 'Columbia'; // a category spelled two ways
rows[302][2] = 'colombia';
rows[455][2] = ' Kenya'; // surrounding whitespace
rows[509][3] = 'Washed'; // the same category in another case
rows[777][1] = '2025-02-30'; // a date that does not exist
rows[830][0] = rows[829][0]; // a duplicate id
rows.splice(1001, 0, [...rows[1000]]); // an exact duplicate record
rows[919].push('extra'); // a ragged row: one field too many
rows[1100][6] = ''; // plain empty cells
rows[1101][6] = '';

const quote = (v) => (/[",\r\n]/.test(v) ? `"${v.replaceAll('"', '""')}"` : v);
const text = [header, ...rows].map((r) => r.map(quote).join(',')).join('\n') + '\n';
const out = fileURLToPath(new URL('./roastery-batches.csv', import.meta.url));
writeFileSync(out, text);
console.log(`wrote ${out}: ${rows.length} records`);
