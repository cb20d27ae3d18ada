import { readFileSync } from 'node:fs';
import * as fontkit from 'fontkit';
import { describe, expect, it } from 'vitest';
import { FONT_FILES, SHAPING_FEATURES } from '../../src/scene/fonts.ts';
import { textOutline } from '../../src/scene/glyphOutlines.ts';
import { MM_PER_PT, measureTextMm } from '../../src/scene/text.ts';
import type { FontWeight } from '../../src/scene/types.ts';

const RUNS: ReadonlyArray<readonly [string, FontWeight]> = [
  ['AVAV To Wa WOT 5600', 'regular'],
  ['office fluff · Ωμέγα · Crème brûlée', 'bold'],
  ['Cafe\u0301 (combining acute) 4780–4900 rpm', 'regular'],
];

/** Every point (end and control) of relative/absolute SVG path data, absolute, as SVG reads it. */
function pathPoints(d: string): Array<[number, number]> {
  const points: Array<[number, number]> = [];
  let current: [number, number] = [0, 0];
  let contourStart: [number, number] = [0, 0];
  for (const [, op, args] of d.matchAll(/([MmLlQqCcZz])([^MmLlQqCcZz]*)/g)) {
    const values = (args.match(/-?[\d.]+/g) ?? []).map(Number);
    if (op === 'z' || op === 'Z') {
      current = contourStart;
      continue;
    }
    const relative = op === op.toLowerCase();
    const pairs: Array<[number, number]> = [];
    for (let i = 0; i < values.length; i += 2) pairs.push(relative ? [current[0] + values[i], current[1] + values[i + 1]] : [values[i], values[i + 1]]);
    points.push(...pairs);
    current = pairs[pairs.length - 1];
    if (op === 'm' || op === 'M') contourStart = current;
  }
  return points;
}

describe('textOutline()', () => {
  it.each(RUNS)('advances "%s" exactly as far as measureTextMm measures it', (text, weight) => {
    const outline = textOutline({ text, weight });
    const sizePt = 11;
    expect((outline.advanceUnits / outline.unitsPerEm) * sizePt * MM_PER_PT).toBe(measureTextMm({ text, sizePt, weight }));
  });

  it.each(RUNS)('draws "%s" where fontkit places its glyphs: the path spans the union of their control boxes', (text, weight) => {
    // Control boxes and positions read straight from fontkit, a separate route from the cached, relative path data.
    const font = fontkit.create(readFileSync(FONT_FILES[weight])) as fontkit.Font;
    const run = font.layout(text, { ...SHAPING_FEATURES });
    let penX = 0;
    const expected = { minX: Infinity, maxX: -Infinity, minY: Infinity, maxY: -Infinity };
    run.glyphs.forEach((glyph, i) => {
      const { xOffset, yOffset, xAdvance } = run.positions[i];
      if (glyph.path.commands.length > 0) {
        const box = glyph.cbox;
        expected.minX = Math.min(expected.minX, penX + xOffset + box.minX);
        expected.maxX = Math.max(expected.maxX, penX + xOffset + box.maxX);
        // y flipped: font units point up, SVG's down.
        expected.minY = Math.min(expected.minY, -(yOffset + box.maxY));
        expected.maxY = Math.max(expected.maxY, -(yOffset + box.minY));
      }
      penX += xAdvance;
    });
    const points = pathPoints(textOutline({ text, weight }).d);
    const xs = points.map((p) => p[0]);
    const ys = points.map((p) => p[1]);
    // Coordinates are kept to a hundredth of a unit; summing relative steps adds float noise only.
    expect(Math.min(...xs)).toBeCloseTo(expected.minX, 6);
    expect(Math.max(...xs)).toBeCloseTo(expected.maxX, 6);
    expect(Math.min(...ys)).toBeCloseTo(expected.minY, 6);
    expect(Math.max(...ys)).toBeCloseTo(expected.maxY, 6);
  });

  it('gives a run of spaces no ink but its full advance', () => {
    const outline = textOutline({ text: '   ', weight: 'regular' });
    expect(outline.d).toBe('');
    expect(outline.advanceUnits).toBe(3 * textOutline({ text: ' ', weight: 'regular' }).advanceUnits);
    expect(outline.advanceUnits).toBeGreaterThan(0);
  });

  it('starts the path with one absolute move and draws every later glyph from relative steps', () => {
    const { d } = textOutline({ text: 'WOT', weight: 'bold' });
    expect(d.match(/M/g)).toHaveLength(1);
    expect(d.startsWith('M')).toBe(true);
    expect(d).not.toMatch(/[LQC]/);
  });
});
