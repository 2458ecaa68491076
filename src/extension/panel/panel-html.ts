// The panel's page: an empty body, the bundled script and style sheets, and a strict Content
// Security Policy. Nothing from the data file is written here; the script renders it with DOM calls.
// Pure (no `vscode`), so the exact policy is unit-tested.

export interface PanelPage {
  /** webview.cspSource: the origin the webview serves extension resources from. */
  cspSource: string;
  /** Fresh for every load of the page. */
  nonce: string;
  scriptUri: string;
  styleUris: readonly string[];
}

export function contentSecurityPolicy(cspSource: string, nonce: string): string {
  return [
    "default-src 'none'",
    `script-src 'nonce-${nonce}'`,
    `style-src ${cspSource}`,
    `img-src ${cspSource} data:`,
    `font-src ${cspSource}`,
  ].join('; ');
}

const attr = (s: string): string => s.replace(/&/g, '&amp;').replace(/"/g, '&quot;').replace(/</g, '&lt;');

export function panelHtml(page: PanelPage): string {
  const styles = page.styleUris.map((u) => `<link rel="stylesheet" href="${attr(u)}">`).join('\n    ');
  return `<!DOCTYPE html>
<html lang="en">
  <head>
    <meta charset="utf-8">
    <meta http-equiv="Content-Security-Policy" content="${attr(contentSecurityPolicy(page.cspSource, page.nonce))}">
    <meta name="viewport" content="width=device-width, initial-scale=1">
    ${styles}
    <title>Assay</title>
  </head>
  <body>
    <script nonce="${attr(page.nonce)}" src="${attr(page.scriptUri)}"></script>
  </body>
</html>`;
}

/** 128 random bits as hex, from the platform's CSPRNG (Node 20 and browsers both have crypto). */
export function makeNonce(): string {
  const bytes = new Uint8Array(16);
  globalThis.crypto.getRandomValues(bytes);
  return [...bytes].map((b) => b.toString(16).padStart(2, '0')).join('');
}
