// Keeps the profile of each tracked data file current: profiles at once when a file is first shown,
// again after a short pause in editing (a newer edit cancels the running job), and after a settings
// change. Results are dropped when stale: after every await the job's generation and the document's
// version are compared again. Files VS Code does not hand to extensions (or above a size setting)
// are read from disk by the worker, or through workspace.fs on the web, under a cancellable notification.
import * as vscode from 'vscode';
import type { ProfileInput } from '../../protocol/worker';
import type { Configuration } from '../config/configuration';
import { baseName } from '../data-files';
import type { Platform } from '../platform';
import type { HostProfileResult, RunningJob, WorkerClient } from '../worker/worker-client';
import { WorkerRequestError } from '../worker/worker-client';
import { findMetadata } from './find-metadata';
import type { ProfileStore } from './profile-store';

/** The pause in editing after which a file is profiled again (exported for the workbench suite). */
export const EDIT_DEBOUNCE_MS = 300;
const CHUNK_BYTES = 1 << 20;
/** How long a file with no document yet waits for one before it is read from disk. */
const DOCUMENT_WAIT_MS = 500;

interface Tracked {
  uri: vscode.Uri;
  generation: number;
  job: RunningJob | null;
  timer: ReturnType<typeof setTimeout> | null;
  /** Version of the last job started (so `ensure` does not start the same one twice). */
  startedVersion: number | null;
  /** Generation of the run still preparing or running its job, else null (`ensure` waits for it). */
  runGeneration: number | null;
}

function findDocument(uri: vscode.Uri): vscode.TextDocument | undefined {
  const key = uri.toString();
  return vscode.workspace.textDocuments.find((d) => d.uri.toString() === key);
}

export class DocumentProfiler implements vscode.Disposable {
  private readonly tracked = new Map<string, Tracked>();
  /** Runs begun per URI since activation (kept after untracking; the workbench suite reads it). */
  private readonly runs = new Map<string, number>();
  private readonly subscriptions: vscode.Disposable[] = [];
  private disposed = false;

  constructor(
    private readonly worker: WorkerClient,
    private readonly store: ProfileStore,
    private readonly config: Configuration,
    private readonly platform: Platform,
    private readonly log: vscode.LogOutputChannel,
  ) {
    this.subscriptions.push(
      vscode.workspace.onDidChangeTextDocument((e) => {
        if (e.contentChanges.length > 0) this.edited(e.document);
      }),
      vscode.workspace.onDidCloseTextDocument((d) => this.untrack(d.uri)),
      config.onDidChange((c) => {
        if (c.needs.has('reprofile')) for (const t of this.tracked.values()) void this.run(t);
      }),
      // Saved metadata changes what is declared: profile again the files it may apply to.
      vscode.workspace.onDidSaveTextDocument((d) => {
        if (!/(-metadata|^csv-metadata)\.json$/.test(baseName(d.uri.path))) return;
        for (const t of this.tracked.values()) void this.run(t);
      }),
    );
  }

  get trackedCount(): number {
    return this.tracked.size;
  }

  isTracked(uri: vscode.Uri): boolean {
    return this.tracked.has(uri.toString());
  }

  /** How many runs (each ending in at most one worker job) began for the URI since activation. */
  runCount(uri: string): number {
    return this.runs.get(uri) ?? 0;
  }

  trackedUris(): vscode.Uri[] {
    return [...this.tracked.values()].map((t) => t.uri);
  }

  /** Starts tracking the file and profiles it now unless its current version is done or running. */
  ensure(uri: vscode.Uri): void {
    if (this.disposed) return;
    const key = uri.toString();
    let t = this.tracked.get(key);
    if (t === undefined) {
      t = { uri, generation: 0, job: null, timer: null, startedVersion: null, runGeneration: null };
      this.tracked.set(key, t);
    }
    // An edit's pause is still running: its run comes (a tab turning dirty calls here mid-burst).
    if (t.timer !== null) return;
    const doc = findDocument(uri);
    const version = doc?.version ?? 0;
    // A run still reading the file or finding its metadata has posted no job yet but counts as running
    // (else a restored panel and the active editor, both ensuring at activation, start two runs).
    const running = t.job !== null || t.runGeneration === t.generation;
    if (t.startedVersion === version && (running || this.store.get(key)?.version === version)) return;
    if (doc === undefined) {
      // A tab restored at startup shows the file before its document reaches the extension host: a
      // short wait lets it arrive, so the file is profiled once from it, not from disk and then again.
      // (A file too large to become a document is merely profiled that much later.)
      t.timer = setTimeout(() => {
        t.timer = null;
        void this.run(t);
      }, DOCUMENT_WAIT_MS);
      return;
    }
    void this.run(t);
  }

  /** Profiles the file again now, whatever is stored. */
  refresh(uri: vscode.Uri): void {
    const t = this.tracked.get(uri.toString());
    if (t === undefined) this.ensure(uri);
    else void this.run(t);
  }

