// Jobs end with their reason (issue 6, lifecycle): a burst of edits leaves one job, closing the file
// or the panel during a long job makes the worker stop it and drop what it kept. Jobs are counted on
// the wire to the worker (src/extension/profiling/job-ledger.ts): what it was told and what it said.
// The data is NIST StRD PiDigits repeated (5000 records a copy); record counts follow from the copies
// and the edits (common practice: one record per line).
import * as vscode from 'vscode';
import { EDIT_DEBOUNCE_MS } from '../../../src/extension/profiling/document-profiler';
import { equal, ok } from './expect';
import { assayApi, closeAllEditors, closePanel, exactProfile, openFixture, panelTab, sleep, waitFor, writePiDigits } from './helpers';

/** Copies of PiDigits for a job that lasts seconds in the worker (2 000 000 records, 4 MB). */
const LONG_JOB_COPIES = 400;

async function show(uri: vscode.Uri, column: vscode.ViewColumn = vscode.ViewColumn.One): Promise<vscode.TextDocument> {
  const doc = await vscode.workspace.openTextDocument(uri);
  await vscode.window.showTextDocument(doc, { viewColumn: column, preview: false });
  return doc;
}

async function closeTabOf(uri: vscode.Uri): Promise<void> {
  const key = uri.toString();
  for (const group of vscode.window.tabGroups.all) {
    for (const tab of group.tabs) {
      if (tab.input instanceof vscode.TabInputText && tab.input.uri.toString() === key) await vscode.window.tabGroups.close(tab);
    }
  }
}

/**
 * With another data file open (it keeps the worker alive, so a job can end only by being cancelled),
 * opens a long file (and the panel on it) and waits for its first profile.
 */
async function openLongFile(name: string, panel: boolean) {
  const api = await assayApi();
  await closeAllEditors();
  const other = await openFixture('anscombe.csv');
  await exactProfile(other.document);
  const uri = await writePiDigits(name, LONG_JOB_COPIES);
  const key = uri.toString();
  const doc = await show(uri);
  if (panel) {
    await vscode.commands.executeCommand('assay.openPanel');
    await waitFor('the panel on the long file', () => api.panelUri() === key && panelTab() !== undefined);
  }
  await waitFor('the first profile of the long file', () => api.profileFor(key)?.version === doc.version && !api.profileFor(key)?.partial, 90_000);
  return { api, uri, key, doc };
}

async function leftWorker(key: string): Promise<void> {
  const api = await assayApi();
  await waitFor('the job to leave the worker', () => api.jobs(key).running + api.jobs(key).stopping === 0, 30_000);
}

/** The job ended by the worker's cancel; neither side keeps the file; the worker ends with nothing open. */
async function cancelledAndDropped(key: string, profiledBefore: number): Promise<void> {
  const api = await assayApi();
  await leftWorker(key);
  const c = api.jobs(key);
  equal(c.ended.cancelled, 1, 'jobs the worker reported cancelled');
  equal(c.ended.profiled, profiledBefore, 'jobs that ran to the end (those before the close)');
  equal(api.workerCount(), 1, 'the worker lives on for the other open file');
  equal(await api.workerKeeps(key), false, 'the worker keeps no profile of the file');
  equal(api.profileFor(key), undefined, 'the host keeps no profile of the file');
  await closeAllEditors();
  await waitFor('no worker once nothing is open', () => api.workerCount() === 0, 5000);
  equal(api.jobsInWorker(), 0, 'jobs left in any worker');
}

