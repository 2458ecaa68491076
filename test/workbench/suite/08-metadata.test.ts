// Declared constraints in the real workbench: a CSV on the Web metadata file placed where the W3C
// "Model for Tabular Data" §5 looks for it (FILE-metadata.json) is found and applied. Fixture: the
// W3C validation test test210 ("date value constraint not matching minimum", a negative test), see
// ../fixtures/SOURCES.md: 2015-06-04 in column "minimum" breaks `minimum: 2015-06-05`.
import * as vscode from 'vscode';
import { equal, ok } from './expect';
import { closeAllEditors, exactProfile, openFixture, rangeOf, waitFor } from './helpers';

suite('declared constraints', () => {
  teardown(closeAllEditors);

  test('metadata beside the file is found: the W3C test210 violation is a problem on its cell', async () => {
    const editor = await openFixture('w3c-test210.csv');
    const { profile } = await exactProfile(editor.document);
    const minimum = profile.columns.find((c) => c.name === 'minimum');
    equal(minimum?.type, 'date', 'the declared datatype sets the type');
    equal(minimum?.levelSource, 'inferred', 'no level declared: inferred');
    const d = await waitFor('a constraint problem', () => vscode.languages.getDiagnostics(editor.document.uri)
      .find((x) => x.source === 'Assay' && x.code === 'constraint'));
    equal(rangeOf(d.range).join(','), '1,0,1,10', 'the cell 2015-06-04 on line 2');
    ok(/minimum|minInclusive/.test(d.message), `the message names the constraint: ${d.message}`);
  });
});
