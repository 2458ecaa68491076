// Where a saved report goes by default: beside the data file, named after it, never the data file
// itself. Pure (paths as URI paths, '/'-separated).

/** `metadata` is a CSV on the Web metadata document written from the profile (a starting point). */
export type ReportFormat = 'markdown' | 'html' | 'metadata';

export const REPORT_EXTENSIONS: Record<ReportFormat, string> = { markdown: 'md', html: 'html', metadata: 'json' };

/**
 * The report's path beside the data file: the data file's name without its extension, plus
 * `-profile.md` (or `.html`). Example: reportPath('/data/batches.csv', 'markdown') === '/data/batches-profile.md'.
 */
export function reportPath(dataPath: string, format: ReportFormat): string {
  const slash = dataPath.lastIndexOf('/');
  const dir = dataPath.slice(0, slash + 1);
  const name = dataPath.slice(slash + 1);
  // Where the W3C "Model for Tabular Data" §5 looks for a file's metadata: FILE-metadata.json.
  if (format === 'metadata') return `${dir}${name || 'data'}-metadata.json`;
  const dot = name.lastIndexOf('.');
  const stem = dot > 0 ? name.slice(0, dot) : name || 'data';
  return `${dir}${stem}-profile.${REPORT_EXTENSIONS[format]}`;
}

/**
 * True when saving to `target` would overwrite the data file: the same path, compared without case
 * too (case-insensitive file systems are common) when both URIs have the same scheme and authority.
 */
export function isSameFile(a: { scheme: string; authority: string; path: string }, b: { scheme: string; authority: string; path: string }): boolean {
  if (a.scheme !== b.scheme || a.authority.toLowerCase() !== b.authority.toLowerCase()) return false;
  const norm = (p: string): string => p.replace(/\/+$/, '').toLowerCase();
  return norm(a.path) === norm(b.path);
}