suite('lifecycle: jobs', () => {
  suiteSetup(closeAllEditors);
  suiteTeardown(closeAllEditors);

  test('100 rapid edits in a row leave one job running, and the profile is of the last version', async function () {
    this.timeout(60_000);
    const api = await assayApi();
    // Small, so that each edit lands well within the pause the profiler waits for (an edit to a file of
    // 200 000 lines takes about as long as that pause in this workbench).
    const uri = await writePiDigits('pi-digits-burst.csv', 1);
    const key = uri.toString();
    const doc = await show(uri);
    await exactProfile(doc);
    equal(api.jobs(key).started, 1, 'jobs started on opening');
    const before = doc.version;
    let most = 0;
    let pauses = 0;
    const t0 = Date.now();
    let last = t0;
    for (let i = 0; i < 100; i++) {
      const edit = new vscode.WorkspaceEdit();
      edit.insert(uri, new vscode.Position(1, 0), '7\n');
      // Back to back: each edit waits only for itself to land (an edit made against an older version is
      // refused), never for the profiler.
      ok(await vscode.workspace.applyEdit(edit), `edit ${i + 1} applies`);
      most = Math.max(most, api.jobs(key).running);
      // A hiccup of the workbench longer than the profiler's pause would rightly let a job start.
      if (i > 0 && Date.now() - last >= EDIT_DEBOUNCE_MS) pauses++;
      last = Date.now();
    }
    const elapsed = Date.now() - t0;
    equal(doc.version - before, 100, 'one document version per edit');
    const p = await exactProfile(doc);
    equal(p.profile.rows, 5100, 'records: the 5000 PiDigits values + 100 added');
    await sleep(1000);
    const c = api.jobs(key);
    console.log(`    burst: ${elapsed} ms for 100 edits, ${pauses} pauses, jobs ${JSON.stringify(c)}`);
    ok(most <= 1, `at most one job running as each edit landed (saw ${most})`);
    equal(c.peakRunning, 1, 'most jobs running at once for the file, ever');
    ok(c.started - 1 <= 1 + pauses, `jobs started by the burst: one after it, plus one per pause in it of ${EDIT_DEBOUNCE_MS} ms or more (${pauses}); got ${c.started - 1}`);
    equal(c.running + c.stopping, 0, 'jobs still in the worker once it is quiet');
    equal(c.ended.profiled + c.ended.cancelled, c.started, 'each job finished or was cancelled by the worker');
    equal(c.ended.error + c.ended.terminated, 0, 'no job failed or was cut off by a worker restart');
    equal(api.profileFor(key)?.version, doc.version, 'the stored profile is of the last version');
    await vscode.commands.executeCommand('workbench.action.revertAndCloseActiveEditor');
  });

  test('closing the file during a long job: the worker cancels it and drops the file', async function () {
    this.timeout(120_000);
    const { api, uri, key } = await openLongFile('pi-digits-close-file.csv', false);
    ok(await api.workerKeeps(key), 'the worker keeps the finished profile (so dropping it can be seen)');
    await vscode.commands.executeCommand('assay.refresh');
    await waitFor('a second job running in the worker', () => api.jobs(key).started === 2 && api.jobs(key).running === 1);
    await closeTabOf(uri);
    await leftWorker(key);
    ok(api.jobs(key).forgets >= 1, `the worker was told to forget the file (${api.jobs(key).forgets})`);
    await cancelledAndDropped(key, 1);
  });

  test('closing the panel during a long job for the file only it shows: the worker cancels the job', async function () {
    this.timeout(120_000);
    const { api, uri, key, doc } = await openLongFile('pi-digits-close-panel.csv', true);
    // The file leaves its editor; the panel alone still shows it.
    await openFixture('notes.txt');
    await closeTabOf(uri);
    equal(api.panelUri(), key, 'the panel still shows the long file');
    const started = api.jobs(key).started;
    await vscode.commands.executeCommand('assay.refresh');
    await waitFor('a job for the panel\'s file running in the worker', () => api.jobs(key).started === started + 1 && api.jobs(key).running === 1, 30_000);
    await closePanel();
    await leftWorker(key);
    // The workbench keeps the document a while after its tab closes; had it closed now, that would have
    // ended the job instead of the panel.
    ok(!doc.isClosed, 'the document is still open (so the panel closing is what ended the job)');
    await cancelledAndDropped(key, started);
  });
});
