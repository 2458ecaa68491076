// Flags where the data is, in the real workbench: problems on the exact cells, hovers, moving from
// flag to flag, and quick fixes. Fixtures (see ../fixtures/SOURCES.md): planted.csv, Anscombe (1973)
// with problems planted on known lines, and uranium.csv, Tietjen & Moore (1972). Cell positions are
// counted in the files (0-based here, as the editor API counts). Outliers: d3-array's type-7
// quantiles of planted.csv give x Q1 7, Q3 11 (fences 1 and 17: 19.0 is out) and y Q3 8.7475, IQR 2.4
// (upper fence 12.3475: 12.74 and 12.5 are out); uranium's type-7 quartiles (by hand) 200.025 and
// 202.0075 give fences 197.05125 and 204.98125; its modified z-score is 29.9627 (e-Handbook 1.3.5.17).
import * as vscode from 'vscode';
import { DEFAULT_RULES } from '../../../src/core/options';
import { deepEqual, equal, ok } from './expect';
import { assayApi, closeAllEditors, closePanel, copyFixture, exactProfile, fixtureUri, openFixture, rangeOf, setSetting, sleep, waitFor } from './helpers';

const S = vscode.DiagnosticSeverity;

/** [code, range, severity, text] of every Assay problem of the document, in file order. */
function problems(doc: vscode.TextDocument): [string, number[], vscode.DiagnosticSeverity, string][] {
  return vscode.languages.getDiagnostics(doc.uri).filter((d) => d.source === 'Assay')
    .map((d): [string, number[], vscode.DiagnosticSeverity, string] => [String(d.code), rangeOf(d.range), d.severity, doc.getText(d.range)])
    .sort((a, b) => a[1][0]! - b[1][0]! || a[1][1]! - b[1][1]! || (a[0] < b[0] ? -1 : 1));
}

async function waitForProblems(doc: vscode.TextDocument, what: string, test: (p: ReturnType<typeof problems>) => boolean) {
  return waitFor(what, () => {
    const p = problems(doc);
    return test(p) ? p : undefined;
  });
}

const PLANTED: [string, number[], vscode.DiagnosticSeverity, string][] = [
  ['category-variant', [4, 0, 4, 5], S.Hint, '" I "'],
  ['surrounding-whitespace', [4, 0, 4, 5], S.Hint, '" I "'],
  ['not-a-number', [7, 2, 7, 5], S.Warning, 'six'],
  ['category-variant', [13, 0, 13, 2], S.Hint, 'ii'],
  ['tukey-fence', [25, 9, 25, 14], S.Information, '12.74'],
  ['mixed-missing-tokens', [29, 8, 29, 10], S.Hint, 'NA'],
  ['modified-z', [41, 3, 41, 7], S.Information, '19.0'],
  ['tukey-fence', [41, 3, 41, 7], S.Information, '19.0'],
  ['tukey-fence', [41, 8, 41, 12], S.Information, '12.5'],
  ['ragged-row', [43, 0, 43, 6], S.Warning, 'IV,8.0'],
];

async function hoverText(uri: vscode.Uri, position: vscode.Position): Promise<{ text: string; range: vscode.Range | undefined }> {
  const hovers = await vscode.commands.executeCommand<vscode.Hover[]>('vscode.executeHoverProvider', uri, position);
  const ours = hovers.filter((h) => h.contents.some((c) => (typeof c === 'string' ? c : c.value).includes(' · ')));
  return { text: ours.flatMap((h) => h.contents.map((c) => (typeof c === 'string' ? c : c.value))).join('\n'), range: ours[0]?.range };
}

