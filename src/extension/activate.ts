// The composition root, shared by the desktop and the web entries: builds every service once, wires
// them together and puts each in the disposal list of its lifetime. The platform supplies only how
// to start a worker and how a large file reaches it.
import * as vscode from 'vscode';
import { objectArgument, stringMember } from './commands/command-args';
import { registerCommands } from './commands/register-commands';
import { Configuration } from './config/configuration';
import { CopyCommands, commandTarget, pickColumn, storedFor } from './copy/copy-commands';
import { FlagDiagnostics } from './diagnostics/flag-diagnostics';
import { registerQuickFixes } from './diagnostics/quick-fix-provider';
import { activeDataUri, dataUrisInTabs } from './editor/active-data-file';
import { isDataLanguage } from './data-files';
import { registerHovers } from './hover/cell-hover-provider';
import { FlagNavigator } from './navigation/flag-navigator';
import { followCursor } from './panel/follow-cursor';
import { PanelManager } from './panel/panel-manager';
import type { Platform } from './platform';
import { DocumentProfiler } from './profiling/document-profiler';
import { JobLedger } from './profiling/job-ledger';
import { ProfileStore } from './profiling/profile-store';
import { ReportSaver } from './report/save-report';
import { StatusBar } from './status/status-bar';
import { createTestApi } from './test-api';
import type { AssayExports } from './test-api';
import { DisposableList } from './util/disposable-list';
import { countedStart } from './worker/counted-start';
import { WorkerClient } from './worker/worker-client';

export function activateAssay(context: vscode.ExtensionContext, platform: Platform): AssayExports {
  const extension = new DisposableList();
  context.subscriptions.push(extension);

  const log = extension.add(vscode.window.createOutputChannel('Assay', { log: true }));
  const config = extension.add(new Configuration());
  const jobs = new JobLedger();
  const workers = countedStart(jobs.watch(platform.workerStarter(context.extensionUri)));
  const worker = extension.add(new WorkerClient(workers.start));
  const store = extension.add(new ProfileStore());
  const profiler = extension.add(new DocumentProfiler(worker, store, config, platform, log));
  const status = extension.add(new StatusBar(store));
  // The panel's "Save report" goes through the same saver as the command (bound once both exist).
  // Called only after `reports` below exists (the panel cannot post before it is created).
  const saveReport = (uri: vscode.Uri): Promise<unknown> => reports.save('markdown', { uri: uri.toString() });
  const panels = extension.add(new PanelManager({ extensionUri: context.extensionUri, store, worker, config, log, saveReport }, profiler));
  const reports = new ReportSaver({ store, config, panels });
  const copies = new CopyCommands({ store, config, panels, worker });
  const navigator = new FlagNavigator(store);
  extension.add(new FlagDiagnostics(store, config));
  extension.add(registerQuickFixes(store));
  extension.add(registerHovers(store, worker, config));

  /** Opens the panel on the file and its column (a hover link names both; else the user picks the column). */
  const showColumn = async (raw: unknown): Promise<void> => {
    const uri = commandTarget(raw, panels);
    const stored = storedFor(store, uri);
    if (uri === undefined || stored === undefined) return;
    const column = stringMember(objectArgument(raw), 'column') ?? await pickColumn(panels, stored, stored.profile.columns, 'Assay: show which column in the profile?');
    if (column === undefined || !stored.profile.columns.some((c) => c.name === column)) return;
    panels.open(uri);
    panels.current?.focusColumn(uri.toString(), column);
  };

  /** Files still needed: shown in a tab, or shown by the panel. The rest are dropped. */
  const release = (): void => {
    const needed = new Set(dataUrisInTabs().map((u) => u.toString()));
    const shown = panels.uri;
    if (shown !== undefined) needed.add(shown);
    for (const uri of profiler.trackedUris()) if (!needed.has(uri.toString())) profiler.untrack(uri);
    // No file to keep current and no panel: the worker is not needed (it restarts on the next job).
    if (profiler.trackedCount === 0 && panels.current === undefined) worker.stop('worker: nothing left to profile');
  };

  const onActive = (): void => {
    const uri = activeDataUri();
    if (uri !== undefined) {
      profiler.ensure(uri);
      panels.follow(uri);
    }
    status.show(uri);
  };

  extension.add(store.onDidChange(() => status.update()));
  extension.add(vscode.window.onDidChangeActiveTextEditor(onActive));
  extension.add(vscode.window.tabGroups.onDidChangeTabs(() => { onActive(); release(); }));
  extension.add(vscode.window.onDidChangeVisibleTextEditors((editors) => {
    for (const e of editors) if (isDataLanguage(e.document.languageId)) profiler.ensure(e.document.uri);
  }));
  extension.add(panels.onDidChange(release));
  extension.add(followCursor(panels, store));
  for (const d of registerCommands({
    'assay.openPanel': () => panels.open(),
    'assay.refresh': () => {
      const uri = activeDataUri() ?? (panels.uri !== undefined ? vscode.Uri.parse(panels.uri) : undefined);
      if (uri !== undefined) profiler.refresh(uri);
    },
    'assay.nextFlag': (args) => navigator.go(1, args),
    'assay.previousFlag': (args) => navigator.go(-1, args),
    'assay.listFlags': (args) => navigator.list(args),
    'assay.limitFlagNavigation': (args) => navigator.limitTo(args),
    'assay.showColumn': showColumn,
    'assay.copySummary': (args) => copies.run('summary', args),
    'assay.copyColumnSummary': (args) => copies.run('column', args),
    'assay.copyFrequencyTable': (args) => copies.run('frequencies', args),
    'assay.copyGroupedTable': (args) => copies.run('grouped', args),
    'assay.copyGroupComparison': (args) => copies.run('groups', args),
    'assay.copyFlags': (args) => copies.run('flags', args),
    'assay.saveReport': (args) => reports.save('markdown', args),
    'assay.saveHtmlReport': (args) => reports.save('html', args),
    'assay.writeMetadata': (args) => reports.save('metadata', args),
  })) extension.add(d);

  onActive();
  for (const e of vscode.window.visibleTextEditors) if (isDataLanguage(e.document.languageId)) profiler.ensure(e.document.uri);
  const testApi = createTestApi({ store, panels, status, liveWorkers: () => workers.live(), jobs, profiler, worker });
  extension.add(testApi.subscription);

  return { __test: testApi.api };
}
