// Copying as Markdown from the command palette and saving the report, in the real workbench: each
// command's text is read back from the clipboard. The expected tables are the core's renderings of
// the same profile (render-copy.ts, unit-tested with exact output); the checks here are that each
// command reaches the clipboard with the right table. Data: Anscombe (1973), 44 records in 4 sets of
// 11 with mean x = 9 in each (test/workbench/fixtures/anscombe.csv).
import * as vscode from 'vscode';
import { renderReport } from '../../../src/core/markdown';
import { resolveOptions } from '../../../src/core/options';
import { renderCopy } from '../../../src/extension/copy/render-copy';
import type { CopyRequestLike } from '../../../src/extension/copy/render-copy';
import { deepEqual, equal, ok } from './expect';
import { assayApi, closeAllEditors, exactProfile, fixtureUri, openFixture, sleep, waitFor } from './helpers';
import { parseMetadata } from '../../../src/core/csvw/parse-metadata';

const rules = resolveOptions({}).rules;

async function clipboardAfter(command: string, args?: unknown): Promise<string> {
  await vscode.env.clipboard.writeText('');
  await vscode.commands.executeCommand(command, args);
  return waitFor(`the clipboard after ${command}`, async () => {
    const t = await vscode.env.clipboard.readText();
    return t !== '' ? t : undefined;
  });
}

function tableRows(md: string): string[][] {
  return md.split('\n').filter((l) => l.startsWith('|')).slice(2).map((l) => l.slice(1, -1).split('|').map((c) => c.trim()));
}

