// Chart colours from the VS Code theme's CSS variables, so that light, dark and high-contrast
// themes all read; the fallbacks only matter outside VS Code.

export interface Theme {
  foreground: string;
  muted: string;
  grid: string;
  background: string;
  primary: string;
  secondary: string;
  accent: string;
  /** Set only in high-contrast themes: outline every bar. */
  contrastBorder: string | null;
  fontFamily: string;
  fontSize: number;
}

function cssVar(style: CSSStyleDeclaration, name: string, fallback: string): string {
  const v = style.getPropertyValue(name).trim();
  return v === '' ? fallback : v;
}

export function readTheme(): Theme {
  const style = getComputedStyle(document.body);
  const foreground = cssVar(style, '--vscode-editor-foreground', cssVar(style, '--vscode-foreground', '#333333'));
  const size = Number.parseFloat(cssVar(style, '--vscode-font-size', '13'));
  const contrast = style.getPropertyValue('--vscode-contrastBorder').trim();
  return {
    foreground,
    muted: cssVar(style, '--vscode-descriptionForeground', foreground),
    grid: cssVar(style, '--vscode-panel-border', cssVar(style, '--vscode-editorWidget-border', 'rgba(128,128,128,0.35)')),
    background: cssVar(style, '--vscode-editor-background', '#ffffff'),
    primary: cssVar(style, '--vscode-charts-blue', '#3a76c4'),
    secondary: cssVar(style, '--vscode-charts-purple', '#8a5cc2'),
    accent: cssVar(style, '--vscode-charts-orange', '#c7702a'),
    contrastBorder: contrast === '' ? null : contrast,
    fontFamily: cssVar(style, '--vscode-font-family', 'system-ui, sans-serif'),
    fontSize: Number.isFinite(size) && size > 0 ? size : 13,
  };
}

/**
 * Calls `onChange` when VS Code switches theme: it swaps the body's theme class and rewrites the
 * variables on <html>. Returns a function that stops watching.
 */
export function watchTheme(onChange: () => void): () => void {
  let pending = 0;
  const observer = new MutationObserver(() => {
    // One redraw for the burst of mutations a theme switch makes.
    cancelAnimationFrame(pending);
    pending = requestAnimationFrame(onChange);
  });
  observer.observe(document.body, { attributes: true, attributeFilter: ['class'] });
  observer.observe(document.documentElement, { attributes: true, attributeFilter: ['style', 'class'] });
  return () => observer.disconnect();
}
