// Reloading the window restores the panel on the file it showed and profiles that file once (issue 6,
// lifecycle). The reload is real (workbench.action.reloadWindow): the page reloads, the workbench
// restores its editors and hands the panel to the extension's serializer, and the suite runs again
// in the new extension host, where only the "[after reload]" test runs (see reload-phase.ts). This
// file sorts last because the reload ends the first life of the suite.
import * as vscode from 'vscode';
import { equal, ok } from './expect';
import { assayApi, closeAllEditors, exactProfile, fixtureUri, panelTab, sleep, waitFor } from './helpers';
import { AFTER_RELOAD, reloadNote, reloadSupported, writeReloadNote } from './reload-phase';
import { tally } from './reporter';

suite('lifecycle: reload', () => {
  const note = reloadNote();
  if (note === undefined) {
    test('reloading the window with the panel open (the checks follow in the reloaded window)', async function () {
      if (!reloadSupported()) this.skip();
      const api = await assayApi();
      await closeAllEditors();
      // A file served from the fixtures (one written by a test would be gone after the reload).
      const uri = fixtureUri('anscombe.csv');
      const doc = await vscode.workspace.openTextDocument(uri);
      await vscode.window.showTextDocument(doc, { viewColumn: vscode.ViewColumn.One, preview: false });
      await exactProfile(doc);
      await vscode.commands.executeCommand('assay.openPanel');
      await waitFor('the panel to render the file', () => api.lastRendered()?.uri === uri.toString() && panelTab() !== undefined);
      // Gives the webview time to store its state (it does on each profile it shows) before the reload.
      await sleep(500);
      await writeReloadNote({ carried: { ...tally }, panelUri: uri.toString() });
      await vscode.commands.executeCommand('workbench.action.reloadWindow');
      // The page goes away here; if it does not, the test times out and fails.
      await new Promise(() => undefined);
    });
  } else {
    test(`${AFTER_RELOAD} the panel is restored on the file it showed, which is profiled once`, async function () {
      this.timeout(60_000);
      const api = await assayApi();
      const key = note.panelUri;
      await waitFor('the panel tab restored by the workbench', () => panelTab(), 30_000);
      await waitFor('the restored panel on the file it showed', () => api.panelUri() === key, 30_000);
      const r = await waitFor('the restored panel to render the file', () => {
        const last = api.lastRendered();
        return last?.uri === key && !last.partial ? last : undefined;
      }, 30_000);
      equal(r.rows, 44, 'records the restored panel shows (Anscombe 1973: 44)');
      // Everything that asks for a profile at startup has asked by now: the active editor, the
      // visible editors, the restored panel.
      await sleep(2000);
      const c = api.jobs(key);
      console.log(`    after the reload: runs ${api.profilerRuns(key)}, jobs ${JSON.stringify(c)}, history ${JSON.stringify(api.profileHistory(key))}`);
      equal(c.started, 1, 'jobs started for the file since the reload');
      equal(api.profilerRuns(key), 1, 'profiler runs begun for the file since the reload');
      equal(c.ended.profiled, 1, 'jobs that ran to the end');
      equal(api.jobsInWorker(), 0, 'jobs left in the worker');
      ok(api.workerCount() <= 1, `workers alive (${api.workerCount()})`);
      await closeAllEditors();
    });
  }
});
