// Preloaded (node --import) into the profiled command by bench/run.mjs: writes the process's peak
// resident set size (kilobytes, worker threads included) to $ASSAY_BENCH_RSS when it exits.
import { writeFileSync } from 'node:fs';
import { isMainThread } from 'node:worker_threads';

if (isMainThread && process.env.ASSAY_BENCH_RSS) {
  const file = process.env.ASSAY_BENCH_RSS;
  process.on('exit', () => writeFileSync(file, String(process.resourceUsage().maxRSS)));
}
