import { describe, expect, it } from 'vitest';
import { escapeHtml } from './escape-html.js';

describe('escapeHtml', () => {
  it('encodes the five characters HTML gives meaning to', () => {
    // OWASP Cross Site Scripting Prevention Cheat Sheet, output encoding for HTML contexts: & < > " '.
    expect(escapeHtml(`&<>"'`)).toBe('&amp;&lt;&gt;&quot;&#39;');
  });
  it('leaves ordinary text, including non-ASCII letters, untouched', () => {
    expect(escapeHtml('Maëlle Quist · viewer')).toBe('Maëlle Quist · viewer');
  });
  it('encodes an ampersand once, so an existing entity is shown literally', () => {
    expect(escapeHtml('&amp;')).toBe('&amp;amp;');
  });
});
