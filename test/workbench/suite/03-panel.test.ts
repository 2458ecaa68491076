// The panel beside the data file, in the real workbench: it opens without taking focus, reports
// (through the `rendered` message its webview posts) the columns and counts it drew, follows the
// active data editor, keeps the last file for a non-data editor, and reveals cells in the editor.
import * as vscode from 'vscode';
import { flagCount } from '../../../src/extension/status/status-text';
import { deepEqual, equal, ok } from './expect';
import { assayApi, closeAllEditors, closePanel, fixtureUri, openFixture, panelTab, sleep, waitFor } from './helpers';

async function rendered(uri: vscode.Uri) {
  const api = await assayApi();
  return waitFor(`the panel to render ${uri.path}`, () => {
    const r = api.lastRendered();
    const p = api.profileFor(uri.toString());
    return r !== undefined && r.uri === uri.toString() && p !== undefined && !p.partial && r.version === p.version && !r.partial ? r : undefined;
  }, 20_000);
}

function selectionOf(editor: vscode.TextEditor | undefined): number[] {
  const s = editor?.selection;
  return s === undefined ? [] : [s.start.line, s.start.character, s.end.line, s.end.character];
}

suite('panel', () => {
  suiteSetup(closeAllEditors);
  suiteTeardown(closeAllEditors);

  test('the command opens the panel beside the CSV and leaves the focus in the editor', async () => {
    const api = await assayApi();
    const editor = await openFixture('anscombe.csv');
    await vscode.commands.executeCommand('assay.openPanel');
    await waitFor('the panel to show anscombe.csv', () => api.panelUri() === editor.document.uri.toString());
    const tab = await waitFor('the panel tab', () => panelTab());
    equal(tab.group.viewColumn, vscode.ViewColumn.Two, 'the panel\'s column (beside the editor)');
    equal(vscode.window.activeTextEditor?.document.uri.toString(), editor.document.uri.toString(), 'the active editor after opening the panel');
  });

  test('the panel reports the columns and counts it rendered (Anscombe 1973: 44 records, 3 columns)', async () => {
    const api = await assayApi();
    const uri = fixtureUri('anscombe.csv');
    const r = await rendered(uri);
    deepEqual(r.columns, ['dataset', 'x', 'y'], 'columns the panel rendered');
    equal(r.rows, 44, 'records the panel rendered');
    const p = api.profileFor(uri.toString());
    ok(p, 'a stored profile');
    equal(r.flags, flagCount(p.profile), 'flags the panel rendered = flags in the profile');
  });

  test('the panel follows a switch to another data editor (uranium: 8 records, column x)', async () => {
    const uri = fixtureUri('uranium.csv');
    await openFixture('uranium.csv');
    const r = await rendered(uri);
    deepEqual(r.columns, ['x'], 'columns');
    equal(r.rows, 8, 'records');
  });

  test('a non-data editor leaves the panel on the last data file', async () => {
    const api = await assayApi();
    await openFixture('notes.txt');
    await sleep(1000);
    equal(api.panelUri(), fixtureUri('uranium.csv').toString(), 'the file the panel shows');
    equal(api.lastRendered()?.uri, fixtureUri('uranium.csv').toString(), 'the file the panel last rendered');
  });

  test('hidden behind another editor and shown again, the panel renders the same file again', async () => {
    const api = await assayApi();
    const uri = fixtureUri('uranium.csv');
    await rendered(uri);
    const before = api.panelRenderCount();
    const tab = panelTab();
    ok(tab, 'the panel tab');
    const column = tab.group.viewColumn;
    const doc = await vscode.workspace.openTextDocument(fixtureUri('notes.txt'));
    await vscode.window.showTextDocument(doc, { viewColumn: column, preview: false });
    await waitFor('the panel to be hidden', () => panelTab()?.isActive === false);
    await vscode.commands.executeCommand('assay.openPanel');
    await waitFor('the panel to render again', () => api.panelRenderCount() > before);
    equal(api.lastRendered()?.uri, uri.toString(), 'the file rendered after showing the panel again');
    await vscode.window.tabGroups.close(vscode.window.tabGroups.all.flatMap((g) => g.tabs).filter((t) => t.input instanceof vscode.TabInputText && t.input.uri.path.endsWith('/notes.txt')));
  });

  test('a reveal from the panel selects the flagged cell 245.57 (record 8, line 9) and focuses the editor', async () => {
    const api = await assayApi();
    const uri = fixtureUri('uranium.csv');
    await openFixture('uranium.csv');
    await rendered(uri);
    await api.panelMessage({ type: 'reveal', uri: uri.toString(), row: 8, field: 0 });
    const editor = await waitFor('the editor with the revealed cell', () => {
      const e = vscode.window.activeTextEditor;
      return e?.document.uri.toString() === uri.toString() && !e.selection.isEmpty ? e : undefined;
    });
    deepEqual(selectionOf(editor), [8, 0, 8, 6], 'selection [line, char, line, char] (0-based) of "245.57"');
    equal(editor.document.getText(editor.selection), '245.57', 'selected text');
  });

  test('a reveal of an unflagged cell scans the record: quoted fields spanning lines (csv-spectrum newlines.csv)', async () => {
    const api = await assayApi();
    const uri = fixtureUri('newlines.csv');
    await openFixture('newlines.csv');
    await rendered(uri);
    await api.panelMessage({ type: 'reveal', uri: uri.toString(), row: 3, field: 1 });
    let editor = await waitFor('the selection of record 3, field 2', () => {
      const e = vscode.window.activeTextEditor;
      return e !== undefined && selectionOf(e)[0] === 4 ? e : undefined;
    });
    deepEqual(selectionOf(editor), [4, 2, 4, 3], 'record 3 field 2 ("8" on line 5)');
    await api.panelMessage({ type: 'reveal', uri: uri.toString(), row: 2, field: 0 });
    editor = await waitFor('the selection of record 2, field 1', () => {
      const e = vscode.window.activeTextEditor;
      return e !== undefined && selectionOf(e)[0] === 2 ? e : undefined;
    });
    deepEqual(selectionOf(editor), [2, 0, 3, 7], 'record 2 field 1 (quoted, lines 3-4, quotes included)');
  });

  test('a copy request from the panel puts the summary table on the clipboard as Markdown', async () => {
    const api = await assayApi();
    const uri = fixtureUri('uranium.csv');
    await openFixture('uranium.csv');
    const r = await rendered(uri);
    await vscode.env.clipboard.writeText('');
    await api.panelMessage({ type: 'copy', uri: uri.toString(), version: r.version, target: 'summary' });
    const text = await waitFor('the clipboard to hold the table', async () => {
      const t = await vscode.env.clipboard.readText();
      return t.includes('uranium.csv') ? t : undefined;
    });
    const rows = text.split('\n').filter((l) => l.startsWith('|'));
    equal(rows.length, 3, 'table lines: header, delimiter row, one row for column x');
    ok(/^\|\s*-/.test(rows[1] ?? '') || /^\|\s*:?-/.test(rows[1] ?? ''), 'a GFM delimiter row');
    ok(rows[2]?.includes('x'), 'the row names column x');
  });

  test('closing the panel', async () => {
    const api = await assayApi();
    await closePanel();
    await waitFor('the panel to close', () => api.panelUri() === undefined && panelTab() === undefined);
  });
});
