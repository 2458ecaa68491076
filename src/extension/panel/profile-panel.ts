// One profile panel (a WebviewPanel) for its whole lifetime: the page with a strict CSP and a fresh
// nonce, the `ready` handshake before anything is posted, the file it currently shows, and the
// panel's messages (each checked with the protocol's guard: a webview is untrusted input).
import * as vscode from 'vscode';
import { isPanelToHost } from '../../protocol/webview';
import type { HostToPanel, PanelToHost } from '../../protocol/webview';
import type { Configuration } from '../config/configuration';
import { baseName } from '../data-files';
import { revealCell } from '../editor/reveal-cell';
import type { ProfileStore } from '../profiling/profile-store';
import { DisposableList } from '../util/disposable-list';
import type { WorkerClient } from '../worker/worker-client';
import { copyMarkdown } from '../copy/copy-markdown';
import { renderCopy } from '../copy/render-copy';
import type { GroupComparison, GroupedTable } from '../../core/profile/types';
import { makeNonce, panelHtml } from './panel-html';

export const PANEL_VIEW_TYPE = 'assay.panel';

export type RenderedInfo = Extract<PanelToHost, { type: 'rendered' }>;
export type CopyRequest = Extract<PanelToHost, { type: 'copy' }>;

export interface PanelDeps {
  extensionUri: vscode.Uri;
  store: ProfileStore;
  worker: WorkerClient;
  config: Configuration;
  log: vscode.LogOutputChannel;
  /** Writes the whole report as a document and opens it (the panel's "Save report"). */
  saveReport?(uri: vscode.Uri): Promise<unknown>;
}

/** Webview options: scripts on, resources only from the extension's dist/ and media/. */
export function panelOptions(extensionUri: vscode.Uri): vscode.WebviewOptions & vscode.WebviewPanelOptions {
  return {
    enableScripts: true,
    enableFindWidget: true,
    localResourceRoots: [vscode.Uri.joinPath(extensionUri, 'dist'), vscode.Uri.joinPath(extensionUri, 'media')],
  };
}

export class ProfilePanel implements vscode.Disposable {
  private readonly lifetime = new DisposableList();
  private ready = false;
  private current: string | undefined;
  private selectedColumn: string | null = null;
  private rendered: RenderedInfo | undefined;
  private renders = 0;
  /** Tables the panel shows beyond the profile's own (re-binned columns, group comparisons), for copying. */
  private readonly shownGrouped = new Map<string, GroupedTable>();
  private readonly shownComparisons = new Map<string, GroupComparison>();
  private readonly disposedEmitter = new vscode.EventEmitter<void>();
  readonly onDidDispose = this.disposedEmitter.event;

  constructor(readonly panel: vscode.WebviewPanel, private readonly deps: PanelDeps) {
    const webview = panel.webview;
    webview.options = panelOptions(deps.extensionUri);
    const dist = vscode.Uri.joinPath(deps.extensionUri, 'dist');
    webview.html = panelHtml({
      cspSource: webview.cspSource,
      nonce: makeNonce(),
      scriptUri: webview.asWebviewUri(vscode.Uri.joinPath(dist, 'webview.js')).toString(),
      styleUris: [webview.asWebviewUri(vscode.Uri.joinPath(dist, 'panel.css')).toString()],
    });
    this.lifetime.add(webview.onDidReceiveMessage((m: unknown) => void this.receive(m)));
    this.lifetime.add(deps.store.onDidChange((e) => {
      const uri = e.kind === 'profile' ? e.stored.uri : e.uri;
      if (uri !== this.current) return;
      // Only what changed: a progress tick must not re-send the whole profile.
      if (e.kind === 'profile') { this.postProfile(uri); this.postProgress(uri); }
      else if (e.kind === 'progress') this.postProgress(uri);
      else if (e.kind === 'failed') this.post({ type: 'failed', uri, version: e.version, message: e.message });
    }));
    this.lifetime.add(deps.config.onDidChange((c) => {
      if (c.needs.has('render')) this.postCurrent();
    }));
    // Hidden, the page is unloaded (no retainContextWhenHidden): it says `ready` again when shown.
    this.lifetime.add(panel.onDidChangeViewState((e) => { if (!e.webviewPanel.visible) this.ready = false; }));
    this.lifetime.add(panel.onDidDispose(() => this.dispose()));
  }

  /** The file the panel shows (its URI string), if any. */
  get uri(): string | undefined {
    return this.current;
  }

  get lastRendered(): RenderedInfo | undefined {
    return this.rendered;
  }

  /** How many `rendered` reports this panel has sent (each load of the page renders again). */
  get renderCount(): number {
    return this.renders;
  }

  get column(): string | null {
    return this.selectedColumn;
  }

  show(uri: vscode.Uri): void {
    const key = uri.toString();
    if (key === this.current) return;
    this.current = key;
    this.selectedColumn = null;
    this.shownGrouped.clear();
    this.shownComparisons.clear();
    this.panel.title = `Profile: ${baseName(uri.path)}`;
    this.postCurrent();
  }

  /** The grouped table the panel shows for a column after a re-bin, if any (copies use it). */
  shownGroupedTable(column: string): GroupedTable | undefined {
    return this.shownGrouped.get(column);
  }

  /** A group comparison the panel shows, if any. */
  shownComparison(numeric: string, by: string): GroupComparison | undefined {
    return this.shownComparisons.get(`${numeric}\u0000${by}`);
  }

