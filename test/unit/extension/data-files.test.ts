// Which files are data files.
import { describe, expect, it } from 'vitest';
import { baseName, isDataLanguage, isDataPath } from '../../../src/extension/data-files';

describe('data files', () => {
  it('knows the data languages', () => {
    expect(['csv', 'tsv', 'psv', 'ssv'].every(isDataLanguage)).toBe(true);
    expect(isDataLanguage('plaintext')).toBe(false);
  });

  it('recognises data file names case-insensitively, not other names', () => {
    expect(['/a/b.csv', '/a/B.CSV', '/x.tsv', '/x.tab', '/x.psv', '/x.ssv'].every(isDataPath)).toBe(true);
    expect(['/a/b.txt', '/a/.csv', '/a/csv', '/a.csv/b'].some(isDataPath)).toBe(false);
  });

  it('takes the last path segment', () => {
    expect(baseName('/a/b/c.csv')).toBe('c.csv');
    expect(baseName('c.csv')).toBe('c.csv');
  });
});
