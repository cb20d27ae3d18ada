import { describe, expect, it } from 'vitest';
import { edgeLabelRow, spreadAlong } from '../../../src/sheets/kit/edgeLabels.ts';

describe('spreadAlong()', () => {
  it('leaves items that do not touch at their anchors', () => {
    expect(spreadAlong([{ anchorX: 10, widthMm: 4 }, { anchorX: 30, widthMm: 6 }], { fromMm: 0, toMm: 50, gapMm: 1 })).toEqual([8, 27]);
  });

  it('pushes two overlapping items apart by equal amounts (least squares), keeping the gap', () => {
    // Centres wanted at 20 and 22, widths 4, gap 1: they need 5 mm between centres, so each moves 1.5 mm.
    const [a, b] = spreadAlong([{ anchorX: 22, widthMm: 4 }, { anchorX: 20, widthMm: 4 }], { fromMm: 0, toMm: 50, gapMm: 1 });
    expect(b + 2).toBeCloseTo(18.5, 9);
    expect(a + 2).toBeCloseTo(23.5, 9);
  });

  it('slides a cluster back inside the row at its ends', () => {
    const lefts = spreadAlong([{ anchorX: 49, widthMm: 4 }, { anchorX: 50, widthMm: 4 }], { fromMm: 0, toMm: 50, gapMm: 1 });
    expect(lefts).toEqual([41, 46]);
  });

  it('reports no room with an empty answer when the items are wider than the row', () => {
    expect(spreadAlong([{ anchorX: 5, widthMm: 6 }, { anchorX: 6, widthMm: 6 }], { fromMm: 0, toMm: 10, gapMm: 1 })).toEqual([]);
  });
});

describe('edgeLabelRow()', () => {
  it('draws a leader only for a label moved off its anchor, and returns null when the row is too short', () => {
    const args = { edgeY: 50, fromMm: 0, toMm: 100, sizePt: 10, gapMm: 2, role: 'name', where: 'test' };
    const row = edgeLabelRow({ ...args, labels: [{ key: 'a', anchorX: 20, text: 'Wisp' }, { key: 'b', anchorX: 21, text: 'Breeze' }, { key: 'c', anchorX: 80, text: 'Storm' }] })!;
    expect(row.nodes.filter((n) => n.role === 'leader').map((n) => n.key)).toEqual(['a', 'b']);
    for (const n of row.nodes) if (n.type === 'text') expect(n.y).toBeLessThan(50 - 2);
    expect(edgeLabelRow({ ...args, toMm: 8, labels: [{ key: 'a', anchorX: 2, text: 'Wisp' }, { key: 'b', anchorX: 4, text: 'Breeze' }] })).toBeNull();
  });
});