  /** The editor's cursor moved into another column of the shown file: the panel opens it. */
  focusColumn(uri: string, column: string): void {
    if (uri !== this.current || column === this.selectedColumn) return;
    this.selectedColumn = column;
    this.post({ type: 'focus-column', uri, column });
  }

  /** Handles a message as if the webview had sent it (the workbench test drives reveal this way). */
  receive(m: unknown): Promise<void> {
    if (!isPanelToHost(m)) {
      this.deps.log.warn('ignored a malformed message from the panel');
      return Promise.resolve();
    }
    return this.handle(m).catch((e: unknown) => {
      this.deps.log.error(`panel message ${m.type} failed: ${e instanceof Error ? e.message : String(e)}`);
    });
  }

  private async handle(m: PanelToHost): Promise<void> {
    switch (m.type) {
      case 'ready':
        this.ready = true;
        this.postCurrent();
        return;
      case 'rendered':
        this.rendered = m;
        this.renders++;
        return;
      case 'select-column':
        if (m.uri === this.current) this.selectedColumn = m.column;
        return;
      case 'reveal': {
        const stored = this.deps.store.get(m.uri);
        if (stored !== undefined) await revealCell(vscode.Uri.parse(m.uri), stored, m.row, m.field);
        return;
      }
      case 'copy':
        await this.copy(m);
        return;
      case 'request-bins': {
        try {
          const r = await this.deps.worker.rebin(m.uri, m.version, m.column, m.bins);
          if (r.grouped !== null && m.uri === this.current) this.shownGrouped.set(m.column, r.grouped);
          this.post({ type: 'bins-result', uri: m.uri, version: r.version, requestId: m.requestId, column: r.column, histogram: r.histogram, grouped: r.grouped });
        } catch (e) {
          this.post({ type: 'bins-result', uri: m.uri, version: m.version, requestId: m.requestId, column: m.column, histogram: null, grouped: null, error: errorText(e) });
        }
        return;
      }
      case 'request-groups': {
        try {
          const r = await this.deps.worker.groups(m.uri, m.version, m.numeric, m.by);
          if (r.comparison !== null && m.uri === this.current) this.shownComparisons.set(`${m.numeric}\u0000${m.by}`, r.comparison);
          this.post({ type: 'groups-result', uri: m.uri, version: r.version, requestId: m.requestId, comparison: r.comparison });
        } catch (e) {
          this.post({ type: 'groups-result', uri: m.uri, version: m.version, requestId: m.requestId, comparison: null, error: errorText(e) });
        }
        return;
      }
    }
  }

  private async copy(m: CopyRequest): Promise<void> {
    // The protocol's `report` target writes the report as a document rather than copying it.
    if (m.target === 'report' && this.deps.saveReport !== undefined) {
      await this.deps.saveReport(vscode.Uri.parse(m.uri));
      return;
    }
    const stored = this.deps.store.get(m.uri);
    if (stored === undefined) {
      void vscode.window.showInformationMessage('Assay: that profile is no longer available; open the file again to copy from it.');
      return;
    }
    const settings = this.deps.config.settings;
    const same = m.uri === this.current;
    await copyMarkdown(renderCopy(m, {
      profile: stored.profile,
      fileLabel: vscode.workspace.asRelativePath(vscode.Uri.parse(m.uri)),
      significantDigits: settings.significantDigits,
      rules: settings.options.rules,
      grouped: (column) => (same ? this.shownGrouped.get(column) : undefined),
      comparison: (numeric, by) => (same ? this.shownComparisons.get(`${numeric}\u0000${by}`) : undefined),
    }));
  }

  /** Posts everything the panel should show for the current file: its profile, progress or failure. */
  private postCurrent(): void {
    const uri = this.current;
    if (!this.ready || uri === undefined) return;
    const posted = this.postProfile(uri);
    // A column chosen from the editor while the page was loading (or hidden) is opened now.
    if (posted && this.selectedColumn !== null) this.post({ type: 'focus-column', uri, column: this.selectedColumn });
    const busy = this.postProgress(uri);
    const failure = this.deps.store.failure(uri);
    if (!posted && !busy && failure !== undefined) this.post({ type: 'failed', uri, version: failure.version, message: failure.message });
  }

  private postProfile(uri: string): boolean {
    const stored = this.deps.store.get(uri);
    if (stored === undefined) return false;
    const settings = this.deps.config.settings;
    this.post({
      type: 'profile', uri, version: stored.version, fileLabel: vscode.workspace.asRelativePath(vscode.Uri.parse(uri)),
      profile: stored.profile,
      settings: { significantDigits: settings.significantDigits, bins: settings.options.bins, edges: settings.options.edges },
    });
    return true;
  }

  private postProgress(uri: string): boolean {
    const busy = this.deps.store.progress(uri);
    if (busy === undefined) return false;
    const pct = busy.fraction === null ? '' : ` ${Math.round(busy.fraction * 100)}%`;
    this.post({ type: 'progress', uri, version: busy.version, fraction: busy.fraction, message: `Profiling${pct}` });
    return true;
  }

  private post(m: HostToPanel): void {
    if (!this.ready) return;
    void this.panel.webview.postMessage(m);
  }

  dispose(): void {
    if (this.lifetime.isDisposed) return;
    this.lifetime.dispose();
    this.panel.dispose();
    this.disposedEmitter.fire();
    this.disposedEmitter.dispose();
  }
}

function errorText(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}
