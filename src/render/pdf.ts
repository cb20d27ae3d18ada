/**
 * Scenes → one PDF, one page per scene, text in the embedded (subset) Source Sans 3 TrueType fonts.
 * Deterministic: dates come from opts.dateIso, the document ID is a hash of the content's
 * identity, and subset font names are fixed per weight.
 */
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import fontkit from '@pdf-lib/fontkit';
import { PDFDocument, PDFHexString, PDFName, PDFString } from 'pdf-lib';
import type { PDFFont } from 'pdf-lib';
import { FONT_FILES, SHAPING_FEATURES } from '../scene/fonts.ts';
import { memoiseLayout } from '../scene/shapingCache.ts';
import type { FontWeight, Scene, SceneNode } from '../scene/types.ts';
import { addOutline } from './pdfOutline.ts';
import { drawScene } from './pdfPage.ts';

const PT_PER_MM = 72 / 25.4;

/**
 * pdf-lib asks fontkit to open the font for every document and shapes every string twice (width and
 * encoding). Opening each weight once and remembering its layouts makes a sheet's PDF several times
 * faster; each document still takes its own subset (createSubset is per embedder).
 */
const sharedFontkit = (() => {
  const opened = new Map<string, ReturnType<typeof fontkit.create>>();
  return {
    create(data: Uint8Array, postscriptName?: string) {
      const key = createHash('sha256').update(data).digest('hex');
      let font = opened.get(key);
      if (!font) {
        font = memoiseLayout(fontkit.create(data, postscriptName));
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
// Subset fonts carry a six-letter tag and '+' before the name (ISO 32000-1 §9.6.4); fixed per weight.
const SUBSET_NAMES: Readonly<Record<FontWeight, string>> = { regular: 'MBKREG+SourceSans3-Regular', bold: 'MBKBLD+SourceSans3-Bold' };

export interface PdfOptions {
  readonly title: string;
  readonly subject: string;
  readonly keywords: readonly string[];
  readonly author?: string;
  /** YYYY-MM-DD; creation and modification date (midnight UTC). */
  readonly dateIso: string;
  /** Bookmark titles, one per page; default: the scene titles when there is more than one page. */
  readonly outline?: readonly string[];
}

function weightsUsed(node: SceneNode, found: Set<FontWeight>): Set<FontWeight> {
  if (node.type === 'text') found.add(node.weight);
  if (node.type === 'group') for (const child of node.children) weightsUsed(child, found);
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
  const used = new Set<FontWeight>();
  for (const scene of scenes) weightsUsed(scene.root, used);
  const fonts: Record<FontWeight, PDFFont | undefined> = { regular: undefined, bold: undefined };
  for (const weight of ['regular', 'bold'] as const) {
    if (!used.has(weight)) continue;
    fonts[weight] = await doc.embedFont(fontBytes(weight), {
      subset: true,
      customName: SUBSET_NAMES[weight],
      // A fresh object each time: the shaping engine writes its defaults into the object it is given.
      features: { ...SHAPING_FEATURES },
    });
  }
  for (const scene of scenes) {
    const page = doc.addPage([scene.widthMm * PT_PER_MM, scene.heightMm * PT_PER_MM]);
    drawScene({ page, scene, fonts });
  }
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
  doc.catalog.set(PDFName.of('Lang'), PDFString.of('en'));
  // A stable document ID (both halves equal: this is an original, not a revision).
  const identity = JSON.stringify([opts.title, opts.subject, opts.dateIso, scenes.map((s) => s.title)]);
  const id = PDFHexString.of(createHash('sha256').update(identity).digest('hex').slice(0, 32));
  doc.context.trailerInfo.ID = doc.context.obj([id, id]);
  return doc.save();
}
