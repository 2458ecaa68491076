// Flags as problems on their exact cells: one diagnostic per shown flag (source "Assay", code the
// rule id, severity the flag's), at most `assay.diagnostics.max` per file plus one on the header
// saying how many more there are. Updated when an exact profile arrives and at once when a setting
// changes (a rule switched off disappears before the new profile); cleared when the file goes.
import * as vscode from 'vscode';
import { diagnosticFlags, moreFlagsMessage } from '../../core/editor/diagnostic-flags';
import type { Flag, Severity } from '../../core/profile/types';
import type { Configuration } from '../config/configuration';
import { cellRange, spanToRange } from '../editor/reveal-cell';
import type { ProfileStore, StoredProfile } from '../profiling/profile-store';

export const DIAGNOSTIC_SOURCE = 'Assay';
/** Code of the summary problem on the header. */
export const MORE_FLAGS_CODE = 'more-flags';

const SEVERITY: Record<Severity, vscode.DiagnosticSeverity> = {
  error: vscode.DiagnosticSeverity.Error,
  warning: vscode.DiagnosticSeverity.Warning,
  information: vscode.DiagnosticSeverity.Information,
  hint: vscode.DiagnosticSeverity.Hint,
};

function openDocument(uri: string): vscode.TextDocument | undefined {
  return vscode.workspace.textDocuments.find((d) => d.uri.toString() === uri);
}

export class FlagDiagnostics implements vscode.Disposable {
  private readonly collection = vscode.languages.createDiagnosticCollection('assay');
  private readonly subscriptions: vscode.Disposable[] = [];

  constructor(private readonly store: ProfileStore, private readonly config: Configuration) {
    this.subscriptions.push(
      store.onDidChange((e) => {
        // A first pass is not final: its flags come from the start of the file only.
        if (e.kind === 'profile' && !e.stored.partial) this.update(e.stored);
        else if (e.kind === 'removed') this.collection.delete(vscode.Uri.parse(e.uri));
      }),
      config.onDidChange(() => {
        for (const stored of this.store.all()) if (!stored.partial) this.update(stored);
      }),
    );
  }

  private update(stored: StoredProfile): void {
    const uri = vscode.Uri.parse(stored.uri);
    const settings = this.config.settings;
    const plan = diagnosticFlags(stored.profile, { enabled: settings.options.rules.enabled, max: settings.maxDiagnostics });
    const doc = openDocument(stored.uri);
    const out: vscode.Diagnostic[] = [];
    for (const f of plan.shown) {
      const range = this.rangeOf(doc, stored, f);
      if (range !== undefined) out.push(toDiagnostic(range, f));
    }
    if (plan.notShown > 0) {
      const header = doc !== undefined && doc.lineCount > 0 ? doc.lineAt(0).range : new vscode.Range(0, 0, 0, 0);
      const d = new vscode.Diagnostic(header, moreFlagsMessage(plan.notShown, settings.maxDiagnostics), vscode.DiagnosticSeverity.Information);
      d.source = DIAGNOSTIC_SOURCE;
      d.code = MORE_FLAGS_CODE;
      out.push(d);
    }
    this.collection.set(uri, out);
  }

  private rangeOf(doc: vscode.TextDocument | undefined, stored: StoredProfile, f: Flag): vscode.Range | undefined {
    if (f.span !== undefined) return spanToRange(f.span);
    // Not placed by the engine (no bytes to read back): the record's cell, found by scanning it.
    if (doc !== undefined) return cellRange(doc, stored, f.row, f.field);
    return new vscode.Range(f.line - 1, 0, f.line - 1, 0);
  }

  dispose(): void {
    for (const s of this.subscriptions) s.dispose();
    this.collection.dispose();
  }
}

function toDiagnostic(range: vscode.Range, f: Flag): vscode.Diagnostic {
  const severity = Object.hasOwn(SEVERITY, f.severity) ? SEVERITY[f.severity] : vscode.DiagnosticSeverity.Hint;
  const d = new vscode.Diagnostic(range, f.message, severity);
  d.source = DIAGNOSTIC_SOURCE;
  d.code = f.rule;
  return d;
}
