// The architecture rule is carried by eslint.config.mjs; this proves the rule bites, so that a
// later edit of the config cannot silently let the core import the editor or Node.
import { ESLint } from 'eslint';
import { describe, expect, it } from 'vitest';

const eslint = new ESLint({ cwd: `${__dirname}/../../..` });
const lint = async (path: string, code: string) => (await eslint.lintText(code, { filePath: path }))[0]!.messages.map((m) => m.ruleId);

describe('lint boundaries', () => {
  it('forbids vscode and Node built-ins in the core', async () => {
    expect(await lint('src/core/x.ts', "import * as vscode from 'vscode';\nexport const a = vscode;\n")).toContain('no-restricted-imports');
    expect(await lint('src/core/x.ts', "import { readFileSync } from 'node:fs';\nexport const a = readFileSync;\n")).toContain('no-restricted-imports');
    expect(await lint('src/core/x.ts', "import { join } from 'path';\nexport const a = join;\n")).toContain('no-restricted-imports');
    expect(await lint('src/core/x.ts', 'export const a = process.env;\n')).toContain('no-restricted-globals');
    expect(await lint('src/core/x.ts', "import { x } from '../extension/y';\nexport const a = x;\n")).toContain('no-restricted-imports');
  });
  it('allows them in the shells', async () => {
    expect(await lint('src/cli/x.ts', "import { readFileSync } from 'node:fs';\nexport const a = readFileSync;\n")).toEqual([]);
  });
  it('forbids markup from strings in the panel', async () => {
    expect(await lint('webview/x.ts', 'export function f(e: HTMLElement, s: string): void { e.innerHTML = s; }\n')).toContain('no-restricted-syntax');
  });
});
