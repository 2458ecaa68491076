// Saves the whole profile as a document: the Markdown report (the same text as the CLI's
// `--format markdown`) or the self-contained HTML report, beside the data file or where the user
// picks, never over the data file; the saved report is then opened in an editor.
import * as vscode from 'vscode';
import { metadataFromProfile } from '../../core/csvw/metadata-from-profile';
import { renderHtmlReport } from '../../core/html';
import { renderReport } from '../../core/markdown';
import { objectArgument, uriArgument } from '../commands/command-args';
import type { Configuration } from '../config/configuration';
import { commandTarget, storedFor } from '../copy/copy-commands';
import type { PanelManager } from '../panel/panel-manager';
import type { ProfileStore } from '../profiling/profile-store';
import { isSameFile, reportPath, REPORT_EXTENSIONS } from './report-file-name';
import type { ReportFormat } from './report-file-name';

export interface ReportDeps {
  store: ProfileStore;
  config: Configuration;
  panels: PanelManager;
}

const FILTERS: Record<ReportFormat, Record<string, string[]>> = {
  markdown: { Markdown: [REPORT_EXTENSIONS.markdown] },
  html: { HTML: [REPORT_EXTENSIONS.html] },
  metadata: { 'CSV on the Web metadata': [REPORT_EXTENSIONS.metadata] },
};

const TITLES: Record<ReportFormat, string> = { markdown: 'Markdown report', html: 'HTML report', metadata: 'CSV on the Web metadata' };

export class ReportSaver {
  constructor(private readonly deps: ReportDeps) {}

  /**
   * Arguments (all optional): `uri` the data file; `to` where to write, skipping the save dialog
   * (the tests use it). Returns where the report was written, or undefined when nothing was.
   */
  async save(format: ReportFormat, raw: unknown): Promise<vscode.Uri | undefined> {
    const data = commandTarget(raw, this.deps.panels);
    const stored = storedFor(this.deps.store, data);
    if (data === undefined || stored === undefined) return undefined;
    const beside = data.with({ path: reportPath(data.path, format) });
    const to = uriArgument(objectArgument(raw).to) ?? await vscode.window.showSaveDialog({
      defaultUri: beside,
      filters: FILTERS[format],
      saveLabel: format === 'metadata' ? 'Write Metadata' : 'Save Report',
      title: `Assay: save the ${TITLES[format]} of ${vscode.workspace.asRelativePath(data)}`,
    });
    if (to === undefined) return undefined;
    if (isSameFile(to, data)) {
      void vscode.window.showErrorMessage('Assay: the report would overwrite the data file; choose another name.');
      return undefined;
    }
    const settings = this.deps.config.settings;
    const options = { fileLabel: vscode.workspace.asRelativePath(data), significantDigits: settings.significantDigits, rules: settings.options.rules };
    const dataName = data.path.slice(data.path.lastIndexOf('/') + 1);
    const text = format === 'html' ? renderHtmlReport(stored.profile, options)
      : format === 'metadata' ? metadataFromProfile(stored.profile, { url: dataName })
      : renderReport(stored.profile, options);
    await vscode.workspace.fs.writeFile(to, new TextEncoder().encode(text));
    const doc = await vscode.workspace.openTextDocument(to);
    await vscode.window.showTextDocument(doc, { preview: false, viewColumn: vscode.ViewColumn.Active });
    vscode.window.setStatusBarMessage(`$(check) Assay: saved the ${TITLES[format]} to ${vscode.workspace.asRelativePath(to)}`, 4000);
    return to;
  }
}
