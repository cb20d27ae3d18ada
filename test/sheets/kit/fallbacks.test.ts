import { describe, expect, it } from 'vitest';
import type { Paper } from '../../../src/data/types.ts';
import { textBox } from '../../../src/scene/text.ts';
import type { TextNode } from '../../../src/scene/types.ts';
import { boxesOverlap } from '../../../src/sheets/kit/boxes.ts';
import { LayoutError } from '../../../src/sheets/kit/errors.ts';
import { sheetFrame } from '../../../src/sheets/kit/frame.ts';
import { placeLabels } from '../../../src/sheets/kit/labels.ts';
import { typeScale } from '../../../src/sheets/kit/style.ts';
import { SHORTENED_NOTE, table } from '../../../src/sheets/kit/table.ts';
import { site } from '../fixtures/demoProject.ts';

const textsOf = (nodes: readonly unknown[]): TextNode[] => {
  const out: TextNode[] = [];
  const walk = (n: any): void => (n.type === 'group' ? n.children.forEach(walk) : n.type === 'text' ? void out.push(n) : undefined);
  nodes.forEach(walk);
  return out;
};

describe('table() when it is too wide at the smallest type', () => {
  const columns = [{ header: 'Cruise', align: 'left' as const, shorten: true }, { header: 'Engine', align: 'right' as const }, { header: 'Speed', align: 'right' as const }];
  const rows = [['Upstream against the current, fully loaded', '4210 rpm', '31'], ['Easy', '3000 rpm', '22']];

  it('shortens the names of a shorten column with an ellipsis, keeps the figures whole and says so under it', () => {
    const t = table({ x: 0, y: 0, maxWidthMm: 50, columns, rows, sizePt: 9, minSizePt: 8, where: 'test' });
    const cells = textsOf(t.nodes).filter((n) => n.role === 'table-cell').map((n) => n.text);
    expect(cells[0]).toMatch(/^Upstream .*…$/);
    expect(cells).toContain('4210 rpm');
    expect(cells).toContain('Easy');
    expect(t.widthMm).toBeLessThanOrEqual(50 + 1e-6);
    expect(textsOf(t.nodes).filter((n) => n.role === 'shortened-note').map((n) => n.text).join(' ')).toBe(SHORTENED_NOTE);
  });

  it('leaves out an optional column, naming it in the note, before shortening anything', () => {
    const withData = [...columns.slice(0, 2), { header: 'Data sheet', align: 'right' as const, optional: true }, columns[2]];
    const wide = rows.map((r) => [r[0].slice(0, 8), r[1], '4300 rpm', r[2]]);
    const need = table({ x: 0, y: 0, maxWidthMm: 500, columns: withData, rows: wide, sizePt: 8, minSizePt: 8, where: 'test' }).widthMm;
    const t = table({ x: 0, y: 0, maxWidthMm: need - 5, columns: withData, rows: wide, sizePt: 8, minSizePt: 8, where: 'test' });
    const headers = textsOf(t.nodes).filter((n) => n.role === 'table-header').map((n) => n.text);
    expect(headers).toEqual(['Cruise', 'Engine', 'Speed']);
    expect(textsOf(t.nodes).find((n) => n.role === 'shortened-note')?.text).toBe('Left out to fit the page: Data sheet.');
  });

  it('still raises a LayoutError naming the fix when the figures alone are too wide', () => {
    expect(() => table({ x: 0, y: 0, maxWidthMm: 25, columns, rows, sizePt: 9, minSizePt: 8, where: 'spec sheet x' })).toThrow(/spec sheet x: .*use wider paper or fewer columns/);
  });
});

describe('sheetFrame() with a long boat name', () => {
  const paper: Paper = { size: 'A6', orientation: 'portrait', bleedMm: 0 };
  const name = 'Whitewater Expedition Kestrel Harbour runner, fully loaded';

  it('shortens the name with an ellipsis, names the sheet kind above it, and prints the full name under the title', () => {
    const frame = sheetFrame({ paper, site, kind: 'specSheet', pageNote: 'page 2', title: name, subtitle: 'Copperwhistle Strider 5.1 L V6 271 kW race tune · Kelpspindle Riffle jet unit · impeller Squall', dateIso: '2026-11-02', type: typeScale(paper), where: 'spec sheet w' });
    const texts = textsOf(frame.nodes);
    const title = texts.find((n) => n.role === 'sheet-title')!;
    expect(title.text).toMatch(/^Whitewater .*…$/);
    expect(texts.find((n) => n.role === 'sheet-kind')?.text).toBe('SPEC SHEET · page 2');
    expect(texts.filter((n) => n.role === 'full-name-note').map((n) => n.text).join(' ')).toBe(`Full name: ${name}`);
    // The subtitle wraps instead of failing, and nothing in the header overlaps.
    expect(texts.filter((n) => n.role === 'sheet-subtitle').length).toBeGreaterThan(1);
    const boxes = texts.map(textBox);
    for (let i = 0; i < boxes.length; i++) for (let j = i + 1; j < boxes.length; j++) expect(boxesOverlap(boxes[i], boxes[j], -0.01)).toBe(false);
  });
});

describe('placeLabels() in a crowded corner', () => {
  it('puts a callout number at the nearest free spot farther out, with a leader, rather than fail', () => {
    const bounds = { x: 0, y: 0, width: 80, height: 50 };
    // Everything within 25 mm of the anchor is taken except a gap at the far right.
    const obstacles = [{ x: 0, y: 0, width: 70, height: 50 }];
    const placed = placeLabels([{ key: 'p', x: 35, y: 25, text: '5200 rpm OVER-REVS', sizePt: 9 }], { bounds, obstacles, where: 'test' });
    const number = textsOf(placed.nodes).find((n) => n.role === 'callout-number')!;
    expect(number.text).toBe('1');
    expect(number.x).toBeGreaterThanOrEqual(70);
    expect(placed.nodes.some((n) => n.type === 'path' && n.role === 'leader')).toBe(true);
    expect(() => placeLabels([{ key: 'p', x: 35, y: 25, text: 'x', sizePt: 9 }], { bounds, obstacles: [bounds], where: 'test' })).toThrow(LayoutError);
  });
});
