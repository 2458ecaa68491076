// The panel page: the exact Content Security Policy, one nonce'd script and no other script or
// inline style, attribute values escaped, and a fresh 128-bit nonce per load.
import { describe, expect, it } from 'vitest';
import { contentSecurityPolicy, makeNonce, panelHtml } from '../../../../src/extension/panel/panel-html';

const page = {
  cspSource: 'https://file+.vscode-resource.vscode-cdn.net',
  nonce: '0123456789abcdef0123456789abcdef',
  scriptUri: 'https://file+.vscode-resource.vscode-cdn.net/ext/dist/webview.js',
  styleUris: ['https://file+.vscode-resource.vscode-cdn.net/ext/dist/panel.css'],
};

describe('panel page', () => {
  it('has the strict policy: nothing by default, scripts by nonce only, styles/images/fonts from the extension', () => {
    expect(contentSecurityPolicy(page.cspSource, page.nonce)).toBe(
      "default-src 'none'; script-src 'nonce-0123456789abcdef0123456789abcdef'; style-src https://file+.vscode-resource.vscode-cdn.net; "
      + 'img-src https://file+.vscode-resource.vscode-cdn.net data:; font-src https://file+.vscode-resource.vscode-cdn.net',
    );
  });

  it('loads exactly one script, with the nonce, and no inline code or style', () => {
    const html = panelHtml(page);
    expect(html.match(/<script\b/g)).toHaveLength(1);
    expect(html).toContain(`<script nonce="${page.nonce}" src="${page.scriptUri}"></script>`);
    expect(html).toContain(`<link rel="stylesheet" href="${page.styleUris[0]}">`);
    expect(html).not.toMatch(/<style\b|\sstyle="|\son[a-z]+=/i);
    expect(html).toContain(`content="${contentSecurityPolicy(page.cspSource, page.nonce)}"`);
  });

  it('escapes attribute values', () => {
    const html = panelHtml({ ...page, scriptUri: 'x"><img src=y>' });
    expect(html).toContain('src="x&quot;>&lt;img src=y>"');
  });

  it('makes a new 32-hex-digit nonce each time', () => {
    const nonces = new Set(Array.from({ length: 100 }, makeNonce));
    expect(nonces.size).toBe(100);
    for (const n of nonces) expect(n).toMatch(/^[0-9a-f]{32}$/);
  });
});
