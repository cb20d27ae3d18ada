import { describe, expect, it } from 'vitest';
import { inlineSvg } from '../../src/site/inlineSvg.ts';

describe('inlineSvg()', () => {
  const doc = [
    '<?xml version="1.0" encoding="UTF-8"?>',
    '<svg xmlns="http://www.w3.org/2000/svg" width="10mm" height="10mm">',
    '<defs><clipPath id="clip-1"><rect x="0" y="0" width="5" height="5"/></clipPath></defs>',
    '<g clip-path="url(#clip-1)"><path d="M0 0L5 5" data-key="id=x"/></g>',
    '</svg>',
    '',
  ].join('\n');

  it('drops the XML prolog and prefixes every id and its url() reference', () => {
    const out = inlineSvg(doc, 'boat-a-spec');
    expect(out.startsWith('<svg ')).toBe(true);
    expect(out).toContain('<clipPath id="boat-a-spec-clip-1">');
    expect(out).toContain('clip-path="url(#boat-a-spec-clip-1)"');
    expect(out).not.toContain('"clip-1"');
    // data attributes that merely contain "id=" are untouched
    expect(out).toContain('data-key="id=x"');
  });

  it('keeps two sheets of one page apart', () => {
    const a = inlineSvg(doc, 'a');
    const b = inlineSvg(doc, 'b');
    expect(a.match(/id="[^"]+"/g)).toEqual(['id="a-clip-1"']);
    expect(b.match(/id="[^"]+"/g)).toEqual(['id="b-clip-1"']);
  });
});
