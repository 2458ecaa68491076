// TEMPORARY STUB (the lead is replacing it with the real assembly): lets the shells build now.
import type { JobSource, ProfileJob, ProfileResult } from '../engine';
import type { ProfileOptions } from '../options';

export function createProfileJob(options: ProfileOptions, source: JobSource = { name: null }): ProfileJob {
  let bytesRead = 0;
  return {
    push(chunk) { bytesRead += chunk.length; },
    get bytesRead() { return bytesRead; },
    get full() { return false; },
    finish(): ProfileResult {
      return {
        profile: {
          schema: 'assay-profile/1', source: source.name, rows: 0, delimiter: ',', quote: '"', header: true,
          decimalSeparator: '.', encoding: 'utf-8', bom: false, lineEnding: 'none', bytes: bytesRead, lines: 0,
          blankLines: 0, partial: false, ragged: [], raggedTotal: 0, duplicateRecords: 0, headerNotes: [], notices: [],
          columns: [], recordFlags: [], recordFlagTotals: [], groups: [],
          methods: { quantile: 'Hyndman & Fan type ' + options.quantileType, bins: options.bins.rule, edges: options.edges, missingTokens: [...options.missingTokens] },
        },
        index: { offsets: new Float64Array(0), lines: new Float64Array(0) },
      };
    },
  };
}

export function profileBytes(bytes: Uint8Array, options: ProfileOptions, source?: JobSource): ProfileResult {
  const job = createProfileJob(options, source);
  job.push(bytes);
  return job.finish((offset, length) => bytes.subarray(offset, offset + length));
}

export function profileText(text: string, options: ProfileOptions, source?: JobSource): ProfileResult {
  return profileBytes(new TextEncoder().encode(text), options, source);
}