suite('copy and report', () => {
  suiteSetup(closeAllEditors);
  suiteTeardown(closeAllEditors);

  test('each copy command puts its table on the clipboard as Markdown (anscombe.csv)', async () => {
    const editor = await openFixture('anscombe.csv');
    const { profile } = await exactProfile(editor.document);
    const ctx = { profile, fileLabel: 'anscombe.csv', significantDigits: 4, rules, grouped: () => undefined, comparison: () => undefined };
    const expected = (r: CopyRequestLike): string => {
      const out = renderCopy(r, ctx);
      if ('error' in out) throw new Error(out.error);
      return out.markdown;
    };
    const cases: [string, Record<string, string>, CopyRequestLike, string][] = [
      ['assay.copySummary', {}, { target: 'summary' }, '**anscombe.csv** · 3 columns;'],
      ['assay.copyColumnSummary', { column: 'x' }, { target: 'column', column: 'x' }, '**anscombe.csv — x** · statistics for a ratio column'],
      ['assay.copyFrequencyTable', { column: 'dataset' }, { target: 'frequencies', column: 'dataset' }, '**anscombe.csv — dataset** · frequencies'],
      ['assay.copyGroupedTable', { column: 'x' }, { target: 'grouped', column: 'x' }, '**anscombe.csv — x** · bins: Freedman-Diaconis'],
      ['assay.copyFlags', {}, { target: 'flags' }, '**anscombe.csv** · flags:'],
    ];
    for (const [command, args, request, firstLine] of cases) {
      const text = await clipboardAfter(command, args);
      ok(text.startsWith(firstLine), `${command}: first line "${text.split('\n')[0]}"`);
      equal(text, expected(request), `${command}: the whole table`);
    }
    const groups = await clipboardAfter('assay.copyGroupComparison', { column: 'x', by: 'dataset' });
    ok(groups.startsWith('**anscombe.csv — x** · by dataset:'), `group comparison: first line "${groups.split('\n')[0]}"`);
    // Anscombe (1973): each set has 11 records and mean x = 9.
    deepEqual(tableRows(groups).map((r) => r.slice(0, 3)), [['I', '11', '9'], ['II', '11', '9'], ['III', '11', '9'], ['IV', '11', '9']], 'group rows [group, count, mean]');
  });

  test('a column picked from the quick pick is copied: the cursor\'s column is offered first', async () => {
    const editor = await openFixture('anscombe.csv');
    const { profile } = await exactProfile(editor.document);
    editor.selection = new vscode.Selection(2, 3, 2, 3);
    await vscode.env.clipboard.writeText('');
    const done = vscode.commands.executeCommand('assay.copyColumnSummary');
    await sleep(600);
    await vscode.commands.executeCommand('workbench.action.acceptSelectedQuickOpenItem');
    await done;
    const text = await waitFor('the clipboard', async () => (await vscode.env.clipboard.readText()) || undefined);
    const out = renderCopy({ target: 'column', column: 'x' }, { profile, fileLabel: 'anscombe.csv', significantDigits: 4, rules, grouped: () => undefined, comparison: () => undefined });
    equal(text, 'markdown' in out ? out.markdown : '', 'the column summary of x (the cursor is on line 3 in x)');
  });

  test('the report is saved as Markdown beside the data file and opened', async () => {
    const editor = await openFixture('anscombe.csv');
    const { profile } = await exactProfile(editor.document);
    const to = fixtureUri('anscombe-profile.md');
    const saved = await vscode.commands.executeCommand<vscode.Uri | undefined>('assay.saveReport', { to: to.toString() });
    equal(saved?.toString(), to.toString(), 'where the report went');
    const active = await waitFor('the report in an editor', () => (vscode.window.activeTextEditor?.document.uri.toString() === to.toString() ? vscode.window.activeTextEditor : undefined));
    const text = active.document.getText();
    equal(text.split('\n')[0], '# Assay report: anscombe.csv', 'the report\'s title');
    equal(text, renderReport(profile, { fileLabel: 'anscombe.csv', significantDigits: 4, rules }), 'the report is the core\'s (the CLI prints the same)');
    const onDisk = new TextDecoder().decode(await vscode.workspace.fs.readFile(to));
    equal(onDisk, text, 'the file on disk');
  });

  test('the HTML report is self-contained: no script, a CSP that forbids loads', async () => {
    await openFixture('anscombe.csv');
    const to = fixtureUri('anscombe-profile.html');
    await vscode.commands.executeCommand('assay.saveHtmlReport', { uri: fixtureUri('anscombe.csv').toString(), to: to.toString() });
    const html = new TextDecoder().decode(await vscode.workspace.fs.readFile(to));
    ok(html.startsWith('<!DOCTYPE html>') || html.startsWith('<!doctype html>'), `an HTML document: ${html.slice(0, 30)}`);
    ok(!/<script/i.test(html), 'no script element');
    ok(html.includes("default-src 'none'"), 'the CSP forbids every load');
    ok(/<svg/.test(html), 'charts as inline SVG');
  });

  test('metadata written from the profile is valid CSV on the Web metadata that the file satisfies', async () => {
    const editor = await openFixture('anscombe.csv');
    await exactProfile(editor.document);
    const to = fixtureUri('anscombe.csv-metadata.json');
    const saved = await vscode.commands.executeCommand<vscode.Uri | undefined>('assay.writeMetadata', { to: to.toString() });
    equal(saved?.toString(), to.toString(), 'where the metadata went');
    const text = new TextDecoder().decode(await vscode.workspace.fs.readFile(to));
    const doc = JSON.parse(text) as { url: string; tableSchema: { columns: { titles: string }[] } };
    equal(doc.url, 'anscombe.csv', 'the url names the data file');
    equal(doc.tableSchema.columns.map((c) => c.titles).join(','), 'dataset,x,y', 'one description per column');
    const parsed = parseMetadata(text, to.toString());
    equal(parsed.errors.filter((e) => e.severity === 'error').length, 0, 'no metadata errors');
    await vscode.workspace.fs.delete(to);
  });

  test('a report never overwrites the data file', async () => {
    const editor = await openFixture('uranium.csv');
    await exactProfile(editor.document);
    const before = editor.document.getText();
    const saved = await vscode.commands.executeCommand<vscode.Uri | undefined>('assay.saveReport', { to: editor.document.uri.toString() });
    equal(saved, undefined, 'nothing saved');
    equal(new TextDecoder().decode(await vscode.workspace.fs.readFile(editor.document.uri)), before, 'the data file on disk');
  });

  test('the panel\'s Save report asks where (beside the file by default) and saves there', async function () {
    // The browser workbench's save dialog is a quick input the test can accept; a desktop one is native.
    if (vscode.env.uiKind !== vscode.UIKind.Web) this.skip();
    const api = await assayApi();
    const editor = await openFixture('uranium.csv');
    const p = await exactProfile(editor.document);
    const to = fixtureUri('uranium-profile.md');
    await vscode.commands.executeCommand('assay.openPanel');
    await waitFor('the panel to show uranium.csv', () => api.lastRendered()?.uri === editor.document.uri.toString() || undefined, 20_000);
    const done = api.panelMessage({ type: 'copy', uri: editor.document.uri.toString(), version: p.version, target: 'report' });
    // The save dialog (the workbench's own, in the browser) opens on the default name: accept it.
    await sleep(1000);
    await vscode.commands.executeCommand('workbench.action.acceptSelectedQuickOpenItem');
    await done;
    await waitFor('the saved report in an editor', () => vscode.window.activeTextEditor?.document.uri.toString() === to.toString() || undefined);
    ok((await vscode.workspace.fs.stat(to)).size > 0, 'the report file exists');
  });
});
