/**
 * Scenes → one PDF, one page per scene, text in the embedded (subset) Source Sans 3 TrueType fonts.
 * Deterministic: dates come from opts.dateIso, the document ID is a hash of the content's
 * identity, and subset font tags come from the characters each subset holds. Tagged, with TrimBox and
 * BleedBox on every page, black and greys in DeviceGray (the black ink alone).
 */
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import fontkit from '@pdf-lib/fontkit';
import { PDFDocument, PDFHexString, PDFName, PDFNumber, PDFString } from 'pdf-lib';
import type { PDFFont, PDFPage, PDFRef } from 'pdf-lib';
import { FONT_FILES, SHAPING_FEATURES } from '../scene/fonts.ts';
import { memoiseLayout } from '../scene/shapingCache.ts';
import { printableText } from '../scene/text.ts';
import type { FontWeight, Scene, SceneNode } from '../scene/types.ts';
import { addOutline } from './pdfOutline.ts';
import { drawScene } from './pdfPage.ts';

const PT_PER_MM = 72 / 25.4;

/** The part of a fontkit font whose glyph cache withStableCodePoints guards. */
interface GlyphSource {
  getGlyph(id: number, codePoints?: number[]): { codePoints: number[] } | null;
}

/**
 * fontkit keeps one glyph object per glyph id and stores in it the code points of the first call that
 * asked for it. A TrueType subset asks for the components of a composite glyph with none (the curly
 * quotes of Source Sans 3 are built from its apostrophe, the colon and ellipsis from its full stop), so
 * on a shared font a document that drew "”" first would leave the apostrophe glyph with no characters,
 * and every later document would lose the apostrophe from its ToUnicode table (text extraction, search
 * and the file's bytes would depend on the order sheets were drawn in). Each call here gets its own
 * view of the cached glyph (Object.create: every other property is the glyph's own) carrying the code
 * points of that call, so what one document asked for never reaches another.
 */
export function withStableCodePoints<F extends GlyphSource>(font: F): F {
  const cached = font.getGlyph.bind(font);
  const view: F = Object.create(font);
  Object.defineProperty(view, 'getGlyph', {
    value: (id: number, codePoints: number[] = []) => {
      const glyph = cached(id, codePoints);
      return glyph && Object.create(glyph, { codePoints: { value: codePoints, enumerable: true } });
    },
  });
  return view;
}

/**
 * pdf-lib asks fontkit to open the font for every document and shapes every string twice (width and
 * encoding). Opening each weight once and remembering its layouts makes a sheet's PDF several times
 * faster; each document still takes its own subset (createSubset is per embedder), and its glyphs
 * carry their own code points (withStableCodePoints).
 */
const sharedFontkit = (() => {
  const opened = new Map<string, ReturnType<typeof fontkit.create>>();
  return {
    create(data: Uint8Array, postscriptName?: string) {
      const key = createHash('sha256').update(data).digest('hex');
      let font = opened.get(key);
      if (!font) {
        font = memoiseLayout(withStableCodePoints(fontkit.create(data, postscriptName)));
        opened.set(key, font);
      }
      return font;
    },
  };
})();

const fontBytes = (() => {
  const read = new Map<FontWeight, Uint8Array>();
  return (weight: FontWeight): Uint8Array => {
    let bytes = read.get(weight);
    if (!bytes) {
      bytes = readFileSync(FONT_FILES[weight]);
      read.set(weight, bytes);
    }
    return bytes;
  };
})();
const FONT_NAMES: Readonly<Record<FontWeight, string>> = { regular: 'SourceSans3-Regular', bold: 'SourceSans3-Bold' };

/**
 * A subset font's name: a six-capital-letter tag, '+', the font's name (ISO 32000-1 §9.6.4). The tag is
 * drawn from the set of characters the subset holds, so two files with different subsets never carry
 * the same tag (a print shop merging or imposing files would otherwise mix up their glyphs), and the
 * same text always gives the same tag (reproducible builds).
 */
export function subsetName(weight: FontWeight, characters: ReadonlySet<string>): string {
  const digest = createHash('sha256').update(`${weight}\n${[...characters].sort().join('')}`).digest();
  const tag = Array.from(digest.subarray(0, 6), (byte) => String.fromCharCode(65 + (byte % 26))).join('');
  return `${tag}+${FONT_NAMES[weight]}`;
}

export interface PdfOptions {
  readonly title: string;
  readonly subject: string;
  readonly keywords: readonly string[];
  readonly author?: string;
  /** YYYY-MM-DD; creation and modification date (midnight UTC). */
  readonly dateIso: string;
  /**
   * Bookmark titles, one per page (undefined: no bookmark at that page, as on a sheet's further pages);
   * default: the scene titles when there is more than one page.
   */
  readonly outline?: readonly (string | undefined)[];
}

