import { describe, expect, it } from 'vitest';
import { textBox } from '../../../src/scene/text.ts';
import type { TextNode } from '../../../src/scene/types.ts';
import { boxesOverlap, boxInside } from '../../../src/sheets/kit/boxes.ts';
import { LayoutError } from '../../../src/sheets/kit/errors.ts';
import { placeLabels } from '../../../src/sheets/kit/labels.ts';
import { table } from '../../../src/sheets/kit/table.ts';

const bounds = { x: 0, y: 0, width: 80, height: 50 };

describe('placeLabels()', () => {
  it('moves crowded labels apart, inside the bounds and off the obstacles', () => {
    const obstacle = { x: 38, y: 23, width: 4, height: 4 };
    const reqs = Array.from({ length: 6 }, (_, i) => ({ key: `p${i}`, x: 40, y: 25, text: `${4000 + i * 10} rpm, 150 kW`, sizePt: 9 }));
    const placed = placeLabels(reqs, { bounds, obstacles: [obstacle], where: 'test' });
    const boxes = placed.nodes.filter((n): n is TextNode => n.type === 'text').map(textBox);
    expect(boxes.length).toBe(6);
    for (const b of boxes) {
      expect(boxInside(b, bounds, 1e-6)).toBe(true);
      expect(boxesOverlap(b, obstacle)).toBe(false);
    }
    for (let i = 0; i < boxes.length; i++) for (let j = i + 1; j < boxes.length; j++) expect(boxesOverlap(boxes[i], boxes[j])).toBe(false);
  });

  it('falls back to numbered callouts with notes when labels cannot fit, then to a LayoutError', () => {
    const small = { x: 0, y: 0, width: 30, height: 12 };
    const reqs = Array.from({ length: 3 }, (_, i) => ({ key: `p${i}`, x: 15, y: 6, text: 'A long label that cannot fit here', sizePt: 9 }));
    const placed = placeLabels(reqs, { bounds: small, obstacles: [], where: 'test' });
    expect(placed.notes.map((n) => n.number)).toEqual([1, 2, 3]);
    expect(placed.notes[0].text).toBe('A long label that cannot fit here');
    const tiny = { x: 0, y: 0, width: 3, height: 3 };
    expect(() => placeLabels(reqs, { bounds: tiny, obstacles: [], where: 'test' })).toThrow(LayoutError);
  });
});

describe('table()', () => {
  const columns = [{ header: 'Impeller', align: 'left' as const }, { header: 'WOT rpm', align: 'right' as const }];
  const rows = [['A 1.05', '5240'], ['B 1.15', '5070']];

  it('sizes columns from the measured text and right-aligns numbers at the column edge', () => {
    const t = table({ x: 10, y: 10, maxWidthMm: 100, columns, rows, sizePt: 9, minSizePt: 8, where: 'test' });
    expect(t.widthMm).toBeLessThan(40);
    const cells = (t.nodes[0] as { children: readonly { type: string; role?: string; anchor?: string; x?: number }[] }).children.filter((n) => n.role === 'table-cell');
    const right = cells.filter((c) => c.anchor === 'end').map((c) => c.x);
    expect(new Set(right).size).toBe(1);
  });

  it('shrinks toward the minimum size, then refuses with a LayoutError', () => {
    const natural = table({ x: 0, y: 0, maxWidthMm: 100, columns, rows, sizePt: 9, minSizePt: 8, where: 'test' }).widthMm;
    const shrunk = table({ x: 0, y: 0, maxWidthMm: natural * 0.92, columns, rows, sizePt: 9, minSizePt: 8, where: 'test' });
    expect(shrunk.sizePt).toBeLessThan(9);
    expect(shrunk.widthMm).toBeLessThanOrEqual(natural * 0.92);
    expect(() => table({ x: 0, y: 0, maxWidthMm: natural * 0.5, columns, rows, sizePt: 9, minSizePt: 8, where: 'test' })).toThrow(LayoutError);
  });
});