suite('editor', () => {
  suiteSetup(closeAllEditors);
  suiteTeardown(closeAllEditors);

  test('each flag is a problem on its exact cell: source Assay, code the rule, severity by rule (planted.csv)', async () => {
    const editor = await openFixture('planted.csv');
    await exactProfile(editor.document);
    const got = await waitForProblems(editor.document, 'the problems of planted.csv', (p) => p.length === PLANTED.length);
    deepEqual(got, PLANTED, 'problems [code, range, severity, text]');
  });

  test('assay.diagnostics.max caps the problems and one more on the header says how many are left', async () => {
    const editor = await openFixture('planted.csv');
    await setSetting('diagnostics.max', 3);
    try {
      const got = await waitForProblems(editor.document, 'the capped problems', (p) => p.length === 4);
      // The strongest first: the two warnings, then the first information flag in file order.
      deepEqual(got.map((p) => [p[0], p[1]]), [['more-flags', [0, 0, 0, 11]], ['not-a-number', [7, 2, 7, 5]], ['tukey-fence', [25, 9, 25, 14]], ['ragged-row', [43, 0, 43, 6]]], 'capped problems');
      const more = vscode.languages.getDiagnostics(editor.document.uri).find((d) => d.code === 'more-flags');
      ok(more?.message.startsWith('Assay: 7 more flags are not shown as problems'), `the header problem says how many more: ${more?.message}`);
      ok(more?.message.includes('Open the profile'), 'and how to see them');
    } finally {
      await setSetting('diagnostics.max', undefined);
    }
    await waitForProblems(editor.document, 'all problems again', (p) => p.length === PLANTED.length);
  });

  test('switching a rule off removes its problems', async () => {
    const editor = await openFixture('planted.csv');
    await setSetting('rules.enabled', DEFAULT_RULES.filter((r) => r !== 'tukey-fence'));
    try {
      const got = await waitForProblems(editor.document, 'the problems without tukey-fence', (p) => p.length === PLANTED.length - 3);
      ok(got.every((p) => p[0] !== 'tukey-fence'), 'no tukey-fence problem is left');
    } finally {
      await setSetting('rules.enabled', undefined);
    }
    await waitForProblems(editor.document, 'all problems again', (p) => p.length === PLANTED.length);
  });

  test('a hover on an outlier leads with the rule and its fences (uranium 245.57, line 9)', async () => {
    const editor = await openFixture('uranium.csv');
    await exactProfile(editor.document);
    const { text, range } = await waitFor('a hover with the value\'s percentile', async () => {
      const h = await hoverText(editor.document.uri, new vscode.Position(8, 3));
      return h.text.includes('percentile') ? h : undefined;
    });
    ok(text.startsWith('**tukey-fence** · check: 245.57 is above the far upper fence'), `the hover leads with the rule: ${text.slice(0, 120)}`);
    ok(text.includes('lower fence 197.05 · upper fence 204.98 · k 1.5'), 'Tukey\'s fences (type-7 quartiles by hand: 197.05125 and 204.98125)');
    ok(text.includes('modified z-score 29.963'), 'the modified z-score (e-Handbook 1.3.5.17: 29.9627)');
    ok(text.includes('candidate for review, not an error'), 'the caution');
    ok(text.includes('(command:assay.showColumn?') && text.includes('(command:assay.nextFlag?'), 'links to show the column and go to the next flag');
    // Mid-rank percentile of the largest of 8 values: 100 (7 + 1/2) / 8 = 93.75.
    ok(text.includes('percentile 93.75 (mid-rank: 7 of 8 values below, 1 equal)'), 'where the value stands');
    deepEqual(range === undefined ? [] : rangeOf(range), [8, 0, 8, 6], 'the hover\'s range is the cell');
    const plain = await hoverText(editor.document.uri, new vscode.Position(1, 2));
    ok(plain.text.startsWith('**x** · decimal · ratio') && plain.text.includes('[Show the column'), `an unflagged cell shows its column: ${plain.text.slice(0, 80)}`);
  });

  test('next and previous flagged cell move the selection in file order and wrap (planted.csv)', async () => {
    const editor = await openFixture('planted.csv');
    await exactProfile(editor.document);
    editor.selection = new vscode.Selection(0, 0, 0, 0);
    const seen: number[][] = [];
    for (let i = 0; i < 9; i++) {
      await vscode.commands.executeCommand('assay.nextFlag');
      seen.push(rangeOf(vscode.window.activeTextEditor!.selection));
    }
    deepEqual(seen, [
      [4, 0, 4, 5], [7, 2, 7, 5], [13, 0, 13, 2], [25, 9, 25, 14], [29, 8, 29, 10], [41, 3, 41, 7], [41, 8, 41, 12], [43, 0, 43, 6],
      [4, 0, 4, 5],
    ], 'selections after each next (the ninth wraps to the first)');
    await vscode.commands.executeCommand('assay.previousFlag');
    deepEqual(rangeOf(vscode.window.activeTextEditor!.selection), [43, 0, 43, 6], 'previous from the first wraps to the last');
    await vscode.commands.executeCommand('assay.previousFlag');
    deepEqual(rangeOf(vscode.window.activeTextEditor!.selection), [41, 8, 41, 12], 'previous again');
    editor.selection = new vscode.Selection(0, 0, 0, 0);
    await vscode.commands.executeCommand('assay.nextFlag', { rule: 'tukey-fence' });
    deepEqual(rangeOf(vscode.window.activeTextEditor!.selection), [25, 9, 25, 14], 'next tukey-fence flag');
    await vscode.commands.executeCommand('assay.nextFlag', { column: 'x' });
    deepEqual(rangeOf(vscode.window.activeTextEditor!.selection), [41, 3, 41, 7], 'next flag in column x after line 26');
    // A limit set once applies to the plain commands (and to the keys) until it is lifted.
    await vscode.commands.executeCommand('assay.limitFlagNavigation', { rule: 'category-variant' });
    try {
      await vscode.commands.executeCommand('assay.nextFlag');
      deepEqual(rangeOf(vscode.window.activeTextEditor!.selection), [4, 0, 4, 5], 'next category-variant flag (wrapped)');
      await vscode.commands.executeCommand('assay.nextFlag');
      deepEqual(rangeOf(vscode.window.activeTextEditor!.selection), [13, 0, 13, 2], 'and the one after it');
    } finally {
      await vscode.commands.executeCommand('assay.limitFlagNavigation', { all: true });
    }
    await vscode.commands.executeCommand('assay.nextFlag');
    deepEqual(rangeOf(vscode.window.activeTextEditor!.selection), [25, 9, 25, 14], 'every flag again');
  });

  test('the hover\'s links: show the column in the profile, go to the next flagged cell', async () => {
    const api = await assayApi();
    const editor = await openFixture('planted.csv');
    await exactProfile(editor.document);
    const uri = editor.document.uri.toString();
    await vscode.commands.executeCommand('assay.showColumn', { uri, column: 'y' });
    await waitFor('the panel to open on planted.csv, column y', () => (api.panelUri() === uri && api.panelColumn() === 'y') || undefined, 20_000);
    equal(vscode.window.activeTextEditor?.document.uri.toString(), uri, 'the editor keeps the focus');
    // The link passes the hovered cell's start: the next flag after the cell on line 26.
    await vscode.commands.executeCommand('assay.nextFlag', { uri, line: 25, character: 9 });
    deepEqual(rangeOf(vscode.window.activeTextEditor!.selection), [29, 8, 29, 10], 'the flag after 12.74');
    await closePanel();
  });

  test('the flagged-cells quick pick reveals the cell chosen (the first: the ragged record, line 44)', async () => {
    const editor = await openFixture('planted.csv');
    await exactProfile(editor.document);
    editor.selection = new vscode.Selection(20, 0, 20, 0);
    const done = vscode.commands.executeCommand('assay.listFlags');
    await sleep(600);
    await vscode.commands.executeCommand('workbench.action.acceptSelectedQuickOpenItem');
    await done;
    // Groups: whole records first, then each column's rules in column order.
    deepEqual(rangeOf(vscode.window.activeTextEditor!.selection), [43, 0, 43, 6], 'selection after choosing the first entry');
  });

  test('a quick fix changes exactly one cell and undo restores it; none is offered for an outlier', async () => {
    const uri = await copyFixture('planted.csv', 'planted-fix.csv');
    const doc = await vscode.workspace.openTextDocument(uri);
    const editor = await vscode.window.showTextDocument(doc, { preview: false });
    await exactProfile(doc);
    const before = doc.getText();
    const actions = await vscode.commands.executeCommand<vscode.CodeAction[]>('vscode.executeCodeActionProvider', uri, new vscode.Range(13, 0, 13, 2), vscode.CodeActionKind.QuickFix.value);
    const ours = actions.filter((a) => a.title.startsWith('Write the usual spelling'));
    deepEqual(ours.map((a) => a.title), ['Write the usual spelling "II"'], 'the fix offered for "ii"');
    const edit = ours[0]!.edit;
    ok(edit !== undefined, 'the fix is a workspace edit');
    deepEqual(edit.entries().map(([u, edits]) => [u.toString(), edits.map((e) => [rangeOf(e.range), e.newText])]), [[uri.toString(), [[[13, 0, 13, 2], 'II']]]], 'one edit of one cell');
    ok(await vscode.workspace.applyEdit(edit), 'the edit applies');
    const lines = (t: string) => t.split('\n');
    const changed = lines(doc.getText()).map((l, i) => (l === lines(before)[i] ? null : [i, l])).filter((x) => x !== null);
    deepEqual(changed, [[13, 'II,8.0,8.14']], 'lines that changed');
    await vscode.window.showTextDocument(doc, { viewColumn: editor.viewColumn, preview: false });
    await vscode.commands.executeCommand('undo');
    await waitFor('undo to restore the cell', () => doc.getText() === before || undefined);

    // The undo made a new version: fixes are offered only once its profile is in.
    await exactProfile(doc);
    const quoted = await vscode.commands.executeCommand<vscode.CodeAction[]>('vscode.executeCodeActionProvider', uri, new vscode.Range(4, 2, 4, 2), vscode.CodeActionKind.QuickFix.value);
    const trim = quoted.filter((a) => a.title.startsWith('Trim'));
    deepEqual(trim.map((a) => a.edit?.entries()[0]?.[1].map((e) => [rangeOf(e.range), e.newText])), [[[[4, 0, 4, 5], '"I"']]], 'the trim fix keeps the quotes of " I "');
    const outlier = await vscode.commands.executeCommand<vscode.CodeAction[]>('vscode.executeCodeActionProvider', uri, new vscode.Range(41, 3, 41, 7), vscode.CodeActionKind.QuickFix.value);
    equal(outlier.filter((a) => a.edit?.entries().length).length, 0, 'quick fixes for the outlier 19.0');
  });

  test('our default keys clash with no default keybinding of the workbench', async () => {
    const ours: Record<string, string> = { 'assay.nextFlag': 'ctrl+alt+]', 'assay.previousFlag': 'ctrl+alt+[' };
    await vscode.commands.executeCommand('workbench.action.openDefaultKeybindingsFile');
    const doc = await waitFor('the default keybindings', () => {
      const d = vscode.window.activeTextEditor?.document;
      return d !== undefined && d.uri.toString().includes('keybindings.json') && d.getText().includes('"key"') ? d : undefined;
    });
    const entries = [...doc.getText().matchAll(/"key":\s*"([^"]+)",\s*"command":\s*"([^"]+)"/g)].map((m) => [m[1]!, m[2]!] as const);
    ok(entries.length > 500, `the workbench lists its defaults (${entries.length})`);
    for (const [command, key] of Object.entries(ours)) {
      ok(entries.some(([k, c]) => k === key && c === command), `${command} is bound to ${key}`);
      deepEqual(entries.filter(([k, c]) => k === key && c !== command && !c.startsWith('-')), [], `other commands on ${key}`);
    }
  });

  test('closing the file clears its problems', async () => {
    const editor = await openFixture('planted.csv');
    await waitForProblems(editor.document, 'the problems of planted.csv', (p) => p.length > 0);
    await closeAllEditors();
    await waitFor('no problems left for planted.csv', () => vscode.languages.getDiagnostics(fixtureUri('planted.csv')).length === 0 || undefined);
  });
});