/** The characters each weight draws (as printed: printableText), for the subset tags. */
function charactersUsed(node: SceneNode, found: Map<FontWeight, Set<string>>): Map<FontWeight, Set<string>> {
  if (node.type === 'text') {
    let set = found.get(node.weight);
    if (!set) found.set(node.weight, (set = new Set()));
    for (const ch of printableText(node.text)) set.add(ch);
  }
  if (node.type === 'group') for (const child of node.children) charactersUsed(child, found);
  return found;
}

function parseDate(dateIso: string): Date {
  const date = new Date(`${dateIso}T00:00:00Z`);
  if (!/^\d{4}-\d{2}-\d{2}$/.test(dateIso) || Number.isNaN(date.getTime())) {
    throw new RangeError(`the PDF date must be YYYY-MM-DD, found "${dateIso}"`);
  }
  return date;
}

/** A PDF (bytes) with one page per scene, page size in points from the scene's mm media size. */
export async function renderPdf(scenes: readonly Scene[], opts: PdfOptions): Promise<Uint8Array> {
  const date = parseDate(opts.dateIso);
  if (scenes.length === 0) throw new RangeError(`the PDF "${opts.title}" has no pages; give it at least one sheet`);
  const doc = await PDFDocument.create({ updateMetadata: false });
  doc.registerFontkit(sharedFontkit as unknown as typeof fontkit);
  const used = new Map<FontWeight, Set<string>>();
  for (const scene of scenes) charactersUsed(scene.root, used);
  const fonts: Record<FontWeight, PDFFont | undefined> = { regular: undefined, bold: undefined };
  for (const weight of ['regular', 'bold'] as const) {
    const characters = used.get(weight);
    if (!characters) continue;
    fonts[weight] = await doc.embedFont(fontBytes(weight), {
      subset: true,
      customName: subsetName(weight, characters),
      // A fresh object each time: the shaping engine writes its defaults into the object it is given.
      features: { ...SHAPING_FEATURES },
    });
  }
  const pages = scenes.map((scene) => {
    const page = doc.addPage([scene.widthMm * PT_PER_MM, scene.heightMm * PT_PER_MM]);
    drawScene({ page, scene, fonts });
    return page;
  });
  tagStructure(doc, pages.map((page, i) => ({ page, alt: `${scenes[i].title}. ${scenes[i].description}` })));
  const outline = opts.outline ?? (scenes.length > 1 ? scenes.map((s) => s.title) : undefined);
  if (outline) addOutline(doc, outline);

  doc.setTitle(opts.title, { showInWindowTitleBar: true });
  doc.setSubject(opts.subject);
  doc.setKeywords([...opts.keywords]);
  if (opts.author !== undefined) doc.setAuthor(opts.author);
  doc.setCreator('matchbook');
  doc.setProducer('matchbook with pdf-lib');
  doc.setCreationDate(date);
  doc.setModificationDate(date);
  doc.catalog.set(PDFName.of('Lang'), PDFString.of('en-GB'));
  // A stable document ID (both halves equal: this is an original, not a revision).
  const identity = JSON.stringify([opts.title, opts.subject, opts.dateIso, scenes.map((s) => s.title)]);
  const id = PDFHexString.of(createHash('sha256').update(identity).digest('hex').slice(0, 32));
  doc.context.trailerInfo.ID = doc.context.obj([id, id]);
  return doc.save();
}

/**
 * A tagged PDF (ISO 32000-1 §14.7–14.8): a Document structure element holding one Figure per page, in
 * page order (the reading order), each with the sheet's title and description as its alternative text
 * and the page's whole content (marked content MCID 0, see drawScene) as its content.
 */
function tagStructure(doc: PDFDocument, pages: readonly { page: PDFPage; alt: string }[]): void {
  const { context } = doc;
  const rootRef = context.nextRef();
  const documentRef = context.nextRef();
  const figures: PDFRef[] = pages.map(({ page, alt }, i) => {
    page.node.set(PDFName.of('StructParents'), PDFNumber.of(i));
    return context.register(context.obj({ Type: 'StructElem', S: 'Figure', P: documentRef, Pg: page.ref, K: 0, Alt: PDFString.of(alt) }));
  });
  context.assign(documentRef, context.obj({ Type: 'StructElem', S: 'Document', P: rootRef, K: figures }));
  const nums = pages.flatMap((_, i) => [PDFNumber.of(i), context.obj([figures[i]])]);
  context.assign(rootRef, context.obj({ Type: 'StructTreeRoot', K: documentRef, ParentTree: context.obj({ Nums: nums }), ParentTreeNextKey: pages.length }));
  doc.catalog.set(PDFName.of('StructTreeRoot'), rootRef);
  doc.catalog.set(PDFName.of('MarkInfo'), context.obj({ Marked: true }));
}
