/**
 * Tables with columns measured from their real text: each column is as wide as its widest cell plus
 * padding. A table too wide at the sheet's smallest type size shortens the text of its `shorten` columns
 * (names and labels) with an ellipsis and says so in a note under it; when that is not enough either,
 * LayoutError (never clipped). Alternate rows get a light tint so a row can be followed across a wide sheet.
 */
import type { Colour, FontWeight, SceneNode } from '../../scene/types.ts';
import { fitText, measureTextMm } from '../../scene/text.ts';
import { ascentMm, label, linePitchMm, paragraph, type Block } from './block.ts';
import { LayoutError } from './errors.ts';
import { INK, STROKE, stroke } from './style.ts';

export interface Column {
  readonly header: string;
  readonly align: 'left' | 'right';
  /** Names and labels: may be shortened with an ellipsis (and a note) when the table is too wide. */
  readonly shorten?: boolean;
  /** A column the table can do without (its figures are elsewhere): left out, with a note, before shortening. */
  readonly optional?: boolean;
}

/** The note a table prints under itself when it shortened any entry. */
export const SHORTENED_NOTE = 'Entries ending in … are shortened to fit the page.';
/** The least width (mm, padding included) a shortened column keeps: a few letters and the ellipsis. */
const MIN_SHORT_COLUMN_MM = 14;

/** A header over consecutive columns (a column group); an empty header leaves its columns without one. */
export interface ColumnGroup {
  readonly header: string;
  readonly span: number;
}

export type Cell = string | { readonly text: string; readonly weight?: FontWeight; readonly colour?: Colour };

const PAD_MM = 1.6;
const ZEBRA: Colour = '#ececec';

function cellText(cell: Cell): { text: string; weight: FontWeight; colour: Colour } {
  return typeof cell === 'string' ? { text: cell, weight: 'regular', colour: INK } : { text: cell.text, weight: cell.weight ?? 'regular', colour: cell.colour ?? INK };
}

/** Column widths (mm) at a size: widest cell (header bold) plus padding on both sides. */
function columnWidths(columns: readonly Column[], rows: readonly (readonly Cell[])[], sizePt: number, withHeader: boolean): number[] {
  return columns.map((col, c) => {
    let w = withHeader ? measureTextMm({ text: col.header, sizePt, weight: 'bold' }) : 0;
    for (const row of rows) {
      const cell = cellText(row[c]);
      w = Math.max(w, measureTextMm({ text: cell.text, sizePt, weight: cell.weight }));
    }
    return w + 2 * PAD_MM;
  });
}

/** A table whose top-left is (x, y); uses sizePt, shrinking toward minSizePt only if it must. */
export function table(args: TableArgs): Block & { widthMm: number; sizePt: number } {
  const optional = args.columns.flatMap((c, i) => (c.optional ? [i] : []));
  if (optional.length === 0 || (args.groups ?? []).length > 0) return fittedTable(args);
  const fullMm = columnWidths(args.columns, args.rows, args.minSizePt, args.header ?? true).reduce((a, b) => a + b, 0);
  if (fullMm <= args.maxWidthMm) return fittedTable(args);
  const keep = (_: unknown, i: number) => !optional.includes(i);
  const left = `Left out to fit the page: ${optional.map((i) => args.columns[i].header).join(', ')}.`;
  return fittedTable({ ...args, columns: args.columns.filter(keep), rows: args.rows.map((r) => r.filter(keep)), extraNote: left });
}

interface TableArgs {
  x: number;
  y: number;
  maxWidthMm: number;
  columns: readonly Column[];
  rows: readonly (readonly Cell[])[];
  sizePt: number;
  minSizePt: number;
  /** Spread spare width over the columns so the table spans maxWidthMm. */
  fullWidth?: boolean;
  /** Default true; false for item/value lists whose first column says what each row is. */
  header?: boolean;
  /** Group headers set over the column headers, spans summing to the column count. */
  groups?: readonly ColumnGroup[];
  role?: string;
  where: string;
  /** A note printed under the table (columns left out). */
  extraNote?: string;
}

