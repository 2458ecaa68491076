// Every piece of text that reaches the HTML report goes through here: made visible, then escaped.
import { revealInvisibles, type RevealOptions } from '../markdown/reveal-invisibles';

const ENTITIES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', '\'': '&#39;' };

/**
 * Escapes text for HTML element content and for quoted attribute values: `& < > " '` become
 * character references (the five the HTML standard's serialisation and OWASP's XSS guidance escape).
 * Before that, line breaks, bidirectional controls and other invisible characters are made visible
 * and long text is cut, exactly as in the Markdown report (see `revealInvisibles`).
 *
 * Example: escapeHtml('<img src=x onerror="a()">') === '&lt;img src=x onerror=&quot;a()&quot;&gt;'.
 */
export function escapeHtml(text: string, options: RevealOptions = {}): string {
  return revealInvisibles(text, options).replace(/[&<>"']/g, (c) => ENTITIES[c] ?? c);
}
