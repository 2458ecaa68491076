// Bundles the in-workbench suite: `web` (cjs for the web extension host, mocha's browser build) or
// `node` (cjs for the desktop host). Test files are required in name order after mocha is set up.
// ASSAY_WORKBENCH_BREAK=1 adds a deliberately failing test (to prove a failure fails the run);
// ASSAY_WORKBENCH_GREP=<text> runs only the tests whose full title contains the text.
import * as esbuild from 'esbuild';
import { readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
const suiteDir = join(here, 'suite');
const root = join(here, '..', '..');

export const SUITE_OUT = { web: join(root, 'out', 'workbench', 'web', 'suite.js'), node: join(root, 'out', 'workbench', 'node', 'suite.js') };

const suiteFiles = {
  name: 'suite-files',
  setup(build) {
    build.onResolve({ filter: /^\.\/suite-files$/ }, () => ({ path: 'suite-files', namespace: 'assay-suite' }));
    build.onLoad({ filter: /.*/, namespace: 'assay-suite' }, () => {
      const files = readdirSync(suiteDir).filter((f) => f.endsWith('.test.ts')).sort();
      const body = files.map((f) => `  require(${JSON.stringify(`./${f}`)});`).join('\n');
      return { contents: `export function loadSuiteFiles() {\n${body}\n}\n`, resolveDir: suiteDir, loader: 'js' };
    });
  },
};

export async function buildSuite(target) {
  const web = target === 'web';
  await esbuild.build({
    absWorkingDir: root,
    entryPoints: [join(suiteDir, web ? 'index-web.ts' : 'index-node.ts')],
    outfile: SUITE_OUT[target],
    bundle: true,
    format: 'cjs',
    platform: web ? 'browser' : 'node',
    target: web ? 'es2022' : 'node20',
    external: ['vscode', ...(web ? [] : ['mocha'])],
    sourcemap: 'inline',
    sourcesContent: false,
    logLevel: 'warning',
    plugins: [suiteFiles],
    define: {
      __ASSAY_BREAK__: process.env.ASSAY_WORKBENCH_BREAK === '1' ? 'true' : 'false',
      __ASSAY_GREP__: JSON.stringify(process.env.ASSAY_WORKBENCH_GREP ?? ''),
    },
  });
  return SUITE_OUT[target];
}
