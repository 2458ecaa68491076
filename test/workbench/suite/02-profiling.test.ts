// Profiling in the worker: the open document (unsaved edits included) is profiled, re-profiled after
// an edit, stale results are dropped, and the status bar shows the counts. Expected counts are the
// fixtures' (see ../fixtures/SOURCES.md).
import * as vscode from 'vscode';
import { flagCount } from '../../../src/extension/status/status-text';
import { deepEqual, equal, ok } from './expect';
import { assayApi, closeAllEditors, fixtureUri, openFixture, setSetting, sleep, waitFor, writePiDigits } from './helpers';

async function finalProfile(uri: vscode.Uri, version: number) {
  const api = await assayApi();
  return waitFor(`the profile of ${uri.path} at version ${version}`, () => {
    const p = api.profileFor(uri.toString());
    return p !== undefined && p.version === version && !p.partial ? p : undefined;
  });
}

suite('profiling', () => {
  suiteSetup(closeAllEditors);
  teardown(async () => {
    await setSetting('largeFile.aboveBytes', undefined);
    await setSetting('firstPass.aboveBytes', undefined);
    await setSetting('firstPass.records', undefined);
  });
  suiteTeardown(closeAllEditors);

  test('the open CSV is profiled: records and column names are the file\'s (Anscombe 1973: 44 records)', async () => {
    const editor = await openFixture('anscombe.csv');
    const p = await finalProfile(editor.document.uri, editor.document.version);
    equal(p.profile.rows, 44, 'records');
    deepEqual(p.profile.columns.map((c) => c.name), ['dataset', 'x', 'y'], 'column names');
  });

  test('the status bar shows the active file\'s records and flags', async () => {
    const api = await assayApi();
    const editor = await openFixture('anscombe.csv');
    const p = await finalProfile(editor.document.uri, editor.document.version);
    const n = flagCount(p.profile);
    const expected = `$(graph) 44 records · ${n} ${n === 1 ? 'flag' : 'flags'}`;
    await waitFor(`status bar text "${expected}"`, () => api.statusBarText() === expected || undefined);
    await openFixture('notes.txt');
    await waitFor('the status bar item to hide on a text file', () => api.statusBarText() === undefined);
  });

  test('an unsaved edit is profiled after a short pause (one record added: 45)', async () => {
    const editor = await openFixture('edit-target.csv');
    const before = editor.document.version;
    const end = editor.document.lineAt(editor.document.lineCount - 1).range.end;
    const edit = new vscode.WorkspaceEdit();
    edit.insert(editor.document.uri, end, editor.document.getText().endsWith('\n') ? 'V,1.0,2.0\n' : '\nV,1.0,2.0');
    ok(await vscode.workspace.applyEdit(edit), 'the edit applies');
    ok(editor.document.version > before, 'the version moved');
    ok(editor.document.isDirty, 'the document has unsaved changes');
    const p = await finalProfile(editor.document.uri, editor.document.version);
    equal(p.profile.rows, 45, 'records after adding one');
  });

  test('rapid edits: only the latest version is kept, earlier jobs are dropped', async () => {
    const api = await assayApi();
    const editor = await openFixture('edit-target.csv');
    const uri = editor.document.uri.toString();
    const start = api.profileHistory(uri).length;
    for (let i = 0; i < 10; i++) {
      const edit = new vscode.WorkspaceEdit();
      edit.insert(editor.document.uri, new vscode.Position(1, 0), `V,${i}.0,${i}.5\n`);
      await vscode.workspace.applyEdit(edit);
      await sleep(20);
    }
    const version = editor.document.version;
    const p = await finalProfile(editor.document.uri, version);
    equal(p.profile.rows, 55, 'records after ten more');
    await sleep(800);
    const later = api.profileHistory(uri).slice(start);
    deepEqual(later.map((h) => h.version), [version], 'versions profiled after the burst (one job survives)');
  });

  test('a settings change re-profiles the open file with the new options (assay.bins: sturges)', async () => {
    const api = await assayApi();
    const editor = await openFixture('anscombe.csv');
    const uri = editor.document.uri.toString();
    await finalProfile(editor.document.uri, editor.document.version);
    await setSetting('bins', 'sturges');
    try {
      await waitFor('a profile binned by Sturges\' rule', () => api.profileFor(uri)?.profile.columns.find((c) => c.name === 'x')?.histogram?.rule === 'sturges' || undefined);
    } finally {
      await setSetting('bins', undefined);
    }
    await waitFor('a profile binned by the default rule again', () => api.profileFor(uri)?.profile.columns.find((c) => c.name === 'x')?.histogram?.rule === 'fd' || undefined);
  });

  test('a saved file above assay.largeFile.aboveBytes is read by the worker through workspace.fs', async () => {
    const api = await assayApi();
    await closeAllEditors();
    await setSetting('largeFile.aboveBytes', 10);
    const uri = fixtureUri('uranium.csv');
    const editor = await openFixture('uranium.csv');
    const p = await waitFor('the profile of uranium.csv read from disk', () => {
      const s = api.profileFor(uri.toString());
      return s !== undefined && !s.partial && s.via === 'disk' ? s : undefined;
    });
    equal(p.version, editor.document.version, 'the profile is of the document\'s version');
    equal(p.profile.rows, 8, 'records (Tietjen & Moore: 8 measurements)');
  });

  test('above assay.firstPass.aboveBytes a first pass comes before the exact profile (PiDigits ×8: 40000 records)', async () => {
    const api = await assayApi();
    await closeAllEditors();
    // Larger than the engine's 64 KiB sniffing head, so that the first pass can fill before the end.
    const big = await writePiDigits('pi-digits-x8.csv', 8);
    await setSetting('firstPass.aboveBytes', 0);
    await setSetting('firstPass.records', 1000);
    const doc = await vscode.workspace.openTextDocument(big);
    await vscode.window.showTextDocument(doc, { preview: false });
    await finalProfile(big, doc.version);
    const history = api.profileHistory(big.toString()).filter((h) => h.version === doc.version);
    deepEqual(history.map((h) => [h.partial, h.rows]), [[true, 1000], [false, 40_000]], 'first pass then exact: [partial, records]');
  });
});