  /** Stops tracking: the running job ends, the worker forgets the file, the stored profile goes. */
  untrack(uri: vscode.Uri): void {
    const key = uri.toString();
    const t = this.tracked.get(key);
    if (t === undefined) return;
    this.stopJob(t);
    t.generation++;
    this.tracked.delete(key);
    this.worker.forget(key, findDocument(uri)?.version ?? 0);
    this.store.delete(key);
  }

  private edited(doc: vscode.TextDocument): void {
    const t = this.tracked.get(doc.uri.toString());
    if (t === undefined) return;
    this.stopJob(t);
    t.generation++;
    t.timer = setTimeout(() => {
      t.timer = null;
      void this.run(t);
    }, EDIT_DEBOUNCE_MS);
  }

  private stopJob(t: Tracked): void {
    if (t.timer !== null) { clearTimeout(t.timer); t.timer = null; }
    if (t.job !== null) { t.job.cancel(); t.job = null; this.store.clearProgress(t.uri.toString()); }
  }

  private async run(t: Tracked): Promise<void> {
    if (this.disposed) return;
    this.stopJob(t);
    const generation = ++t.generation;
    t.runGeneration = generation;
    const key = t.uri.toString();
    this.runs.set(key, (this.runs.get(key) ?? 0) + 1);
    const doc = findDocument(t.uri);
    const version = doc?.version ?? 0;
    t.startedVersion = version;
    const settings = this.config.settings;
    const stale = (): boolean => this.disposed || t.generation !== generation || this.tracked.get(key) !== t
      || (doc !== undefined && (doc.isClosed || doc.version !== version));
    try {
      let input: ProfileInput | null = null;
      let size: number;
      const text = doc?.getText();
      const fromDisk = doc === undefined || text === undefined
        || (!doc.isDirty && !doc.isUntitled && text.length > settings.largeFileAboveBytes);
      if (!fromDisk) {
        input = { kind: 'text', text };
        size = text.length;
      } else {
        const stat = await vscode.workspace.fs.stat(t.uri);
        if (stale()) return;
        size = stat.size;
        const path = this.platform.filePath(t.uri);
        if (path !== null) input = { kind: 'path', path };
      }
      const request = async (onProgress: (fraction: number | null) => void, token: vscode.CancellationToken | null): Promise<HostProfileResult | null> => {
        if (input === null) {
          // No path the worker can open (the web, or a non-file scheme): read through workspace.fs.
          const bytes = await vscode.workspace.fs.readFile(t.uri);
          if (stale() || token?.isCancellationRequested) return null;
          input = { kind: 'bytes', bytes };
        }
        const metadata = await findMetadata(t.uri, settings.metadataPath);
        if (stale() || token?.isCancellationRequested) return null;
        this.store.setProgress(key, version, 0);
        const job = this.worker.profile({
          uri: key, version, name: baseName(t.uri.path), size, options: settings.wire, input,
          firstPass: size > settings.firstPassAboveBytes ? settings.firstPassRecords : null,
          chunkBytes: CHUNK_BYTES,
          metadata,
        }, {
          onProgress: (read, total) => {
            if (stale()) return;
            const fraction = total !== null && total > 0 ? read / total : null;
            this.store.setProgress(key, version, fraction);
            onProgress(fraction);
          },
          onFirstPass: (r) => {
            if (!stale()) this.store.set({ uri: key, version, profile: r.profile, index: r.index, partial: true, via: fromDisk ? 'disk' : 'document' });
          },
        });
        t.job = job;
        token?.onCancellationRequested(() => { if (t.job === job) this.stopJob(t); });
        try {
          return await job.result;
        } finally {
          if (t.job === job) t.job = null;
        }
      };
      const result = fromDisk ? await this.withNotification(t.uri, request) : await request(() => undefined, null);
      if (result === null || stale()) return;
      this.store.set({ uri: key, version, profile: result.profile, index: result.index, partial: false, via: fromDisk ? 'disk' : 'document' });
    } catch (e) {
      if (e instanceof WorkerRequestError && e.reason === 'cancelled') return;
      const message = e instanceof Error ? e.message : String(e);
      this.log.error(`profiling ${key} (version ${version}) failed: ${message}`);
      if (!stale()) this.store.setFailed(key, version, message);
    } finally {
      if (t.runGeneration === generation) t.runGeneration = null;
    }
  }

  private withNotification<T>(uri: vscode.Uri, work: (onProgress: (fraction: number | null) => void, token: vscode.CancellationToken) => Promise<T>): Promise<T> {
    return Promise.resolve(vscode.window.withProgress({
      location: vscode.ProgressLocation.Notification,
      title: `Assay: profiling ${baseName(uri.path)}`,
      cancellable: true,
    }, (progress, token) => {
      let reported = 0;
      return work((fraction) => {
        if (fraction === null) return;
        const pct = Math.floor(fraction * 100);
        if (pct > reported) { progress.report({ increment: pct - reported, message: `${pct}%` }); reported = pct; }
      }, token);
    }));
  }

  dispose(): void {
    this.disposed = true;
    for (const t of this.tracked.values()) this.stopJob(t);
    this.tracked.clear();
    for (const s of this.subscriptions) s.dispose();
  }
}
