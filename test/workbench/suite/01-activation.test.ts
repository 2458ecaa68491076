// The extension activates on a CSV file in the real workbench.
import * as vscode from 'vscode';
import { equal, ok } from './expect';
import { EXTENSION_ID, closeAllEditors, openFixture, waitFor } from './helpers';

suite('activation', () => {
  suiteSetup(closeAllEditors);

  test('opening a CSV activates the extension and its language is csv', async () => {
    const editor = await openFixture('anscombe.csv');
    equal(editor.document.languageId, 'csv', 'language id of a .csv file');
    const ext = vscode.extensions.getExtension(EXTENSION_ID);
    ok(ext, 'the extension is installed');
    await waitFor('activation', () => ext.isActive);
  });

  test('a .tsv and a .psv file get our language ids', async () => {
    equal((await openFixture('anscombe.tsv')).document.languageId, 'tsv', 'language id of a .tsv file');
    equal((await openFixture('anscombe.psv')).document.languageId, 'psv', 'language id of a .psv file');
  });

  if (__ASSAY_BREAK__) {
    test('deliberately broken (ASSAY_WORKBENCH_BREAK=1): this must fail the run', () => {
      equal(1 + 1, 3, 'a deliberately wrong sum');
    });
  }

  suiteTeardown(closeAllEditors);
});
