import { describe, expect, it } from 'vitest';
import { escapeHtml } from '../../../../src/core/html/escape-html';

describe('escapeHtml', () => {
  it('runs the doc comment example', () => {
    expect(escapeHtml('<img src=x onerror="a()">')).toBe('&lt;img src=x onerror=&quot;a()&quot;&gt;');
  });

  it('escapes the five characters that matter in content and quoted attributes (OWASP XSS prevention, rule 1 and 2)', () => {
    expect(escapeHtml(`&<>"'`)).toBe('&amp;&lt;&gt;&quot;&#39;');
    expect(escapeHtml('&amp;')).toBe('&amp;amp;');
  });

  it('makes invisible characters visible and cuts long text, as the Markdown report does', () => {
    expect(escapeHtml('a\r\nb\u202Ec\u0000')).toBe('a↵b\\u202Ec\\u0000');
    expect(escapeHtml(' x ')).toBe('␠x␠');
    expect(escapeHtml('<'.repeat(300))).toBe(`${'&lt;'.repeat(200)}…`);
    expect(escapeHtml('abcdef', { maxLength: 2 })).toBe('ab…');
  });
});
