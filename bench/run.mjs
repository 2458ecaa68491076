// The scale benchmark (issue 7): generates the seeded benchmark file, then measures in one run
//   - raw read throughput (1 MiB chunks, counting line breaks): the ceiling for any reader,
//   - the CLI's full profile (`dist/cli.js FILE --format json`): wall time, MB/s, peak RSS, for
//     1 and 2 workers, and whether the two profiles agree,
//   - the editor's own profiling worker (dist/worker.js, its message protocol) on the same file,
//     in one pass and in parallel ranges: its first view, its exact profile (which must equal the
//     CLI's), and this thread's event-loop delay meanwhile (what the extension host feels),
//   - one more run whose columns pass --exact-limit (rank sketches: bounded memory per column),
//   - a baseline run with --count-by-text (every number looked up by its text as it is read, as
//     before numbers were counted by value), as a ratio; its profile must be the same under the cap,
//   - the same kind of summary through @duckdb/node-api when it is installed (optional), as a ratio.
// Figures go to stdout as a table and to bench-output/ as JSON.
//
// Usage: node bench/run.mjs [--size 1GB|500MB|5MB] [--seed N] [--quick] [--workers 1,2] [--no-duckdb]
//        [--sketch-limit N | --no-sketch]
// `--quick` (a 2 MB file, seconds) proves the script works; CI runs it inside `npm test`.
// Build first (`node esbuild.mjs`; `npm run bench` does both).
import { spawn } from 'node:child_process';
import { createReadStream, existsSync, mkdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { availableParallelism, cpus, freemem, loadavg, totalmem } from 'node:os';
import { basename, dirname, join, resolve } from 'node:path';
import { monitorEventLoopDelay, performance } from 'node:perf_hooks';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { Worker } from 'node:worker_threads';
import * as esbuild from 'esbuild';
import { generateFile, GENERATOR_VERSION } from './generate-file.mjs';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const outDir = join(root, 'bench-output');
const cli = join(root, 'dist', 'cli.js');
const MB = 1e6;
/** The extension's default first pass (assay.firstPass.records). */
const FIRST_PASS_RECORDS = 10_000;

function parseSize(text) {
  const m = /^(\d+(?:\.\d+)?)\s*(B|KB|MB|GB|KiB|MiB|GiB)?$/i.exec(text.trim());
  if (!m) throw new Error(`--size: expected a size such as 1GB, 500MB or 5MB, got "${text}"`);
  const unit = (m[2] ?? 'B').toLowerCase();
  const factor = { b: 1, kb: 1e3, mb: 1e6, gb: 1e9, kib: 1024, mib: 1024 ** 2, gib: 1024 ** 3 }[unit];
  return Math.round(Number(m[1]) * factor);
}

function parseArgs(argv) {
  const a = { size: 1e9, seed: 20240611, quick: false, workers: [1, 2], duckdb: true, sketchLimit: undefined };
  for (let i = 0; i < argv.length; i++) {
    const w = argv[i];
    const value = () => {
      const v = argv[++i];
      if (v === undefined) throw new Error(`${w}: expects a value`);
      return v;
    };
    if (w === '--size') a.size = parseSize(value());
    else if (w === '--seed') a.seed = Number(value());
    else if (w === '--quick') a.quick = true;
    else if (w === '--workers') a.workers = value().split(',').map(Number);
    else if (w === '--no-duckdb') a.duckdb = false;
    else if (w === '--sketch-limit') a.sketchLimit = Number(value());
    else if (w === '--no-sketch') a.sketchLimit = 0;
    else throw new Error(`${w}: unknown option (options: --size, --seed, --quick, --workers, --no-duckdb, --sketch-limit N, --no-sketch)`);
  }
  if (a.quick) a.size = 2e6;
  // One more run whose columns pass --exact-limit (rank sketches, bounded memory per column):
  // a million values per column on the full run, ten thousand on the quick one (to keep the path working).
  a.sketchLimit ??= a.quick ? 10_000 : 1_000_000;
  return a;
}

function label(bytes) {
  return bytes >= 1e9 ? `${+(bytes / 1e9).toFixed(2)}GB` : `${+(bytes / 1e6).toFixed(2)}MB`;
}

/** The machine, and how much of it this run can use (other work on it slows parallel runs). */
async function machine() {
  const spin = `const { parentPort } = require('node:worker_threads'); let x = 0; const t = Date.now(); while (Date.now() - t < 400) for (let i = 0; i < 1e5; i++) x += i & 3; parentPort.postMessage(x);`;
  const run = async (n) => {
    const t0 = performance.now();
    // Each worker spins for 400 ms of wall time; how many spin rounds they complete tells the capacity.
    const counts = await Promise.all(Array.from({ length: n }, () => new Promise((res, rej) => {
      const w = new Worker(spin, { eval: true });
      w.once('message', res);
      w.once('error', rej);
    })));
    void t0;
    return counts.reduce((x, y) => x + y, 0);
  };
  const one = await run(1);
  const two = await run(2);
  return {
    cpu: cpus()[0]?.model ?? 'unknown',
    cores: availableParallelism(),
    memoryGiB: +(totalmem() / 2 ** 30).toFixed(1),
    freeGiB: +(freemem() / 2 ** 30).toFixed(1),
    node: process.version,
    platform: `${process.platform} ${process.arch}`,
    loadAverage: loadavg().map((x) => +x.toFixed(2)),
    // 2.0 on an idle 2-core machine; near 1.0 when other work holds the other core.
    effectiveParallelism: +(two / one).toFixed(2),
  };
}

function ensureFile(size, seed) {
  mkdirSync(outDir, { recursive: true });
  const path = join(outDir, `bench-${label(size)}-seed${seed}-v${GENERATOR_VERSION}.csv`);
  if (existsSync(path) && statSync(path).size >= size && statSync(path).size < size + 4096) return { path, generatedMs: 0 };
  const t0 = performance.now();
  generateFile(path, size, seed);
  return { path, generatedMs: Math.round(performance.now() - t0) };
}

async function rawRead(path) {
  const t0 = performance.now();
  let lines = 0;
  let bytes = 0;
  for await (const chunk of createReadStream(path, { highWaterMark: 1 << 20 })) {
    bytes += chunk.length;
    for (let i = chunk.indexOf(10); i >= 0; i = chunk.indexOf(10, i + 1)) lines++;
  }
  const s = (performance.now() - t0) / 1000;
  return { seconds: +s.toFixed(3), mbPerSecond: +(bytes / MB / s).toFixed(1), lineBreaks: lines };
}

function runCli(path, workers, size, extra = [], tag = `w${workers}`) {
  const rssFile = join(outDir, `.rss-${process.pid}-${tag}`);
  const outFile = join(outDir, `profile-${label(size)}-${tag}.json`);
  return new Promise((resolvePromise, reject) => {
    const t0 = performance.now();
    const child = spawn(process.execPath, ['--import', pathToFileURL(join(root, 'bench', 'peak-rss.mjs')).href, cli, path, '--format', 'json', '-q', '--workers', String(workers), ...extra], {
      env: { ...process.env, ASSAY_BENCH_RSS: rssFile },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    const out = [];
    let err = '';
    child.stdout.on('data', (d) => out.push(d));
    child.stderr.on('data', (d) => (err += d));
    child.on('error', reject);
    child.on('close', (code) => {
      const s = (performance.now() - t0) / 1000;
      if (code !== 0) return reject(new Error(`assay --workers ${workers} exited ${code}: ${err.trim()}`));
      const json = Buffer.concat(out).toString('utf8');
      writeFileSync(outFile, json);
      const rssKb = existsSync(rssFile) ? Number(readFileSync(rssFile, 'utf8')) : NaN;
      rmSync(rssFile, { force: true });
      resolvePromise({
        workers, seconds: +s.toFixed(3), mbPerSecond: +(size / MB / s).toFixed(1), peakRssMB: Math.round((rssKb * 1024) / MB),
        note: err.trim() || undefined, profile: JSON.parse(json),
      });
    });
  });
}

/** Which columns' members differ between two profiles (an empty list: identical). */
function differences(a, b) {
  const out = [];
  for (const k of Object.keys(a)) if (k !== 'columns' && JSON.stringify(a[k]) !== JSON.stringify(b[k])) out.push(k);
  a.columns.forEach((c, i) => {
    const d = b.columns[i] ?? {};
    for (const k of Object.keys(c)) if (JSON.stringify(c[k]) !== JSON.stringify(d[k])) out.push(`${c.name}.${k}${c.distinctExact === false ? ' (beyond the distinct cap)' : ''}`);
  });
  return out;
}

/**
 * The editor's own profiling worker (dist/worker.js) driven through its message protocol, as the
 * extension host drives it: the first view (its first pass) and the exact profile read in
 * `workers` parallel ranges, while this thread (the stand-in for the extension host) measures its
 * event-loop delay.
 */
async function editorWorker(path, size, workers) {
  // The options as the host sends them, made by the engine's own code (bundled from src/ here).
  const built = await esbuild.build({
    stdin: { contents: "export { resolveOptions } from './src/core/options'; export { toWireOptions } from './src/protocol/worker';", resolveDir: root, loader: 'ts' },
    bundle: true, format: 'esm', platform: 'neutral', write: false, logLevel: 'silent',
  });
  const { resolveOptions, toWireOptions } = await import(`data:text/javascript;base64,${Buffer.from(built.outputFiles[0].text).toString('base64')}`);
  // The histogram records the time between its 10 ms timer's runs: the delay is that minus 10 ms.
  const RES = 10;
  const h = monitorEventLoopDelay({ resolution: RES });
  let maxGap = 0;
  let last = performance.now();
  // This process holds the worker and its range threads: its RSS, sampled with the timer, is theirs plus the bench's.
  let peakRss = process.memoryUsage.rss();
  const tick = setInterval(() => {
    const now = performance.now();
    maxGap = Math.max(maxGap, now - last - 10);
    last = now;
    peakRss = Math.max(peakRss, process.memoryUsage.rss());
  }, 10);
  const t0 = performance.now();
  h.enable();
  let firstView = null;
  const reply = await new Promise((res, rej) => {
    const w = new Worker(join(root, 'dist', 'worker.js'));
    w.on('message', (m) => {
      if (m.type === 'profiled' && !m.final) firstView = { seconds: +((performance.now() - t0) / 1000).toFixed(3), rows: m.profile.rows };
      if ((m.type === 'profiled' && m.final) || m.type === 'failed') {
        res(m);
        void w.terminate();
      }
    });
    w.once('error', rej);
    w.postMessage({
      type: 'profile', id: 1, uri: pathToFileURL(path).href, version: 1, name: basename(path), size, options: toWireOptions(resolveOptions({})),
      input: { kind: 'path', path }, firstPass: FIRST_PASS_RECORDS, chunkBytes: 1 << 20, rangeWorkers: workers,
    });
  });
  h.disable();
  clearInterval(tick);
  if (reply.type !== 'profiled') throw new Error(`editor worker: ${reply.message}`);
  const delay = (ns) => +Math.max(0, ns / 1e6 - RES).toFixed(1);
  const seconds = (performance.now() - t0) / 1000;
  return {
    workers, ranges: reply.ranges, seconds: +seconds.toFixed(3), mbPerSecond: +(size / MB / seconds).toFixed(1), rows: reply.profile.rows, firstView,
    peakRssMB: Math.round(peakRss / MB),
    maxMs: delay(h.max), p99Ms: delay(h.percentile(99)), meanMs: delay(h.mean), maxTimerLagMs: +maxGap.toFixed(1),
    histogramNs: { min: h.min, max: h.max, mean: Math.round(h.mean), p50: h.percentile(50), p99: h.percentile(99), resolutionMs: RES },
    profile: reply.profile,
  };
}

async function duckdb(path, size, threads) {
  let api;
  try {
    api = await import('@duckdb/node-api');
  } catch {
    return { skipped: '@duckdb/node-api not installed' };
  }
  const instance = await api.DuckDBInstance.create(':memory:', { threads: String(threads) });
  const connection = await instance.connect();
  const t0 = performance.now();
  const reader = await connection.runAndReadAll(`SUMMARIZE SELECT * FROM read_csv('${path.replaceAll("'", "''")}')`);
  const s = (performance.now() - t0) / 1000;
  return { threads, seconds: +s.toFixed(3), mbPerSecond: +(size / MB / s).toFixed(1), columns: reader.getRows().length };
}

function table(rows) {
  const widths = rows[0].map((_, i) => Math.max(...rows.map((r) => String(r[i]).length)));
  return rows.map((r) => r.map((c, i) => String(c).padEnd(widths[i])).join('  ')).join('\n');
}

async function main() {
  const args = parseArgs(process.argv.slice(2));
  if (!existsSync(cli)) throw new Error(`${cli} is missing: build first (node esbuild.mjs, or npm run bench)`);
  const m = await machine();
  const file = ensureFile(args.size, args.seed);
  const size = statSync(file.path).size;
  console.log(`assay benchmark: ${file.path} (${label(size)}${file.generatedMs ? `, generated in ${(file.generatedMs / 1000).toFixed(1)} s` : ', cached'})`);
  console.log(`machine: ${m.cpu}, ${m.cores} cores, ${m.memoryGiB} GiB, Node ${m.node}; load ${m.loadAverage.join(' ')}; effective parallelism ${m.effectiveParallelism}`);

  const raw = await rawRead(file.path);
  // What the editor shows first on a large file: a profile of the first 10 000 records
  // (assay.firstPass.records), marked partial, from a fresh process (start-up included).
  const first = await runCli(file.path, 1, size, ['--max-records', String(FIRST_PASS_RECORDS)], 'first');
  const runs = [];
  for (const w of args.workers) {
    // A pause between large runs: right after a run that held gigabytes, the next one measured up to
    // a third slower on this kind of virtual machine (the memory being handed back), whatever its order.
    if (runs.length > 0 && !args.quick) await new Promise((r) => setTimeout(r, 15_000));
    runs.push(await runCli(file.path, w, size));
  }
  const agree = runs.length > 1 ? differences(runs[0].profile, runs[runs.length - 1].profile) : [];
  let sketched = null;
  if (args.sketchLimit > 0) {
    if (!args.quick) await new Promise((r) => setTimeout(r, 15_000));
    const w = Math.max(...args.workers);
    sketched = await runCli(file.path, w, size, ['--exact-limit', String(args.sketchLimit)], `w${w}-sketch`);
    const exact = runs[runs.length - 1].profile;
    // What must not move: counts, means and extremes are exact either way; the sketch states its bound.
    for (const [i, c] of sketched.profile.columns.entries()) {
      const e = exact.columns[i];
      if (c.count !== e.count || JSON.stringify(c.stats?.min) !== JSON.stringify(e.stats?.min) || JSON.stringify(c.stats?.max) !== JSON.stringify(e.stats?.max)) {
        throw new Error(`the sketched run's ${c.name} differs from the exact one in count, min or max`);
      }
    }
    const bounds = sketched.profile.columns.filter((c) => c.approximate).map((c) => c.approximate.relativeRankError);
    sketched.sketchedColumns = bounds.length;
    sketched.maxRelativeRankError = bounds.length ? Math.max(...bounds) : 0;
  }
  // The baseline: the same profile with every cell counted by its text as it arrives.
  if (!args.quick) await new Promise((r) => setTimeout(r, 15_000));
  const wMax = Math.max(...args.workers);
  const byText = await runCli(file.path, wMax, size, ['--count-by-text'], `w${wMax}-by-text`);
  const sameRun = runs.find((r) => r.workers === wMax);
  // Past the distinct cap counting by text estimates where counting by value is exact: only there may they differ.
  const byTextDiffers = differences(byText.profile, sameRun.profile).filter((d) => !d.endsWith('(beyond the distinct cap)'));
  // The editor's worker in one pass (its baseline), then in parallel ranges.
  const editorOne = await editorWorker(file.path, size, 1);
  const loop = await editorWorker(file.path, size, wMax);
  // The editor reads the same file with the same options: its profile is the CLI's (the source named alike).
  const editorDiffers = [...new Set([
    ...differences({ ...loop.profile, source: sameRun.profile.source }, sameRun.profile),
    ...differences({ ...editorOne.profile, source: runs[0].profile.source }, runs[0].profile),
  ])];
  const duck = args.duckdb ? await duckdb(file.path, size, Math.max(...args.workers)) : { skipped: 'not asked (--no-duckdb)' };
  const best = runs.reduce((a, b) => (b.mbPerSecond > a.mbPerSecond ? b : a));

  const rows = [['measure', 'seconds', 'MB/s', 'peak RSS MB', 'note']];
  rows.push(['raw read (1 MiB chunks, count LF)', raw.seconds, raw.mbPerSecond, '', `${raw.lineBreaks} line breaks`]);
  rows.push([`first view (first ${FIRST_PASS_RECORDS} records)`, first.seconds, '', first.peakRssMB, `${first.profile.rows} rows, partial: ${first.profile.partial}`]);
  for (const r of runs) rows.push([`assay full profile, ${r.workers} worker${r.workers > 1 ? 's' : ''}`, r.seconds, r.mbPerSecond, r.peakRssMB, `${r.profile.rows} rows${r.note ? `; ${r.note}` : ''}`]);
  if (sketched) rows.push([`assay, ${sketched.workers} workers, --exact-limit ${args.sketchLimit}`, sketched.seconds, sketched.mbPerSecond, sketched.peakRssMB, `${sketched.sketchedColumns} columns sketched, rank error at most ${(100 * sketched.maxRelativeRankError).toPrecision(2)}% of n`]);
  rows.push([`assay, ${byText.workers} workers, --count-by-text (baseline)`, byText.seconds, byText.mbPerSecond, byText.peakRssMB, `counting numbers by value: ${(byText.seconds / sameRun.seconds).toFixed(2)}x faster`]);
  if (runs.length > 1) {
    const sp = runs[0].seconds / runs[runs.length - 1].seconds;
    rows.push([`speed-up ${runs[0].workers} -> ${runs[runs.length - 1].workers} workers`, '', '', '', `${sp.toFixed(2)}x`]);
  }
  for (const e of [editorOne, loop]) {
    const vs = e === loop ? `; ${(editorOne.seconds / loop.seconds).toFixed(2)}x faster than one pass` : '';
    rows.push([`editor worker (dist/worker.js), ${e.ranges} range${e.ranges > 1 ? 's' : ''}`, e.seconds, e.mbPerSecond, e.peakRssMB, `first view ${e.firstView ? `${e.firstView.seconds} s (${e.firstView.rows} rows)` : 'none'}; host event-loop delay max ${e.maxMs} ms, p99 ${e.p99Ms} ms${vs}`]);
  }
  if ('skipped' in duck) rows.push(['@duckdb/node-api SUMMARIZE', '', '', '', `skipped: ${duck.skipped}`]);
  else rows.push([`@duckdb/node-api SUMMARIZE, ${duck.threads} threads`, duck.seconds, duck.mbPerSecond, '', `assay/duckdb throughput ${(best.mbPerSecond / duck.mbPerSecond).toFixed(2)}x`]);
  console.log('\n' + table(rows));
  console.log(agree.length === 0 ? '\nprofiles of 1 and 2 workers: identical' : `\nprofiles of ${runs[0].workers} and ${runs[runs.length - 1].workers} workers differ in: ${agree.join(', ')}`);

  const result = {
    date: new Date().toISOString(), file: { path: file.path, bytes: size, seed: args.seed, generator: GENERATOR_VERSION, rows: runs[0].profile.rows },
    machine: m, rawRead: raw,
    firstView: { seconds: first.seconds, peakRssMB: first.peakRssMB, rows: first.profile.rows, partial: first.profile.partial },
    profile: runs.map(({ profile, ...r }) => {
      void profile;
      return r;
    }),
    sketched: sketched && (({ profile, ...r }) => (void profile, { exactLimit: args.sketchLimit, ...r }))(sketched),
    byText: (({ profile, ...r }) => (void profile, { ...r, speedUp: +(byText.seconds / sameRun.seconds).toFixed(3), differences: byTextDiffers }))(byText),
    differences: agree,
    editor: { onePass: (({ profile, ...r }) => (void profile, r))(editorOne), ranges: (({ profile, ...r }) => (void profile, r))(loop), differences: editorDiffers },
    duckdb: duck,
  };
  const json = join(outDir, `bench-${args.quick ? 'quick' : label(size)}.json`);
  writeFileSync(json, JSON.stringify(result, null, 2) + '\n');
  console.log(`figures written to ${json}`);
  // The quick run (CI) has no column past its distinct cap, so 1 and 2 workers must agree exactly:
  // it proves the parallel path (ranges, merge, columns assembled in two threads) end to end.
  if (args.quick && agree.length > 0) {
    console.error(`bench: the 1- and 2-worker profiles differ in ${agree.join(', ')}`);
    process.exitCode = 1;
  }
  if (args.quick && editorDiffers.length > 0) {
    console.error(`bench: the editor worker's profile differs from the CLI's in ${editorDiffers.join(', ')}`);
    process.exitCode = 1;
  }
  if (byTextDiffers.length > 0) {
    console.error(`bench: counting by text and by value differ under the distinct cap in ${byTextDiffers.join(', ')}`);
    process.exitCode = 1;
  }
}

main().catch((e) => {
  console.error(`bench: ${e instanceof Error ? e.message : String(e)}`);
  process.exitCode = 1;
});