function fittedTable(args: TableArgs): Block & { widthMm: number; sizePt: number } {
  for (const row of args.rows) {
    if (row.length !== args.columns.length) {
      throw new LayoutError(args.where, `a table row has ${row.length} cells, expected ${args.columns.length}`);
    }
  }
  const groups = args.groups ?? [];
  if (groups.length > 0 && groups.reduce((a, g) => a + g.span, 0) !== args.columns.length) {
    throw new LayoutError(args.where, `the column groups span ${groups.reduce((a, g) => a + g.span, 0)} columns, expected ${args.columns.length}`);
  }
  // A group header wider than its columns widens the group's last column.
  const measure = (size: number, rows: readonly (readonly Cell[])[]): number[] => {
    const w = columnWidths(args.columns, rows, size, args.header ?? true);
    let first = 0;
    for (const g of groups) {
      const need = measureTextMm({ text: g.header, sizePt: size, weight: 'bold' }) + 2 * PAD_MM;
      const have = w.slice(first, first + g.span).reduce((a, b) => a + b, 0);
      if (g.header !== '' && need > have) w[first + g.span - 1] += need - have;
      first += g.span;
    }
    return w;
  };
  let sizePt = args.sizePt;
  let rows = args.rows;
  let widths = measure(sizePt, rows);
  let total = widths.reduce((a, b) => a + b, 0);
  let shortened = false;
  if (total > args.maxWidthMm) {
    // Text width is proportional to size and padding is fixed, so one step lands on the size that fits
    // (rounded down to 0.1 pt).
    const padTotal = 2 * PAD_MM * widths.length;
    sizePt = Math.floor(((sizePt * (args.maxWidthMm - padTotal)) / (total - padTotal)) * 10) / 10;
    if (!(sizePt >= args.minSizePt)) {
      sizePt = args.minSizePt;
      const short = shortenColumns({ columns: args.columns, rows, widths: measure(sizePt, rows), maxWidthMm: args.maxWidthMm, sizePt, header: args.header ?? true });
      if (!short) {
        throw new LayoutError(args.where, `the table needs ${total.toFixed(0)} mm at ${args.sizePt} pt but has ${args.maxWidthMm.toFixed(0)} mm, and would need type under ${args.minSizePt} pt; use wider paper or fewer columns`);
      }
      rows = short;
      shortened = true;
    }
    widths = measure(sizePt, rows);
    total = widths.reduce((a, b) => a + b, 0);
    if (total > args.maxWidthMm + 1e-6) {
      throw new LayoutError(args.where, `the table needs ${total.toFixed(0)} mm at ${sizePt} pt with names shortened but has ${args.maxWidthMm.toFixed(0)} mm; use wider paper or fewer columns`);
    }
  }
  if (args.fullWidth && total < args.maxWidthMm) {
    const extra = (args.maxWidthMm - total) / widths.length;
    widths = widths.map((w) => w + extra);
    total = args.maxWidthMm;
  }
  const rowPitch = linePitchMm(sizePt, 'bold') + 0.6;
  const baselineOffset = 0.3 + ascentMm(sizePt, 'bold');
  const nodes: SceneNode[] = [];
  const lefts = widths.map((_, i) => args.x + widths.slice(0, i).reduce((a, b) => a + b, 0));
  const emitRow = (cells: readonly Cell[], top: number, header: boolean): void => {
    cells.forEach((raw, c) => {
      const cell = header ? { text: cellText(raw).text, weight: 'bold' as const, colour: INK } : cellText(raw);
      const right = args.columns[c].align === 'right';
      nodes.push(
        label({
          x: right ? lefts[c] + widths[c] - PAD_MM : lefts[c] + PAD_MM,
          y: top + baselineOffset,
          text: cell.text,
          sizePt,
          weight: cell.weight,
          colour: cell.colour,
          anchor: right ? 'end' : 'start',
          role: header ? 'table-header' : 'table-cell',
          where: args.where,
        }),
      );
    });
  };
  const withHeader = args.header ?? true;
  const groupRows = groups.length > 0 ? 1 : 0;
  let first = 0;
  for (const g of groups) {
    if (g.header !== '') {
      const right = lefts[first + g.span - 1] + widths[first + g.span - 1];
      nodes.push(label({ x: lefts[first] + PAD_MM, y: args.y + baselineOffset, text: g.header, sizePt, weight: 'bold', role: 'table-group-header', where: args.where }));
      nodes.push({ type: 'path', role: 'table-group-rule', segments: [{ op: 'M', x: lefts[first] + PAD_MM, y: args.y + rowPitch }, { op: 'L', x: right - PAD_MM, y: args.y + rowPitch }], stroke: stroke(INK, STROKE.rule) });
    }
    first += g.span;
  }
  const headerTop = args.y + groupRows * rowPitch;
  if (withHeader) emitRow(args.columns.map((c) => c.header), headerTop, true);
  const bodyTop = withHeader ? headerTop + rowPitch : headerTop;
  rows.forEach((row, r) => {
    const top = bodyTop + r * rowPitch;
    if (r % 2 === 1) nodes.push({ type: 'rect', role: 'table-zebra', x: args.x, y: top, width: total, height: rowPitch, fill: { colour: ZEBRA } });
    emitRow(row, top, false);
  });
  const tableMm = rowPitch * (rows.length + (withHeader ? 1 : 0) + groupRows);
  const line = (y: number, w: number): SceneNode => ({ type: 'path', role: 'table-rule', segments: [{ op: 'M', x: args.x, y }, { op: 'L', x: args.x + total, y }], stroke: stroke(INK, w) });
  nodes.push(line(args.y, STROKE.rule), ...(withHeader ? [line(bodyTop, STROKE.rule)] : []), line(args.y + tableMm, STROKE.rule));
  const noteText = [args.extraNote ?? '', shortened ? SHORTENED_NOTE : ''].filter((t) => t !== '').join(' ');
  const note = noteText ? paragraph({ x: args.x, y: args.y + tableMm + 0.5, widthMm: args.maxWidthMm, text: noteText, sizePt: args.minSizePt, role: 'shortened-note', where: args.where }) : undefined;
  if (note) nodes.push(...note.nodes);
  const heightMm = note ? tableMm + 0.5 + note.heightMm : tableMm;
  return { nodes: [{ type: 'group', role: args.role ?? 'table', children: nodes }], heightMm, widthMm: total, sizePt };
}

