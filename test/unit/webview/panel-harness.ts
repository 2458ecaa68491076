// Loads the built panel bundle in Debian's Chromium, the way VS Code would: a page with a strict
// Content-Security-Policy (script by nonce only, styles from our origin only), a stubbed
// acquireVsCodeApi that records what the panel posts, and a log of every request the page makes.
import { copyFile, mkdir, mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { build } from 'esbuild';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { makeNonce, panelHtml } from '../../../src/extension/panel/panel-html';
import type { PanelToHost } from '../../../src/protocol/webview';

const ROOT = resolve(__dirname, '../../..');

export const LAUNCH_ARGS = [
  '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking',
  '--disable-component-update', '--disable-sync', '--disable-dev-shm-usage',
];

export type ThemeName = 'light' | 'dark' | 'high-contrast';

/** Theme variables as VS Code sets them (values from its default Light+ / Dark+ themes, from memory). */
const THEMES: Record<ThemeName, Record<string, string>> = {
  light: {
    'font-family': 'system-ui, "Segoe UI", Ubuntu, "Droid Sans", sans-serif', 'font-size': '13px', 'editor-font-family': 'monospace',
    'foreground': '#3b3b3b', 'editor-foreground': '#3b3b3b', 'editor-background': '#ffffff', 'descriptionForeground': '#717171',
    'panel-border': '#e5e5e5', 'focusBorder': '#005fb8', 'textLink-foreground': '#005fb8',
    'button-background': '#005fb8', 'button-foreground': '#ffffff', 'button-hoverBackground': '#0258a8', 'button-border': '#0000001a',
    'button-secondaryBackground': '#e5e5e5', 'button-secondaryForeground': '#3b3b3b', 'button-secondaryHoverBackground': '#cccccc',
    'input-background': '#ffffff', 'input-foreground': '#3b3b3b', 'input-border': '#cecece',
    'dropdown-background': '#ffffff', 'dropdown-foreground': '#3b3b3b', 'dropdown-border': '#cecece',
    'list-hoverBackground': '#f2f2f2', 'list-inactiveSelectionBackground': '#e4e6f1',
    'badge-background': '#cccccc', 'badge-foreground': '#3b3b3b',
    'charts-blue': '#1a85ff', 'charts-purple': '#652d90', 'charts-orange': '#d18616', 'charts-foreground': '#616161',
    'editorWarning-foreground': '#bf8803', 'editorError-foreground': '#e51400', 'editorInfo-foreground': '#1a85ff', 'errorForeground': '#f85149',
    'inputValidation-warningBackground': '#f6f5d2', 'inputValidation-errorBackground': '#f2dede', 'inputValidation-errorBorder': '#be1100',
    'textBlockQuote-background': '#f8f8f8', 'textBlockQuote-border': '#e5e5e5', 'progressBar-background': '#005fb8',
  },
  dark: {
    'font-family': 'system-ui, "Segoe UI", Ubuntu, "Droid Sans", sans-serif', 'font-size': '13px', 'editor-font-family': 'monospace',
    'foreground': '#cccccc', 'editor-foreground': '#cccccc', 'editor-background': '#1f1f1f', 'descriptionForeground': '#9d9d9d',
    'panel-border': '#2b2b2b', 'focusBorder': '#0078d4', 'textLink-foreground': '#4daafc',
    'button-background': '#0078d4', 'button-foreground': '#ffffff', 'button-hoverBackground': '#026ec1', 'button-border': '#ffffff12',
    'button-secondaryBackground': '#313131', 'button-secondaryForeground': '#cccccc', 'button-secondaryHoverBackground': '#3c3c3c',
    'input-background': '#313131', 'input-foreground': '#cccccc', 'input-border': '#3c3c3c',
    'dropdown-background': '#313131', 'dropdown-foreground': '#cccccc', 'dropdown-border': '#3c3c3c',
    'list-hoverBackground': '#2a2d2e', 'list-inactiveSelectionBackground': '#37373d',
    'badge-background': '#616161', 'badge-foreground': '#f8f8f8',
    'charts-blue': '#3794ff', 'charts-purple': '#b180d7', 'charts-orange': '#d18616', 'charts-foreground': '#cccccc',
    'editorWarning-foreground': '#cca700', 'editorError-foreground': '#f14c4c', 'editorInfo-foreground': '#3794ff', 'errorForeground': '#f85149',
    'inputValidation-warningBackground': '#352a05', 'inputValidation-errorBackground': '#5a1d1d', 'inputValidation-errorBorder': '#be1100',
    'textBlockQuote-background': '#2b2b2b', 'textBlockQuote-border': '#616161', 'progressBar-background': '#0078d4',
  },
  'high-contrast': {
    'font-family': 'system-ui, "Segoe UI", Ubuntu, "Droid Sans", sans-serif', 'font-size': '13px', 'editor-font-family': 'monospace',
    'foreground': '#ffffff', 'editor-foreground': '#ffffff', 'editor-background': '#000000', 'descriptionForeground': '#ffffffb3',
    'panel-border': '#6fc3df', 'contrastBorder': '#6fc3df', 'focusBorder': '#f38518', 'textLink-foreground': '#21a6ff',
    'button-background': '#000000', 'button-foreground': '#ffffff', 'button-border': '#6fc3df',
    'button-secondaryBackground': '#000000', 'button-secondaryForeground': '#ffffff',
    'input-background': '#000000', 'input-foreground': '#ffffff', 'input-border': '#6fc3df',
    'dropdown-background': '#000000', 'dropdown-foreground': '#ffffff', 'dropdown-border': '#6fc3df',
    'list-hoverBackground': '#000000', 'list-inactiveSelectionBackground': '#000000',
    'badge-background': '#000000', 'badge-foreground': '#ffffff',
    'charts-blue': '#3794ff', 'charts-purple': '#b180d7', 'charts-orange': '#d18616', 'charts-foreground': '#ffffff',
    'editorWarning-foreground': '#ffd370', 'editorError-foreground': '#f48771', 'editorInfo-foreground': '#3794ff', 'errorForeground': '#f48771',
    'inputValidation-warningBackground': '#000000', 'inputValidation-errorBackground': '#000000', 'inputValidation-errorBorder': '#be1100',
    'textBlockQuote-background': '#000000', 'textBlockQuote-border': '#ffffff', 'progressBar-background': '#6fc3df',
  },
};

function themeOf(name: string | null): ThemeName {
  return name === 'dark' || name === 'high-contrast' ? name : 'light';
}

function themeCss(theme: ThemeName): string {
  const vars = Object.entries(THEMES[theme]).map(([k, v]) => `  --vscode-${k}: ${v};`).join('\n');
  return `html {\n${vars}\n}\n`;
}

export interface PanelServer {
  origin: string;
  /** Paths the server answers; anything else is a 404 and a failed check. */
  paths: readonly string[];
  close(): Promise<void>;
}

export interface BuiltPanel {
  dir: string;
  js: string;
  css: string;
}

/** Bundles webview/main.ts as the host's build does: one IIFE with chart.js inside. */
export async function buildPanel(): Promise<BuiltPanel> {
  const dir = await mkdtemp(join(tmpdir(), 'assay-webview-'));
  const js = join(dir, 'webview.js');
  await build({
    entryPoints: [join(ROOT, 'webview/main.ts')], outfile: js, bundle: true, format: 'iife', platform: 'browser',
    target: 'es2022', minify: true, sourcemap: false, logLevel: 'silent', tsconfig: join(ROOT, 'webview/tsconfig.json'),
  });
  const css = join(dir, 'panel.css');
  await copyFile(join(ROOT, 'webview/panel.css'), css);
  return { dir, js, css };
}

/**
 * Serves the page, the bundle, the stylesheet and theme stylesheets from 127.0.0.1. The page is
 * `/?theme=light|dark`; `&csp=off` drops the policy, to prove the panel's own DOM building is inert
 * without the CSP's help.
 */
export async function servePanel(built: BuiltPanel): Promise<PanelServer> {
  const js = await readFile(built.js);
  const css = await readFile(built.css);
  let origin = '';
  // The host's own page and policy (src/extension/panel/panel-html.ts), with a theme stylesheet
  // standing in for the variables VS Code sets; `csp` false strips the policy.
  const page = (theme: ThemeName, csp: boolean): string => {
    const html = panelHtml({
      cspSource: origin, nonce: makeNonce(), scriptUri: `${origin}/webview.js`,
      styleUris: [`${origin}/theme-${theme}.css`, `${origin}/panel.css`],
    });
    return csp ? html : html.replace(/<meta http-equiv="Content-Security-Policy"[^>]*>/, '');
  };
  const routes: Record<string, (q: URLSearchParams) => [string, string | Buffer]> = {
    '/': (q) => ['text/html; charset=utf-8', page(themeOf(q.get('theme')), q.get('csp') !== 'off')],
    '/webview.js': () => ['text/javascript; charset=utf-8', js],
    '/panel.css': () => ['text/css; charset=utf-8', css],
    '/theme-light.css': () => ['text/css; charset=utf-8', themeCss('light')],
    '/theme-dark.css': () => ['text/css; charset=utf-8', themeCss('dark')],
    '/theme-high-contrast.css': () => ['text/css; charset=utf-8', themeCss('high-contrast')],
  };
  const server: Server = createServer((req, res) => {
    const url = new URL(req.url ?? '/', 'http://127.0.0.1');
    const route = routes[url.pathname];
    if (route === undefined) {
      res.writeHead(404).end();
      return;
    }
    const [type, body] = route(url.searchParams);
    res.writeHead(200, { 'content-type': type, 'cache-control': 'no-store' }).end(body);
  });
  await new Promise<void>((ok) => server.listen(0, '127.0.0.1', ok));
  origin = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  return {
    origin,
    paths: Object.keys(routes),
    close: () => new Promise<void>((ok) => server.close(() => ok())),
  };
}

export interface Chromium {
  context: BrowserContext;
  close(): Promise<void>;
}

/** Debian's Chromium, headless, with a fresh profile directory removed on close. */
export async function launch(): Promise<Chromium> {
  const profileDir = await mkdtemp(join(tmpdir(), 'assay-chromium-'));
  const context = await chromium.launchPersistentContext(profileDir, {
    executablePath: '/usr/bin/chromium', headless: true, args: LAUNCH_ARGS,
  });
  return {
    context,
    async close() {
      await context.close();
      await rm(profileDir, { recursive: true, force: true });
    },
  };
}

export interface PanelPage {
  page: Page;
  /** Every message the panel posted, in order (JSON round-tripped). */
  posted(): Promise<PanelToHost[]>;
  /** Every URL the page requested. */
  requests: string[];
  /** The state the panel last saved with setState. */
  state(): Promise<unknown>;
  /** Sends a host message to the panel. */
  send(message: unknown): Promise<void>;
  /** Waits until the panel has posted a message of this type `count` times. */
  waitFor(type: PanelToHost['type'], count?: number): Promise<PanelToHost>;
}

/** Injected before the bundle: the VS Code API stub and the tripwires an injection would set off. */
function initScript(savedState: unknown): void {
  const w = window as unknown as Record<string, unknown>;
  const posted: unknown[] = [];
  const violations: string[] = [];
  w.__posted = posted;
  w.__violations = violations;
  w.__state = savedState;
  w.acquireVsCodeApi = () => ({
    postMessage: (m: unknown) => { posted.push(JSON.parse(JSON.stringify(m))); },
    getState: () => w.__state,
    setState: (s: unknown) => { w.__state = JSON.parse(JSON.stringify(s)); },
  });
  document.addEventListener('securitypolicyviolation', (e) => { violations.push(`${e.violatedDirective} ${e.blockedURI}`); });
}

export interface OpenOptions {
  theme?: ThemeName;
  csp?: boolean;
  width?: number;
  height?: number;
  savedState?: unknown;
}

export async function openPanel(context: BrowserContext, server: PanelServer, options: OpenOptions = {}): Promise<PanelPage> {
  const page = await context.newPage();
  await page.setViewportSize({ width: options.width ?? 900, height: options.height ?? 900 });
  const requests: string[] = [];
  page.on('request', (r) => requests.push(r.url()));
  await page.addInitScript(initScript, options.savedState ?? null);
  await page.goto(`${server.origin}/?theme=${options.theme ?? 'light'}${options.csp === false ? '&csp=off' : ''}`);
  const posted = () => page.evaluate(() => (window as unknown as { __posted: PanelToHost[] }).__posted);
  const panel: PanelPage = {
    page,
    posted,
    requests,
    state: () => page.evaluate(() => (window as unknown as { __state: unknown }).__state),
    send: async (message) => { await page.evaluate((m) => window.postMessage(m, '*'), message); },
    async waitFor(type, count = 1) {
      await page.waitForFunction(([t, n]) => (window as unknown as { __posted: { type: string }[] }).__posted.filter((m) => m.type === t).length >= (n as number), [type, count] as const);
      const all = (await posted()).filter((m) => m.type === type);
      return all[count - 1] as PanelToHost;
    },
  };
  await panel.waitFor('ready');
  return panel;
}

export async function removeDir(dir: string): Promise<void> {
  await rm(dir, { recursive: true, force: true });
}

export async function writeOutput(name: string, data: Buffer | string): Promise<string> {
  const dir = join(ROOT, 'test-output', 'webview');
  await mkdir(dir, { recursive: true });
  const file = join(dir, name);
  await writeFile(file, data);
  return file;
}
