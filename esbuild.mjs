// Builds every bundle the extension and the CLI ship:
//   dist/extension.js      desktop extension host (Node, cjs)      from src/extension/main-node.ts
//   dist/web/extension.js  web extension host (browser, cjs)       from src/extension/main-web.ts
//   dist/worker.js         Node worker_threads worker (cjs)        from src/worker/main-node.ts
//   dist/web/worker.js     Web Worker, a classic IIFE script: the web host starts nested workers with importScripts
//   dist/webview.js        the panel (IIFE, chart.js bundled)      from webview/main.ts, plus webview/*.css
//   dist/cli.js            the `assay` command (Node, cjs)         from src/cli/main.ts
// Entries whose source does not exist yet are skipped with a note.
// Flags: --watch (rebuild on change), --production (minify, no source maps).
import * as esbuild from 'esbuild';
import { copyFileSync, existsSync, mkdirSync, readdirSync, rmSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = dirname(fileURLToPath(import.meta.url));
const watch = process.argv.includes('--watch');
const production = process.argv.includes('--production');

const common = {
  bundle: true,
  minify: production,
  sourcemap: production ? false : 'linked',
  sourcesContent: false,
  legalComments: production ? 'none' : 'inline',
  logLevel: 'warning',
  absWorkingDir: root,
};

const node = { ...common, platform: 'node', format: 'cjs', target: 'node20' };
const browser = { ...common, platform: 'browser', target: 'es2022' };

const entries = [
  { ...node, entryPoints: ['src/extension/main-node.ts'], outfile: 'dist/extension.js', external: ['vscode'] },
  // The web extension host loads extensions as CommonJS and supplies `vscode` through require.
  { ...browser, format: 'cjs', entryPoints: ['src/extension/main-web.ts'], outfile: 'dist/web/extension.js', external: ['vscode'] },
  { ...node, entryPoints: ['src/worker/main-node.ts'], outfile: 'dist/worker.js' },
  { ...browser, format: 'iife', entryPoints: ['src/worker/main-web.ts'], outfile: 'dist/web/worker.js' },
  { ...browser, format: 'iife', entryPoints: ['webview/main.ts'], outfile: 'dist/webview.js' },
  { ...node, entryPoints: ['src/cli/main.ts'], outfile: 'dist/cli.js', banner: { js: '#!/usr/bin/env node' } },
].filter((e) => {
  const ok = existsSync(join(root, e.entryPoints[0]));
  if (!ok) console.log(`esbuild: skipping ${e.outfile} (${e.entryPoints[0]} does not exist yet)`);
  return ok;
});

function copyCss() {
  const dir = join(root, 'webview');
  if (!existsSync(dir)) return;
  mkdirSync(join(root, 'dist'), { recursive: true });
  for (const f of readdirSync(dir)) if (f.endsWith('.css')) copyFileSync(join(dir, f), join(root, 'dist', f));
}

if (watch) {
  const contexts = await Promise.all(entries.map((e) => esbuild.context(e)));
  await Promise.all(contexts.map((c) => c.watch()));
  copyCss();
  console.log('esbuild: watching (CSS is copied at start only)');
} else {
  const t0 = Date.now();
  // A release build starts from an empty dist/ so that no stale file (an old source map) is packaged.
  if (production) rmSync(join(root, 'dist'), { recursive: true, force: true });
  await Promise.all(entries.map((e) => esbuild.build(e)));
  copyCss();
  console.log(`esbuild: ${entries.length} bundles in ${Date.now() - t0} ms${production ? ' (production)' : ''}`);
}
