// A source check that backs the browser tests: the panel code never parses markup, writes inline
// styles, evaluates strings or builds URLs, so that the CSP's style-src and script-src hold.
import { readdirSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

const DIR = resolve(__dirname, '../../../webview');
const FORBIDDEN: [RegExp, string][] = [
  [/\.(inner|outer)HTML\b/, 'innerHTML/outerHTML'],
  [/insertAdjacentHTML|createContextualFragment|DOMParser|document\.write/, 'markup parsing'],
  [/\.style\b|setAttribute\(\s*['"]style['"]|createElement\(\s*['"]style['"]/, 'inline style'],
  [/\beval\s*\(|new Function\b|setTimeout\(\s*['"]/, 'string evaluation'],
  [/\.(href|src)\s*=|setAttribute\(\s*['"](href|src|on\w+)['"]/, 'URL or handler attribute'],
  [/\bfetch\s*\(|XMLHttpRequest|WebSocket|EventSource|sendBeacon|importScripts/, 'network'],
];

describe('panel sources', () => {
  const files = readdirSync(DIR).filter((f) => f.endsWith('.ts'));
  it('exist', () => expect(files.length).toBeGreaterThan(5));
  for (const file of files) {
    it(`${file} uses no markup parsing, inline styles, string evaluation, URLs or network`, () => {
      const text = readFileSync(join(DIR, file), 'utf8').replace(/\/\/.*$/gm, '');
      for (const [pattern, what] of FORBIDDEN) expect(pattern.test(text), `${file}: ${what}`).toBe(false);
    });
  }
});
