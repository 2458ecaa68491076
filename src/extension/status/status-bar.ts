// The status bar item for the active data file: records and flags; a click opens the panel.
import * as vscode from 'vscode';
import type { ProfileStore } from '../profiling/profile-store';
import { statusText } from './status-text';

export class StatusBar implements vscode.Disposable {
  private readonly item = vscode.window.createStatusBarItem('assay.status', vscode.StatusBarAlignment.Right, 100);
  private uri: string | undefined;

  constructor(private readonly store: ProfileStore) {
    this.item.name = 'Assay';
    this.item.command = 'assay.openPanel';
  }

  /** The text shown, or undefined when hidden (read by the workbench test). */
  get text(): string | undefined {
    return this.uri === undefined ? undefined : this.item.text;
  }

  /** Shows the item for this file (undefined hides it). */
  show(uri: vscode.Uri | undefined): void {
    this.uri = uri?.toString();
    this.update();
  }

  update(): void {
    if (this.uri === undefined) { this.item.hide(); return; }
    const stored = this.store.get(this.uri);
    const busy = this.store.progress(this.uri);
    if (stored !== undefined) {
      this.item.text = `$(graph) ${statusText(stored.profile)}${busy !== undefined ? ' $(sync~spin)' : ''}`;
      this.item.tooltip = stored.partial ? 'Assay: first pass; the exact profile follows. Click to open the profile.' : 'Assay: click to open the profile beside the file.';
    } else if (busy !== undefined) {
      this.item.text = '$(sync~spin) Assay: profiling';
      this.item.tooltip = 'Assay is profiling this file.';
    } else {
      this.item.text = '$(graph) Assay';
      this.item.tooltip = 'Assay: click to open the profile beside the file.';
    }
    this.item.show();
  }

  dispose(): void {
    this.item.dispose();
  }
}
