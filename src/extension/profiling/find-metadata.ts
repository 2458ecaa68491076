// Finds the CSV on the Web metadata that applies to a data file, the way the W3C "Model for Tabular
// Data" §5 locates it without HTTP: `FILE-metadata.json` beside the file, then `csv-metadata.json` in
// its folder; or the file the `assay.metadata.path` setting names. Read through workspace.fs, so it
// works in the web host and for virtual file systems. Missing files are simply not there; a file
// that exists but cannot be read is reported through the metadata's own notices by the engine.
import * as vscode from 'vscode';

export interface FoundMetadata {
  text: string;
  location: string;
}

const MAX_METADATA_BYTES = 4 * 1024 * 1024;

/** The candidate locations, most specific first (pure; exported for tests). */
export function metadataCandidates(data: vscode.Uri, setting: string): vscode.Uri[] {
  if (setting !== '') {
    if (/^[a-z][a-z0-9+.-]*:/i.test(setting) && !/^[a-z]:[\\/]/i.test(setting)) return [vscode.Uri.parse(setting)];
    if (setting.startsWith('/') || /^[a-z]:[\\/]/i.test(setting)) return [vscode.Uri.file(setting)];
    const folder = vscode.workspace.getWorkspaceFolder(data)?.uri ?? vscode.Uri.joinPath(data, '..');
    return [vscode.Uri.joinPath(folder, setting)];
  }
  return [data.with({ path: `${data.path}-metadata.json` }), vscode.Uri.joinPath(data, '..', 'csv-metadata.json')];
}

export async function findMetadata(data: vscode.Uri, setting: string): Promise<FoundMetadata | null> {
  for (const candidate of metadataCandidates(data, setting)) {
    try {
      const stat = await vscode.workspace.fs.stat(candidate);
      if (stat.type !== vscode.FileType.File) continue;
      if (stat.size > MAX_METADATA_BYTES) {
        return { text: '', location: `${vscode.workspace.asRelativePath(candidate)} (larger than 4 MiB, not read)` };
      }
      const bytes = await vscode.workspace.fs.readFile(candidate);
      return { text: new TextDecoder().decode(bytes), location: vscode.workspace.asRelativePath(candidate) };
    } catch {
      // Not there: try the next place.
    }
  }
  return null;
}
