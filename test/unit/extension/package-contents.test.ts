// The .vsix holds only what the extension needs: the bundles, the panel's style sheet, media, the
// manifest and the README/LICENSE/CHANGELOG (no sources, source maps, tests, fixtures or
// node_modules: everything is bundled). Checked with vsce's own file listing, and, when
// `npm run package` has built assay.vsix, in the archive itself.
import { execFileSync } from 'node:child_process';
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const root = join(__dirname, '../../..');
const vsix = join(root, 'assay.vsix');

const BUNDLES = ['dist/extension.js', 'dist/worker.js', 'dist/webview.js', 'dist/panel.css', 'dist/web/extension.js', 'dist/web/worker.js'];

function expectedFiles(): string[] {
  const optional = ['LICENSE', 'LICENSE.md', 'CHANGELOG.md'].filter((f) => existsSync(join(root, f)));
  const media = existsSync(join(root, 'media')) ? readdirSync(join(root, 'media'), { recursive: true, encoding: 'utf8' }).map((f) => `media/${f}`).filter((f) => statSync(join(root, f)).isFile()) : [];
  return ['package.json', 'README.md', ...BUNDLES, ...optional, ...media].sort();
}

/** Entry names of a zip archive, read from its central directory. */
function zipEntries(bytes: Buffer): string[] {
  let end = bytes.length - 22;
  while (end >= 0 && bytes.readUInt32LE(end) !== 0x06054b50) end--;
  if (end < 0) throw new Error('zip: no end of central directory');
  const count = bytes.readUInt16LE(end + 10);
  let at = bytes.readUInt32LE(end + 16);
  const names: string[] = [];
  for (let i = 0; i < count; i++) {
    if (bytes.readUInt32LE(at) !== 0x02014b50) throw new Error('zip: bad central directory entry');
    const nameLength = bytes.readUInt16LE(at + 28);
    const extra = bytes.readUInt16LE(at + 30);
    const comment = bytes.readUInt16LE(at + 32);
    names.push(bytes.toString('utf8', at + 46, at + 46 + nameLength));
    at += 46 + nameLength + extra + comment;
  }
  return names;
}

function checkNothingExtra(files: string[]): void {
  for (const f of files) {
    expect(f, f).not.toMatch(/\.map$|^src\/|^test\/|^webview\/|^node_modules\/|^demo\/|^docs\/|^out\/|^\.vscode-test|^test-output\//);
  }
}

describe('package contents', () => {
  it('vsce lists exactly the bundles, the style sheet, media and the manifest files', async () => {
    if (!BUNDLES.every((f) => existsSync(join(root, f)))) execFileSync(process.execPath, [join(root, 'esbuild.mjs')], { cwd: root, stdio: 'ignore' });
    const vsce = await import('@vscode/vsce');
    const files = (await vsce.listFiles({ cwd: root, packageManager: vsce.PackageManager.None })).map((f) => f.replace(/\\/g, '/')).sort();
    expect(files).toEqual(expectedFiles());
    checkNothingExtra(files);
  }, 60_000);

  it.skipIf(!existsSync(vsix))('assay.vsix (from npm run package) holds the same files and nothing else', () => {
    const entries = zipEntries(readFileSync(vsix));
    const inside = entries.filter((e) => e.startsWith('extension/')).map((e) => e.slice('extension/'.length))
      .map((e) => (e === 'readme.md' ? 'README.md' : e === 'changelog.md' ? 'CHANGELOG.md' : e === 'LICENSE.txt' ? 'LICENSE' : e)).sort(); // vsce's own renames
    expect(inside).toEqual(expectedFiles());
    expect(entries.filter((e) => !e.startsWith('extension/')).sort()).toEqual(['[Content_Types].xml', 'extension.vsixmanifest']);
    checkNothingExtra(inside);
  });
});
