/**
 * Names from data reach every page through the one escaping helper: a boat called like an HTML
 * attack shows as text, in the page and in the inline SVG, and never as markup.
 */
import { cpSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parse, stringify } from 'yaml';
import { matchbook, REPO } from '../cli/runCli.ts';

const HOSTILE = `<script>alert("x")</script> & 'Bob's' <b>boat</b>`;

describe('a boat name holding markup', () => {
  it('is escaped on its page, in the index and inside the inline SVG', { timeout: 600_000 }, () => {
    const root = mkdtempSync(join(tmpdir(), 'matchbook-escape-'));
    const data = join(root, 'data');
    cpSync(join(REPO, 'data'), data, { recursive: true });
    const file = join(data, 'boats', 'greyling.yaml');
    const boat = parse(readFileSync(file, 'utf8')) as Record<string, unknown>;
    writeFileSync(file, stringify({ ...boat, name: HOSTILE, notes: `Notes with </p><img src=x onerror=alert(1)>` }));
    const r = matchbook(['build', '--data', data, '--out', join(root, 'out')], { SOURCE_DATE_EPOCH: '1767225600' });
    expect(r.status, r.stderr).toBe(0);
    const page = readFileSync(join(root, 'out', 'boats', 'greyling', 'index.html'), 'utf8');
    const index = readFileSync(join(root, 'out', 'index.html'), 'utf8');
    for (const html of [page, index]) {
      expect(html).not.toContain('<script>');
      expect(html).not.toContain('<b>boat</b>');
      expect(html).toContain('&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt; &amp; &#39;Bob&#39;s&#39;');
    }
    expect(page).not.toContain('<img src=x');
    expect(page).toContain('&lt;img src=x onerror=alert(1)&gt;');
    // The SVG renderer escapes its own text the XML way.
    const svg = page.slice(page.indexOf('<svg'), page.indexOf('</svg>'));
    expect(svg).not.toContain('<script>');
    expect(svg).toContain('&lt;script&gt;');
  });
});
