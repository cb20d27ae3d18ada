/**
 * The wall chart's results table: one row per impeller, one column group per engine variant holding the
 * WOT rpm band (heavy to light tolerance corner) and the status in words, the warnings bold and coloured.
 */
import type { WallChartResult } from '../../analysis/index.ts';
import { isWarning } from '../../analysis/index.ts';
import type { Block } from '../kit/block.ts';
import { rpmBandText } from '../kit/format.ts';
import { INK, WARN } from '../kit/style.ts';
import { table, type Cell, type Column } from '../kit/table.ts';

/** The compact results table whose top-left is (x, y), at most maxWidthMm wide. */
export function wallChartTable(args: { result: WallChartResult; variantLabels: readonly string[]; x: number; y: number; maxWidthMm: number; sizePt: number; minSizePt: number; where: string }): Block {
  const { result } = args;
  const columns: Column[] = [{ header: 'Impeller', align: 'left' }];
  for (let i = 0; i < result.variants.length; i += 1) columns.push({ header: 'WOT rpm', align: 'right' }, { header: 'Status', align: 'left' });
  const rows = result.impellers.map((imp): Cell[] => [
    { text: imp.label, weight: 'bold' },
    ...result.variants.flatMap((v): Cell[] => {
      const pairing = result.pairings.find((p) => p.variantId === v.variantId && p.impellerId === imp.impellerId);
      if (!pairing) return ['–', '–'];
      const b = pairing.band;
      const warn = isWarning(b.nominal.status);
      return [rpmBandText(b.low.speedRpm, b.high.speedRpm).replace(/ rpm$/, ''), { text: b.nominal.statusText, weight: warn ? 'bold' : 'regular', colour: warn ? WARN : INK }];
    }),
  ]);
  return table({
    x: args.x,
    y: args.y,
    maxWidthMm: args.maxWidthMm,
    columns,
    rows,
    groups: [{ header: '', span: 1 }, ...args.variantLabels.map((header) => ({ header, span: 2 }))],
    sizePt: args.sizePt,
    minSizePt: args.minSizePt,
    // Spread over the width when there are column groups to line up under the panels; one stays compact.
    fullWidth: result.variants.length > 1,
    role: 'results-table',
    where: `${args.where}: results table`,
  });
}
