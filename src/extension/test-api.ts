// What activate() returns. Internal: only the workbench suite reads it, to see what the user would
// see (the panel's own report of what it rendered, the status bar text) and what is left running.
import type { Profile } from '../core/profile/types';
import type { PanelManager } from './panel/panel-manager';
import type { RenderedInfo } from './panel/profile-panel';
import type { DocumentProfiler } from './profiling/document-profiler';
import type { JobCounts, JobLedger } from './profiling/job-ledger';
import type { ProfileStore } from './profiling/profile-store';
import type { StatusBar } from './status/status-bar';
import type { Disposable } from './util/disposable-list';
import type { WorkerClient } from './worker/worker-client';
import { WorkerRequestError } from './worker/worker-client';

export interface AssayTestApi {
  /** The last `rendered` message a panel posted (kept after the panel closes). */
  lastRendered(): RenderedInfo | undefined;
  /** How many times the open panel has rendered (its page renders again after being hidden). */
  panelRenderCount(): number;
  /** Workers started and not yet ended. */
  workerCount(): number;
  /** The stored profile for a document URI (string form), with the version it was made from. */
  profileFor(uri: string): { version: number; partial: boolean; via: 'document' | 'disk'; profile: Profile } | undefined;
  /** Profiles stored for a URI so far, oldest first (first passes included; the last 50). */
  profileHistory(uri: string): { version: number; partial: boolean; rows: number }[];
  /** The status bar item's text, or undefined while it is hidden. */
  statusBarText(): string | undefined;
  /** The URI the open panel shows, or undefined when no panel is open. */
  panelUri(): string | undefined;
  /** The column the open panel has open (as the host last told it or heard from it), or null. */
  panelColumn(): string | null | undefined;
  /** Hands a message to the open panel's handler as if its webview had posted it. */
  panelMessage(message: unknown): Promise<void>;
  /** Profiling jobs for a URI since activation, as read off the wire to the worker. */
  jobs(uri: string): JobCounts;
  /** Jobs the worker holds (running or asked to stop and not yet ended), over every document. */
  jobsInWorker(): number;
  /** Runs the profiler began for a URI since activation (each posts at most one job). */
  profilerRuns(uri: string): number;
  /** Whether the worker still keeps a profile session for the URI (asks it; false with no worker alive). */
  workerKeeps(uri: string): Promise<boolean>;
}

export interface AssayExports {
  /** @internal for the workbench tests; not a public API. */
  readonly __test: AssayTestApi;
}

interface TestApiDeps {
  store: ProfileStore;
  panels: PanelManager;
  status: StatusBar;
  liveWorkers(): number;
  jobs: JobLedger;
  profiler: DocumentProfiler;
  worker: WorkerClient;
}

/** Builds the test API; the returned disposable ends its bookkeeping (the profile history). */
export function createTestApi(deps: TestApiDeps): { api: AssayTestApi; subscription: Disposable } {
  const { store, panels, status } = deps;
  const history = new Map<string, { version: number; partial: boolean; rows: number }[]>();
  const subscription = store.onDidChange((e) => {
    if (e.kind === 'removed') { history.delete(e.uri); return; }
    if (e.kind !== 'profile') return;
    const list = history.get(e.stored.uri) ?? [];
    list.push({ version: e.stored.version, partial: e.stored.partial, rows: e.stored.profile.rows });
    history.set(e.stored.uri, list.slice(-50));
  });
  const api: AssayTestApi = {
    lastRendered: () => panels.rendered,
    panelRenderCount: () => panels.current?.renderCount ?? 0,
    workerCount: () => deps.liveWorkers(),
    profileFor: (uri) => {
      const s = store.get(uri);
      return s === undefined ? undefined : { version: s.version, partial: s.partial, via: s.via, profile: s.profile };
    },
    profileHistory: (uri) => [...(history.get(uri) ?? [])],
    statusBarText: () => status.text,
    panelUri: () => panels.uri,
    panelColumn: () => panels.current?.column,
    panelMessage: (m) => panels.current?.receive(m) ?? Promise.resolve(),
    jobs: (uri) => deps.jobs.of(uri),
    jobsInWorker: () => deps.jobs.inWorker,
    profilerRuns: (uri) => deps.profiler.runCount(uri),
    workerKeeps: (uri) => workerKeeps(deps.worker, uri),
  };
  return { api, subscription };
}

/**
 * Asks the worker where 0 stands in a column of the document: it answers `no-profile` exactly when it
 * keeps no session for the URI (any other answer, an unknown column's included, means it keeps one).
 * With no worker alive nothing is kept, and no worker is started to ask.
 */
async function workerKeeps(worker: WorkerClient, uri: string): Promise<boolean> {
  if (!worker.alive) return false;
  try {
    await worker.standing(uri, 0, '', 0, 10_000);
    return true;
  } catch (e) {
    if (e instanceof WorkerRequestError && e.reason === 'no-profile') return false;
    if (e instanceof WorkerRequestError && e.reason === 'error') return true;
    throw e;
  }
}
