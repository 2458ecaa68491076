// The one place the extension reads its settings: once at start and once per change of `assay.*`.
// Bad values are reported once in a warning and replaced by their defaults (see parse-settings.ts).
import * as vscode from 'vscode';
import type { ChangeNeed } from './settings-table';
import { changeNeeds, parseSettings } from './parse-settings';
import type { AssaySettings } from './parse-settings';

export interface SettingsChange {
  settings: AssaySettings;
  needs: Set<ChangeNeed>;
}

export class Configuration implements vscode.Disposable {
  private current: AssaySettings;
  private readonly changed = new vscode.EventEmitter<SettingsChange>();
  private readonly subscription: vscode.Disposable;
  readonly onDidChange = this.changed.event;

  constructor() {
    this.current = this.read();
    this.subscription = vscode.workspace.onDidChangeConfiguration((e) => {
      if (!e.affectsConfiguration('assay')) return;
      const before = this.current;
      this.current = this.read();
      const needs = changeNeeds(before, this.current);
      if (needs.size > 0) this.changed.fire({ settings: this.current, needs });
    });
  }

  get settings(): AssaySettings {
    return this.current;
  }

  private read(): AssaySettings {
    const config = vscode.workspace.getConfiguration('assay');
    const { settings, problems } = parseSettings((key) => config.get(key));
    if (problems.length > 0) {
      void vscode.window.showWarningMessage(`Assay settings: ${problems.join(' · ')}`);
    }
    return settings;
  }

  dispose(): void {
    this.subscription.dispose();
    this.changed.dispose();
  }
}