/**
 * Rows with the `shorten` columns' cells cut to fit (ellipsis), or undefined when even a few letters per
 * shortened column cannot fit. Width is shared out by water-filling: columns narrower than an equal share
 * of what the fixed columns leave keep their width, the rest share the remainder equally.
 */
function shortenColumns(args: { columns: readonly Column[]; rows: readonly (readonly Cell[])[]; widths: readonly number[]; maxWidthMm: number; sizePt: number; header: boolean }): Cell[][] | undefined {
  const flexible = args.columns.flatMap((c, i) => (c.shorten ? [i] : []));
  if (flexible.length === 0) return undefined;
  let roomMm = args.maxWidthMm - args.widths.reduce((a, w, i) => (args.columns[i].shorten ? a : a + w), 0);
  // A shortened column keeps at least its header (when it has one) and a few letters.
  const floor = (c: number) => Math.max(MIN_SHORT_COLUMN_MM, args.header ? measureTextMm({ text: args.columns[c].header, sizePt: args.sizePt, weight: 'bold' }) + 2 * PAD_MM : 0);
  if (roomMm < flexible.reduce((a, c) => a + floor(c), 0)) return undefined;
  const caps = new Map<number, number>();
  const byWidth = [...flexible].sort((a, b) => args.widths[a] - args.widths[b]);
  byWidth.forEach((col, k) => {
    const share = roomMm / (byWidth.length - k);
    caps.set(col, Math.min(args.widths[col], Math.max(share, floor(col))));
    roomMm -= caps.get(col)!;
  });
  return args.rows.map((row) =>
    row.map((raw, c) => {
      const cap = caps.get(c);
      if (cap === undefined) return raw;
      const cell = cellText(raw);
      const fit = fitText({ text: cell.text, sizePt: args.sizePt, weight: cell.weight, maxWidthMm: cap - 2 * PAD_MM, minSizePt: args.sizePt });
      return { ...cell, text: fit.text };
    }),
  );
}
