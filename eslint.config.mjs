// Lint rules that carry architecture, not taste: the core stays free of the editor and of Node,
// so that the CLI, the Node worker, the web worker and the webview can all run it.
import tseslint from 'typescript-eslint';

const nodeBuiltins = [
  'assert', 'buffer', 'child_process', 'cluster', 'crypto', 'dgram', 'dns', 'events', 'fs', 'fs/promises',
  'http', 'https', 'net', 'os', 'path', 'perf_hooks', 'process', 'readline', 'stream', 'string_decoder',
  'timers', 'tls', 'tty', 'url', 'util', 'v8', 'vm', 'worker_threads', 'zlib',
];

export default tseslint.config(
  { ignores: ['node_modules/**', 'dist/**', 'out/**', '.vscode-test/**', '.vscode-test-web/**', 'test-output/**', 'bench-output/**'] },
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  {
    files: ['src/core/**/*.ts', 'src/protocol/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', {
        paths: [
          { name: 'vscode', message: 'The core must not import vscode: keep editor code in src/extension.' },
          ...nodeBuiltins.map((name) => ({ name, message: 'The core must not import Node built-ins.' })),
        ],
        patterns: [
          { group: ['node:*'], message: 'The core must not import Node built-ins.' },
          { group: ['**/extension/**', '**/cli/**', '**/worker/**', '**/webview/**'], message: 'The core depends on nothing outside it.' },
        ],
      }],
      'no-restricted-globals': ['error',
        { name: 'process', message: 'The core must not read the process: pass options in.' },
        { name: 'require', message: 'The core uses ES imports only.' },
        { name: 'Buffer', message: 'The core works on Uint8Array, not Buffer.' },
        { name: 'window', message: 'The core must not touch the DOM.' },
        { name: 'document', message: 'The core must not touch the DOM.' },
      ],
    },
  },
  {
    // The panel builds its DOM from elements and text only: data never becomes markup.
    files: ['webview/**/*.ts'],
    rules: {
      'no-restricted-syntax': ['error',
        { selector: "AssignmentExpression[left.property.name=/^(innerHTML|outerHTML)$/]", message: 'Build elements with createElement and textContent; never assign markup.' },
        { selector: "CallExpression[callee.property.name=/^(insertAdjacentHTML|write|writeln)$/]", message: 'Build elements with createElement and textContent; never insert markup.' },
      ],
    },
  },
);
