/**
 * Tables with columns measured from their real text: each column is as wide as its widest cell plus
 * padding. A table too wide shrinks its type to the sheet's smallest size; then its headers and `wrap`
 * columns break onto more lines at spaces; then the text of its `shorten` columns (names and labels) is
 * shortened with an ellipsis and a note under it says so; when even that is not enough (figures alone
 * wider than the paper), LayoutError (never clipped). A long table can be drawn in parts (rows split over
 * columns or pages) with one set of widths: see splitTable. Alternate rows get a light tint so a row can be followed across a wide sheet.
 */
import type { Colour, FontWeight, SceneNode } from '../../scene/types.ts';
import { fitText, measureTextMm } from '../../scene/text.ts';
import { ascentMm, label, linePitchMm, paragraph, wrapLines, type Block } from './block.ts';
import { LayoutError } from './errors.ts';
import { INK, STROKE, stroke } from './style.ts';

export interface Column {
  readonly header: string;
  readonly align: 'left' | 'right';
  /** Names and labels: may be shortened with an ellipsis (and a note) when the table is too wide. */
  readonly shorten?: boolean;
  /** A column the table can do without (its figures are elsewhere): left out, with a note, before shortening. */
  readonly optional?: boolean;
  /** Words and sentences: may break onto more lines (at spaces) when the table is too wide at its smallest type. */
  readonly wrap?: boolean;
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
  const fullMm = columnWidths(args.columns, args.measureRows ?? args.rows, args.minSizePt, args.header ?? true).reduce((a, b) => a + b, 0);
  if (fullMm <= args.maxWidthMm) return fittedTable(args);
  const keep = (_: unknown, i: number) => !optional.includes(i);
  const left = `Left out to fit the page: ${optional.map((i) => args.columns[i].header).join(', ')}.`;
  return fittedTable({ ...args, columns: args.columns.filter(keep), rows: args.rows.map((r) => r.filter(keep)), ...(args.measureRows ? { measureRows: args.measureRows.map((r) => r.filter(keep)) } : {}), extraNote: left });
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
  /** The whole table's rows when only some are drawn here (a table split over pages): widths come from them. */
  measureRows?: readonly (readonly Cell[])[];
  /** Index of the first row drawn, so the alternate-row tint carries on across a split. */
  firstRowIndex?: number;
  /** Leave out the note under the table (a split table prints it under its last part only). */
  noNote?: boolean;
}

