// Where a report is saved by default, and the guard against writing over the data file.
import { describe, expect, it } from 'vitest';
import { isSameFile, reportPath } from '../../../../src/extension/report/report-file-name';

const file = (path: string, scheme = 'file', authority = '') => ({ scheme, authority, path });

describe('reportPath', () => {
  it('runs the doc comment example and names the HTML report alike', () => {
    expect(reportPath('/data/batches.csv', 'markdown')).toBe('/data/batches-profile.md');
    expect(reportPath('/data/batches.csv', 'html')).toBe('/data/batches-profile.html');
  });

  it('keeps inner dots and handles names without an extension', () => {
    expect(reportPath('/d/run.2024.tsv', 'markdown')).toBe('/d/run.2024-profile.md');
    expect(reportPath('/d/data', 'markdown')).toBe('/d/data-profile.md');
    expect(reportPath('/d/.csv', 'markdown')).toBe('/d/.csv-profile.md');
  });
});

describe('isSameFile', () => {
  it('is true for the same path, also in another case', () => {
    expect(isSameFile(file('/d/a.csv'), file('/d/a.csv'))).toBe(true);
    expect(isSameFile(file('/d/A.CSV'), file('/d/a.csv'))).toBe(true);
  });

  it('is false for another path, scheme or authority', () => {
    expect(isSameFile(file('/d/a-profile.md'), file('/d/a.csv'))).toBe(false);
    expect(isSameFile(file('/d/a.csv', 'vscode-test-web', 'mount'), file('/d/a.csv'))).toBe(false);
    expect(isSameFile(file('/d/a.csv', 'file', 'host1'), file('/d/a.csv', 'file', 'host2'))).toBe(false);
  });
});
