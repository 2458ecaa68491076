// Which files Assay profiles: by language id (ours, or the same ids from another extension) or, for
// files VS Code does not hand to extensions as documents, by file name.
export const DATA_LANGUAGES: readonly string[] = ['csv', 'tsv', 'psv', 'ssv'];

const DATA_EXTENSIONS: readonly string[] = ['.csv', '.tsv', '.tab', '.psv', '.ssv'];

export function isDataLanguage(languageId: string): boolean {
  return DATA_LANGUAGES.includes(languageId);
}

/** By the path's extension, case-insensitive (`/x/Batches.CSV` is data). */
export function isDataPath(path: string): boolean {
  const name = path.slice(path.lastIndexOf('/') + 1).toLowerCase();
  const dot = name.lastIndexOf('.');
  return dot > 0 && DATA_EXTENSIONS.includes(name.slice(dot));
}

/** The last path segment, for labels. */
export function baseName(path: string): string {
  return path.slice(path.lastIndexOf('/') + 1) || path;
}
