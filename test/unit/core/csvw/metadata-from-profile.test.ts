import { describe, expect, it } from 'vitest';
import { metadataFromProfile } from '../../../../src/core/csvw/metadata-from-profile';
import { parseMetadata } from '../../../../src/core/csvw/parse-metadata';
import { profileText } from '../../../../src/core/engine';
import { resolveOptions } from '../../../../src/core/options';

// The written document must be valid under our reading of the W3C "Metadata Vocabulary for Tabular
// Data" (the same parser the W3C validation cases pass), and the file it was written from must
// satisfy it: a starting point may not reject its own data.
describe('metadataFromProfile', () => {
  const text = 'id,level,kg,day,ok\n1,low,2.5,2025-01-02,true\n2,high,NA,2025-01-03,false\n3,mid,3.25,2025-01-04,true\n';
  const { profile } = profileText(text, resolveOptions());
  for (const bounds of [false, true]) {
    it(`is valid metadata that the file satisfies (bounds ${bounds})`, () => {
      const doc = metadataFromProfile(profile, { url: 'data.csv', bounds });
      const parsed = parseMetadata(doc, 'data.csv-metadata.json');
      expect(parsed.errors.filter((e) => e.severity === 'error')).toEqual([]);
      const again = profileText(text, resolveOptions(), { name: 'data.csv', metadata: { text: doc, location: 'data.csv-metadata.json' } }).profile;
      expect(again.notices.filter((n) => n.code === 'metadata')).toEqual([]);
      expect(again.columns.flatMap((c) => c.flags).filter((f) => f.rule === 'constraint')).toEqual([]);
      expect(again.columns.map((c) => c.levelSource)).toEqual(['declared', 'declared', 'declared', 'declared', 'declared']);
      expect(again.columns.find((c) => c.name === 'level')?.order).toEqual(['low', 'mid', 'high']);
    });
  }
  it('declares the missing tokens the file uses', () => {
    const doc = JSON.parse(metadataFromProfile(profile, { url: 'data.csv' })) as { tableSchema: { null?: string[] } };
    expect(doc.tableSchema.null).toEqual(['', 'NA']);
  });
  it('is violated by a value outside the observed bounds', () => {
    const doc = metadataFromProfile(profile, { url: 'data.csv', bounds: true });
    const worse = text + '4,low,9.5,2025-01-05,true\n';
    const p = profileText(worse, resolveOptions(), { name: 'data.csv', metadata: { text: doc, location: 'm.json' } }).profile;
    expect(p.columns.find((c) => c.name === 'kg')?.flags.filter((f) => f.rule === 'constraint').map((f) => f.row)).toEqual([4]);
  });
});
