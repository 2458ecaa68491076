// At most one profile panel: opened beside the active data file without taking focus, following
// the active data editor (a non-data editor leaves it on the last file, which its label names), and
// restored after a reload by the serializer from the file URI the panel saved in its state.
import * as vscode from 'vscode';
import { activeDataUri } from '../editor/active-data-file';
import type { DocumentProfiler } from '../profiling/document-profiler';
import { Emitter } from '../util/emitter';
import { PANEL_VIEW_TYPE, ProfilePanel, panelOptions } from './profile-panel';
import type { PanelDeps, RenderedInfo } from './profile-panel';

function savedUri(state: unknown): vscode.Uri | undefined {
  if (typeof state !== 'object' || state === null) return undefined;
  const uri = (state as { uri?: unknown }).uri;
  if (typeof uri !== 'string') return undefined;
  try {
    return vscode.Uri.parse(uri, true);
  } catch {
    return undefined;
  }
}

export class PanelManager implements vscode.Disposable {
  private panel: ProfilePanel | undefined;
  private lastRendered: RenderedInfo | undefined;
  private readonly changed = new Emitter<void>();
  private readonly subscriptions: vscode.Disposable[] = [];
  /** Fires when a panel opens or closes. */
  readonly onDidChange = this.changed.event;

  constructor(private readonly deps: PanelDeps, private readonly profiler: DocumentProfiler) {
    this.subscriptions.push(
      vscode.window.registerWebviewPanelSerializer(PANEL_VIEW_TYPE, {
        deserializeWebviewPanel: async (panel, state: unknown) => {
          this.adopt(panel, savedUri(state) ?? activeDataUri());
        },
      }),
    );
  }

  get current(): ProfilePanel | undefined {
    return this.panel;
  }

  /** The file the open panel shows. */
  get uri(): string | undefined {
    return this.panel?.uri;
  }

  /** The last `rendered` report from any panel (kept after it closes, for the workbench test). */
  get rendered(): RenderedInfo | undefined {
    return this.panel?.lastRendered ?? this.lastRendered;
  }

  /** Opens the panel beside the active data file (or reveals it), keeping the focus in the editor. */
  open(uri: vscode.Uri | undefined = activeDataUri()): void {
    if (this.panel !== undefined) {
      this.panel.panel.reveal(undefined, true);
    } else {
      const panel = vscode.window.createWebviewPanel(PANEL_VIEW_TYPE, 'Profile', { viewColumn: vscode.ViewColumn.Beside, preserveFocus: true }, panelOptions(this.deps.extensionUri));
      this.adopt(panel, uri);
    }
    if (uri !== undefined) this.follow(uri);
  }

  /** The active data file changed: the panel shows it. */
  follow(uri: vscode.Uri): void {
    if (this.panel === undefined) return;
    this.profiler.ensure(uri);
    this.panel.show(uri);
  }

  private adopt(webviewPanel: vscode.WebviewPanel, uri: vscode.Uri | undefined): void {
    this.panel?.dispose();
    const panel = new ProfilePanel(webviewPanel, this.deps);
    this.panel = panel;
    panel.onDidDispose(() => {
      if (this.panel !== panel) return;
      this.lastRendered = panel.lastRendered;
      this.panel = undefined;
      this.changed.fire();
    });
    this.changed.fire();
    if (uri !== undefined) this.follow(uri);
  }

  dispose(): void {
    this.panel?.dispose();
    this.panel = undefined;
    for (const s of this.subscriptions) s.dispose();
    this.changed.dispose();
  }
}
