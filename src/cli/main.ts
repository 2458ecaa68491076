// The `assay` command line: a thin shell that streams a file into the core and prints the profile.
// Exit codes: 0 done; 1 a --fail-on condition was met; 2 unreadable input or bad options.
import { closeSync, createReadStream, existsSync, openSync, readFileSync, readSync, statSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { createProfileJob, type JobSource, type ProfileResult } from '../core/engine';
import { failOnReasons, type FailOn } from '../core/fail-on';
import { renderReport } from '../core/markdown';
import { OptionError, parseBinChoice, resolveOptions, ALL_RULES, type ProfileOptions, type ProfileOptionsInput, type RuleId } from '../core/options';
import type { Profile } from '../core/profile/types';
import { renderText } from '../core/text/render-text';
import { defaultWorkers, profileFileInWorkers, runWorkerIfAsked } from '../worker/parallel-ranges';
import { parseArgs, USAGE } from './parse-args';

const CHUNK = 1 << 20; // 1 MiB reads: the default 64 KiB stream chunk is 2-3x slower to scan
/** As the extension's assay.memoryLimitMB. */
const DEFAULT_MEMORY_LIMIT_MB = 8192;

/** MB from the command line -> the core's ceiling in bytes (0: none). */
function memoryLimitBytes(mb: number): number | null {
  return mb === 0 ? null : mb * 1024 * 1024;
}

async function main(argv: string[]): Promise<number> {
  let args;
  try {
    args = parseArgs(argv);
  } catch (e) {
    return fail(e instanceof Error ? e.message : String(e));
  }
  if (args.help) {
    process.stdout.write(USAGE);
    return 0;
  }
  if (args.version) {
    process.stdout.write('assay 0.1.0\n');
    return 0;
  }
  const file = args.file;
  if (!file) return fail('no input file given (try --help)');
  let size: number;
  try {
    const st = statSync(file);
    if (st.isDirectory()) return fail(`${file}: is a folder, not a file`);
    size = st.size;
  } catch (e) {
    return fail(`${file}: ${(e as NodeJS.ErrnoException).code === 'ENOENT' ? 'no such file' : (e as Error).message}`);
  }

  let input: ProfileOptionsInput;
  let metadata: { text: string; location: string } | undefined;
  try {
    input = {
      delimiter: args.delimiter === 'tab' || args.delimiter === '\\t' ? '\t' : args.delimiter,
      quote: args.quote,
      header: args.header,
      decimalSeparator: args.decimal,
      encoding: args.encoding as ProfileOptionsInput['encoding'],
      edges: args.edges as ProfileOptionsInput['edges'],
      quantileType: args.quantileType,
      topN: args.top,
      groupBy: args.groupBy,
      missingTokens: args.missing,
      maxRecords: args.maxRecords,
      memoryLimitBytes: memoryLimitBytes(args.memoryLimit ?? DEFAULT_MEMORY_LIMIT_MB),
      exactValuesLimit: args.exactLimit,
      countByValue: !args.countByText,
      // The CLI prints the profile and asks nothing of it afterwards.
      retainValues: false,
    };
    if (args.bins !== undefined) input.bins = parseBinChoice(args.bins);
    input.rules = {
      ...args.thresholds,
      ...(args.rules !== undefined ? { enabled: parseRules(args.rules) } : {}),
      ...(args.maxFlags !== undefined ? { maxFlagsPerRule: args.maxFlags } : {}),
    };
    input.levels = args.levels as ProfileOptionsInput['levels'];
    input.types = args.types as ProfileOptionsInput['types'];
    if (args.encoding !== undefined && !['utf-8', 'utf-16le', 'utf-16be', 'windows-1252'].includes(args.encoding)) {
      throw new OptionError(`--encoding: expected utf-8, utf-16le, utf-16be or windows-1252, got "${args.encoding}"`);
    }
    metadata = findMetadata(file, args.metadata, args.noMetadata);
  } catch (e) {
    return fail(e instanceof Error ? e.message : String(e));
  }
  let options;
  try {
    options = resolveOptions(input);
  } catch (e) {
    return fail(e instanceof Error ? e.message : String(e));
  }

  const source = { name: basename(file), size, metadata };
  const progress = process.stderr.isTTY && !args.quiet ? new Progress(size) : null;
  let result: ProfileResult | null = null;
  const workers = args.workers ?? defaultWorkers(size);
  if (workers > 1) {
    try {
      const r = await profileFileInWorkers(file, size, options, source, workers, { onProgress: (bytes) => progress?.update(bytes) });
      if ('fallback' in r) {
        if (args.workers !== undefined && !args.quiet) process.stderr.write(`assay: reading in one thread (${r.fallback})\n`);
      } else result = r;
    } catch (e) {
      progress?.done();
      return fail(`${file}: cannot be read (${(e as Error).message})`);
    }
  }
  try {
    if (result === null) {
      const r = await profileStreaming(file, size, options, source, progress);
      if (typeof r === 'string') return fail(r);
      result = r;
    }
    progress?.done();
    const { profile } = result;
    // Content that is not delimited text is unreadable input: one line on stderr, status 2.
    const refused = profile.notices.find((n) => n.code === 'not-delimited-text');
    if (refused) return fail(`${file}: ${refused.message}`);
    write(profile, args.format, file, args.significantDigits);
    // Stopped at the memory ceiling: the profile printed covers part of the file, so a pipeline must not pass it.
    const stopped = profile.notices.find((n) => n.code === 'memory-limit');
    if (stopped) return fail(`${file}: ${stopped.message}`);
    if (args.failOn.length > 0) {
      const reasons = failOnReasons(profile, args.failOn as FailOn[]);
      if (reasons.length > 0) {
        process.stderr.write(`assay: ${reasons.join('; ')}\n`);
        return 1;
      }
    }
    return 0;
  } catch (e) {
    return fail(`${file}: ${(e as Error).message}`);
  }
}

/** Streams the file through one job in this thread; a one-line error message when it cannot be read. */
async function profileStreaming(file: string, size: number, options: ProfileOptions, source: JobSource, progress: Progress | null): Promise<ProfileResult | string> {
  const job = createProfileJob(options, source);
  try {
    const stream = createReadStream(file, { highWaterMark: CHUNK });
    for await (const chunk of stream) {
      job.push(chunk as Uint8Array);
      progress?.update(job.bytesRead);
      if (job.full) {
        stream.destroy();
        break;
      }
    }
  } catch (e) {
    progress?.done();
    return `${file}: cannot be read (${(e as Error).message})`;
  }
  progress?.done();
  const fd = openSync(file, 'r');
  try {
    return job.finish((offset, length) => {
      const buf = new Uint8Array(Math.max(0, Math.min(length, size - offset)));
      let got = 0;
      while (got < buf.length) {
        const n = readSync(fd, buf, got, buf.length - got, offset + got);
        if (n === 0) break;
        got += n;
      }
      return buf.subarray(0, got);
    });
  } finally {
    closeSync(fd);
  }
}

function write(profile: Profile, format: string, file: string, significantDigits: number | undefined): void {
  const digits = significantDigits ?? 4;
  if (format === 'json') process.stdout.write(JSON.stringify(profile, null, 2) + '\n');
  else if (format === 'markdown') process.stdout.write(renderReport(profile, { significantDigits: digits, fileLabel: basename(file) }));
  else process.stdout.write(renderText(profile, { fileLabel: file, significantDigits: digits }));
}

function parseRules(list: string): RuleId[] {
  const ids = list.split(',').map((s) => s.trim()).filter(Boolean);
  if (ids.length === 1 && ids[0] === 'all') return [...ALL_RULES];
  for (const id of ids) {
    if (!(ALL_RULES as readonly string[]).includes(id)) throw new OptionError(`--rules: unknown rule "${id}"; known: ${ALL_RULES.join(', ')}, or all`);
  }
  return ids as RuleId[];
}

/**
 * Finds a CSV on the Web metadata document the way the W3C "Model for Tabular Data" §5 locates one
 * without HTTP: `<file>-metadata.json` beside the file, then `csv-metadata.json` in its folder.
 */
function findMetadata(file: string, given: string | undefined, disabled: boolean): { text: string; location: string } | undefined {
  if (given !== undefined) {
    try {
      return { text: readFileSync(given, 'utf8'), location: given };
    } catch (e) {
      throw new OptionError(`--metadata: ${given} cannot be read (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})`);
    }
  }
  if (disabled) return undefined;
  for (const candidate of [`${file}-metadata.json`, join(dirname(file), 'csv-metadata.json')]) {
    if (existsSync(candidate)) return { text: readFileSync(candidate, 'utf8'), location: candidate };
  }
  return undefined;
}

class Progress {
  private last = 0;
  constructor(private readonly size: number) {}
  update(bytes: number): void {
    const now = Date.now();
    if (now - this.last < 200) return;
    this.last = now;
    const pct = this.size > 0 ? Math.floor((100 * bytes) / this.size) : 0;
    process.stderr.write(`\rassay: reading ${pct}% (${(bytes / 1048576).toFixed(0)} MiB)`);
  }
  done(): void {
    if (this.last > 0) process.stderr.write('\r\x1b[K');
  }
}

function fail(message: string): number {
  process.stderr.write(`assay: ${message}\n`);
  return 2;
}

// The same bundle runs the range workers (see worker/parallel-ranges.ts); only the main thread reads the command line.
if (!runWorkerIfAsked()) main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (e: unknown) => {
    process.stderr.write(`assay: unexpected failure: ${e instanceof Error ? e.stack ?? e.message : String(e)}\n`);
    process.exitCode = 2;
  },
);
