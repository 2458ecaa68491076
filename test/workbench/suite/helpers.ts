// Shared steps for the workbench tests: the extension's internal test API, the fixtures workspace,
// polling for a condition (the workbench is asynchronous everywhere), and screenshot requests.
import * as vscode from 'vscode';
import type { AssayExports, AssayTestApi } from '../../../src/extension/test-api';

export const EXTENSION_ID = 'assay-dev.assay';

export async function assayApi(): Promise<AssayTestApi> {
  const ext = vscode.extensions.getExtension<AssayExports>(EXTENSION_ID);
  if (ext === undefined) throw new Error(`extension ${EXTENSION_ID} is not installed in this workbench`);
  const exports = ext.isActive ? ext.exports : await ext.activate();
  return exports.__test;
}

export function workspaceRoot(): vscode.Uri {
  const folder = vscode.workspace.workspaceFolders?.[0];
  if (folder === undefined) throw new Error('the workbench has no workspace folder (the fixtures workspace)');
  return folder.uri;
}

export function fixtureUri(name: string): vscode.Uri {
  return vscode.Uri.joinPath(workspaceRoot(), name);
}

export async function openFixture(name: string, column: vscode.ViewColumn = vscode.ViewColumn.One): Promise<vscode.TextEditor> {
  const doc = await vscode.workspace.openTextDocument(fixtureUri(name));
  return vscode.window.showTextDocument(doc, { viewColumn: column, preview: false });
}

export function sleep(ms: number): Promise<void> {
  return new Promise((r) => setTimeout(r, ms));
}

/** Polls until `probe` returns a value other than undefined/false, or fails with `what`. */
export async function waitFor<T>(what: string, probe: () => T | undefined | false | Promise<T | undefined | false>, timeoutMs = 15_000): Promise<T> {
  const t0 = Date.now();
  let last: unknown;
  for (;;) {
    try {
      const v = await probe();
      if (v !== undefined && v !== false) return v;
      last = v;
    } catch (e) {
      last = e;
    }
    if (Date.now() - t0 > timeoutMs) throw new Error(`timed out after ${timeoutMs} ms waiting for ${what} (last: ${last instanceof Error ? last.message : String(last)})`);
    await sleep(100);
  }
}

/** Sets `assay.<key>` in the workspace (undefined removes it) and waits until the extension host sees it. */
export async function setSetting(key: string, value: unknown): Promise<void> {
  await vscode.workspace.getConfiguration('assay').update(key, value, vscode.ConfigurationTarget.Workspace);
  await waitFor(`setting assay.${key}`, () => {
    const seen = vscode.workspace.getConfiguration('assay').inspect(key)?.workspaceValue;
    return JSON.stringify(seen) === JSON.stringify(value) || undefined;
  });
}

export async function closeAllEditors(): Promise<void> {
  await vscode.commands.executeCommand('workbench.action.closeAllEditors');
}

/**
 * Asks the runner for a screenshot named `name` and waits until it was taken: the runner writes
 * `.assay-ack/<name>` into the served workspace folder, polled through the test server's stat route.
 */
export async function screenshot(name: string): Promise<boolean> {
  console.log(`[assay-screenshot] ${name}`);
  const ext = vscode.extensions.getExtension(EXTENSION_ID);
  const base = ext?.extensionUri;
  if (base === undefined || !base.scheme.startsWith('http')) return false;
  const url = `${base.scheme}://${base.authority}/static/mount/.assay-ack/${encodeURIComponent(name)}?stat`;
  try {
    await waitFor(`the runner's screenshot ${name}`, async () => {
      const r = await fetch(url);
      const body = (await r.json()) as { type?: number; error?: string };
      return body.type === 1;
    }, 20_000);
    return true;
  } catch {
    return false;
  }
}

/** The profile panel's tab, wherever it is. */
export function panelTab(): vscode.Tab | undefined {
  for (const group of vscode.window.tabGroups.all) {
    for (const tab of group.tabs) {
      if (tab.input instanceof vscode.TabInputWebview && tab.input.viewType.endsWith('assay.panel')) return tab;
    }
  }
  return undefined;
}

export async function closePanel(): Promise<void> {
  const tab = panelTab();
  if (tab !== undefined) await vscode.window.tabGroups.close(tab);
}

/** Waits for the exact (not first-pass) profile of the document's current version. */
export async function exactProfile(doc: vscode.TextDocument) {
  const api = await assayApi();
  return waitFor(`the profile of ${doc.uri.path} at version ${doc.version}`, () => {
    const p = api.profileFor(doc.uri.toString());
    return p !== undefined && p.version === doc.version && !p.partial ? p : undefined;
  });
}

/** Copies a fixture to a new name in the workspace (tests that edit a file work on their own copy). */
export async function copyFixture(name: string, to: string): Promise<vscode.Uri> {
  const target = fixtureUri(to);
  await vscode.workspace.fs.copy(fixtureUri(name), target, { overwrite: true });
  return target;
}

/**
 * Writes `name` into the workspace: the 5000 NIST StRD PiDigits values (../fixtures/pi-digits.csv)
 * repeated `copies` times under the header `digit`, so 5000 × copies records. Large copies make jobs
 * that last long enough to be interrupted.
 */
export async function writePiDigits(name: string, copies: number): Promise<vscode.Uri> {
  const digits = new TextDecoder().decode(await vscode.workspace.fs.readFile(fixtureUri('pi-digits.csv'))).split('\n').slice(1).filter((l) => l !== '');
  if (digits.length !== 5000) throw new Error(`pi-digits.csv: expected the 5000 PiDigits values (NIST StRD), got ${digits.length}`);
  const target = fixtureUri(name);
  const block = digits.join('\n');
  await vscode.workspace.fs.writeFile(target, new TextEncoder().encode(`digit\n${Array.from({ length: copies }, () => block).join('\n')}\n`));
  return target;
}

/** [line, character, line, character] of a range (0-based), for readable comparisons. */
export function rangeOf(r: vscode.Range): number[] {
  return [r.start.line, r.start.character, r.end.line, r.end.character];
}
