import { describe, expect, it } from 'vitest';
import { escapeHtml, html, trustedHtml } from '../../src/site/html.ts';

describe('html escaping', () => {
  it('escapeHtml() replaces the five HTML-special characters and nothing else', () => {
    expect(escapeHtml(`<script>alert("x" & 'y')</script>`)).toBe(
      '&lt;script&gt;alert(&quot;x&quot; &amp; &#39;y&#39;)&lt;/script&gt;',
    );
    // RTL text and emoji pass through unchanged: they are not special in HTML.
    expect(escapeHtml('שלום 🚤 café')).toBe('שלום 🚤 café');
  });

  it('html`` escapes every interpolated string, number and array item', () => {
    const name = '<img src=x onerror=alert(1)>';
    const out = html`<p title="${name}">${name} ${42} ${['<a>', '&']}</p>`.value;
    expect(out).toBe(
      '<p title="&lt;img src=x onerror=alert(1)&gt;">&lt;img src=x onerror=alert(1)&gt; 42 &lt;a&gt;&amp;</p>',
    );
  });

  it('html`` keeps nested html`` and trusted markup as they are and drops null, undefined and booleans', () => {
    const inner = html`<b>${'x<y'}</b>`;
    expect(html`${inner}${trustedHtml('<svg/>')}${null}${undefined}${false}${true}`.value).toBe('<b>x&lt;y</b><svg/>');
  });
});
