// Screenshots of the workbench with the panel open on the demo file (or a fixture when the demo is
// absent), in a light and a dark theme. The runner writes them to test-output/screenshots/.
import * as vscode from 'vscode';
import { fieldRange } from '../../../src/extension/editor/field-range';
import { ok } from './expect';
import { assayApi, closeAllEditors, fixtureUri, screenshot, sleep, waitFor } from './helpers';

async function setTheme(name: string): Promise<void> {
  await vscode.workspace.getConfiguration('workbench').update('colorTheme', name, vscode.ConfigurationTarget.Global);
  await sleep(1500);
}

suite('screenshots', () => {
  suiteSetup(closeAllEditors);
  suiteTeardown(async () => {
    await vscode.workspace.getConfiguration('workbench').update('colorTheme', undefined, vscode.ConfigurationTarget.Global);
    await closeAllEditors();
  });

  test('the panel on the demo file, light and dark', async function () {
    // Only the web runner takes screenshots (it drives the browser).
    if (vscode.env.uiKind !== vscode.UIKind.Web) this.skip();
    const api = await assayApi();
    let uri = fixtureUri('roastery-batches.csv');
    try {
      await vscode.workspace.fs.stat(uri);
    } catch {
      uri = fixtureUri('anscombe.csv');
    }
    await vscode.commands.executeCommand('workbench.action.closeSidebar');
    await vscode.commands.executeCommand('workbench.action.closeAuxiliaryBar');
    await vscode.commands.executeCommand('workbench.action.closePanel');
    const doc = await vscode.workspace.openTextDocument(uri);
    const editor = await vscode.window.showTextDocument(doc, { viewColumn: vscode.ViewColumn.One, preview: false });
    await vscode.commands.executeCommand('assay.openPanel');
    await waitFor('the panel to render the demo file', () => api.lastRendered()?.uri === uri.toString() || undefined, 20_000);
    // Put the cursor in the first numeric column of the first record: the panel opens that column.
    const p = api.profileFor(uri.toString());
    const field = p?.profile.columns.findIndex((c) => c.type === 'decimal' || c.type === 'integer') ?? -1;
    const line = doc.lineAt(1).text;
    const cell = field >= 0 ? fieldRange(line, 0, field, p?.profile.delimiter ?? ',', p?.profile.quote ?? '"') : null;
    if (cell !== null) {
      const at = new vscode.Position(1, cell.start);
      editor.selection = new vscode.Selection(at, at);
      await sleep(800);
    }
    await setTheme('Default Light Modern');
    const light = await screenshot('panel-light');
    await setTheme('Default Dark Modern');
    const dark = await screenshot('panel-dark');
    ok(light && dark, 'the runner took both screenshots');
  });
});