function fittedTable(args: TableArgs): Block & { widthMm: number; sizePt: number } {
  for (const row of [...args.rows, ...(args.measureRows ?? [])]) {
    if (row.length !== args.columns.length) {
      throw new LayoutError(args.where, `a table row has ${row.length} cells, expected ${args.columns.length}`);
    }
  }
  const groups = args.groups ?? [];
  if (groups.length > 0 && groups.reduce((a, g) => a + g.span, 0) !== args.columns.length) {
    throw new LayoutError(args.where, `the column groups span ${groups.reduce((a, g) => a + g.span, 0)} columns, expected ${args.columns.length}`);
  }
  const withHeader = args.header ?? true;
  // Widths come from every row of the table, also when only some of them are drawn here (a table split
  // over columns or pages keeps one set of widths).
  const all = args.measureRows ?? args.rows;
  // A group header wider than its columns widens the group's last column.
  const widen = (w: number[], size: number): number[] => {
    let first = 0;
    for (const g of groups) {
      const need = measureTextMm({ text: g.header, sizePt: size, weight: 'bold' }) + 2 * PAD_MM;
      const have = w.slice(first, first + g.span).reduce((a, b) => a + b, 0);
      if (g.header !== '' && need > have) w[first + g.span - 1] += need - have;
      first += g.span;
    }
    return w;
  };
  const measure = (size: number, rows: readonly (readonly Cell[])[]): number[] => widen(columnWidths(args.columns, rows, size, withHeader), size);
  let sizePt = args.sizePt;
  let rows = args.rows;
  let widths = measure(sizePt, all);
  let total = widths.reduce((a, b) => a + b, 0);
  let shortened = false;
  let wrapping = false;
  if (total > args.maxWidthMm) {
    // Text width is proportional to size and padding is fixed, so one step lands on the size that fits
    // (rounded down to 0.1 pt).
    const padTotal = 2 * PAD_MM * widths.length;
    sizePt = Math.floor(((sizePt * (args.maxWidthMm - padTotal)) / (total - padTotal)) * 10) / 10;
    if (!(sizePt >= args.minSizePt)) {
      sizePt = args.minSizePt;
      // At the smallest size, headers and `wrap` columns break onto more lines (at spaces) before any
      // name is shortened.
      const wrapped = wrappedWidths({ columns: args.columns, rows: all, sizePt, header: withHeader, maxWidthMm: args.maxWidthMm, natural: measure(sizePt, all) });
      if (wrapped) {
        widths = wrapped;
        wrapping = true;
      } else {
        const short = shortenColumns({ columns: args.columns, rows: all, widths: measure(sizePt, all), maxWidthMm: args.maxWidthMm, sizePt, header: withHeader });
        if (!short) {
          throw new LayoutError(args.where, `the table needs ${total.toFixed(0)} mm at ${args.sizePt} pt but has ${args.maxWidthMm.toFixed(0)} mm, and would need type under ${args.minSizePt} pt; use wider paper or fewer columns`);
        }
        const index = new Map(all.map((r, i) => [r, i]));
        rows = rows.map((r) => short[index.get(r) ?? 0]);
        shortened = true;
        widths = measure(sizePt, short);
      }
    } else {
      widths = measure(sizePt, all);
    }
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
  const linePitch = linePitchMm(sizePt, 'bold');
  const baselineOffset = 0.3 + ascentMm(sizePt, 'bold');
  const nodes: SceneNode[] = [];
  const lefts = widths.map((_, i) => args.x + widths.slice(0, i).reduce((a, b) => a + b, 0));
  // Each cell's lines: one line unless the table wraps, then as many as its column's width needs.
  const cellLines = (cell: { text: string; weight: FontWeight }, c: number, header: boolean): string[] =>
    wrapping && (header || args.columns[c].wrap) && measureTextMm({ text: cell.text, sizePt, weight: cell.weight }) > widths[c] - 2 * PAD_MM + 1e-9
      ? wrapLines({ text: cell.text, sizePt, weight: cell.weight, widthMm: widths[c] - 2 * PAD_MM, where: args.where })
      : [cell.text];
  const emitRow = (cells: readonly Cell[], top: number, header: boolean): number => {
    let most = 1;
    cells.forEach((raw, c) => {
      const cell = header ? { text: cellText(raw).text, weight: 'bold' as const, colour: INK } : cellText(raw);
      const right = args.columns[c].align === 'right';
      const lines = cellLines(cell, c, header);
      most = Math.max(most, lines.length);
      lines.forEach((text, i) =>
        nodes.push(
          label({
            x: right ? lefts[c] + widths[c] - PAD_MM : lefts[c] + PAD_MM,
            y: top + baselineOffset + i * linePitch,
            text,
            sizePt,
            weight: cell.weight,
            colour: cell.colour,
            anchor: right ? 'end' : 'start',
            role: header ? 'table-header' : 'table-cell',
            where: args.where,
          }),
        ),
      );
    });
    return most * linePitch + 0.6;
  };
  const groupRows = groups.length > 0 ? 1 : 0;
  const rowPitch = linePitch + 0.6;
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
  const bodyTop = withHeader ? headerTop + emitRow(args.columns.map((c) => c.header), headerTop, true) : headerTop;
  let top = bodyTop;
  rows.forEach((row, r) => {
    const at = nodes.length;
    const height = emitRow(row, top, false);
    if ((r + (args.firstRowIndex ?? 0)) % 2 === 1) nodes.splice(at, 0, { type: 'rect', role: 'table-zebra', x: args.x, y: top, width: total, height, fill: { colour: ZEBRA } });
    top += height;
  });
  const tableMm = top - args.y;
  const line = (y: number, w: number): SceneNode => ({ type: 'path', role: 'table-rule', segments: [{ op: 'M', x: args.x, y }, { op: 'L', x: args.x + total, y }], stroke: stroke(INK, w) });
  nodes.push(line(args.y, STROKE.rule), ...(withHeader ? [line(bodyTop, STROKE.rule)] : []), line(args.y + tableMm, STROKE.rule));
  const noteText = args.noNote ? '' : [args.extraNote ?? '', shortened ? SHORTENED_NOTE : ''].filter((t) => t !== '').join(' ');
  const note = noteText ? paragraph({ x: args.x, y: args.y + tableMm + 0.5, widthMm: args.maxWidthMm, text: noteText, sizePt: args.minSizePt, role: 'shortened-note', where: args.where }) : undefined;
  if (note) nodes.push(...note.nodes);
  const heightMm = note ? tableMm + 0.5 + note.heightMm : tableMm;
  return { nodes: [{ type: 'group', role: args.role ?? 'table', children: nodes }], heightMm, widthMm: total, sizePt };
}

/** Width (mm) of the widest single word of a text. */
function widestWordMm(text: string, sizePt: number, weight: FontWeight): number {
  return Math.max(0, ...text.split(/\s+/).filter((w) => w !== '').map((w) => measureTextMm({ text: w, sizePt, weight })));
}

/**
 * Column widths when headers and `wrap` columns may break at spaces, or undefined when even their widest
 * words leave the table too wide. Every column starts at the least it needs (its widest unbreakable
 * text); the room left goes to the columns that would wrap, in proportion to what each lacks.
 */
function wrappedWidths(args: { columns: readonly Column[]; rows: readonly (readonly Cell[])[]; sizePt: number; header: boolean; maxWidthMm: number; natural: readonly number[] }): number[] | undefined {
  const least = args.columns.map((col, c) => {
    let w = args.header ? widestWordMm(col.header, args.sizePt, 'bold') : 0;
    for (const row of args.rows) {
      const cell = cellText(row[c]);
      w = Math.max(w, col.wrap ? widestWordMm(cell.text, args.sizePt, cell.weight) : measureTextMm({ text: cell.text, sizePt: args.sizePt, weight: cell.weight }));
    }
    return Math.min(w + 2 * PAD_MM, args.natural[c]);
  });
  const spare = args.maxWidthMm - least.reduce((a, b) => a + b, 0);
  if (spare < 0) return undefined;
  const lack = least.map((w, c) => args.natural[c] - w);
  const lackTotal = lack.reduce((a, b) => a + b, 0);
  return least.map((w, c) => (lackTotal > 0 ? w + (spare * lack[c]) / lackTotal : w));
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
