// Nothing is left running: opening and closing the panel many times keeps at most one worker, and
// once no data file and no panel is open the worker is gone.
import * as vscode from 'vscode';
import { ok } from './expect';
import { assayApi, closeAllEditors, closePanel, openFixture, panelTab, waitFor } from './helpers';

suite('lifecycle', () => {
  suiteSetup(closeAllEditors);

  test('opening and closing the panel 20 times leaves no worker running', async () => {
    const api = await assayApi();
    const editor = await openFixture('anscombe.csv');
    let most = 0;
    for (let i = 0; i < 20; i++) {
      await vscode.commands.executeCommand('assay.openPanel');
      await waitFor(`panel ${i + 1} to open`, () => api.panelUri() === editor.document.uri.toString() && panelTab() !== undefined);
      most = Math.max(most, api.workerCount());
      await closePanel();
      await waitFor(`panel ${i + 1} to close`, () => api.panelUri() === undefined && panelTab() === undefined);
      most = Math.max(most, api.workerCount());
    }
    ok(most <= 1, `at most one worker alive during the cycles (saw ${most})`);
    await closeAllEditors();
    await waitFor('no worker alive once no data file and no panel is open', () => api.workerCount() === 0, 5000);
  });
});
