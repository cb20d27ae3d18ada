/** PDF bookmarks (document outline): one entry per page, built from low-level pdf-lib objects. */
import { PDFHexString, PDFName } from 'pdf-lib';
import type { PDFDocument, PDFRef } from 'pdf-lib';

/** Adds a flat outline whose i-th entry opens page i (whole page in view). */
export function addOutline(doc: PDFDocument, titles: readonly string[]): void {
  const pages = doc.getPages();
  if (titles.length !== pages.length) {
    throw new RangeError(`the outline has ${titles.length} titles for ${pages.length} pages; give one title per page`);
  }
  if (titles.length === 0) return;
  const { context } = doc;
  const outlineRef = context.nextRef();
  const itemRefs: PDFRef[] = titles.map(() => context.nextRef());
  titles.forEach((title, i) => {
    const item = context.obj({});
    item.set(PDFName.of('Title'), PDFHexString.fromText(title));
    item.set(PDFName.of('Parent'), outlineRef);
    item.set(PDFName.of('Dest'), context.obj([pages[i].ref, PDFName.of('Fit')]));
    if (i > 0) item.set(PDFName.of('Prev'), itemRefs[i - 1]);
    if (i < titles.length - 1) item.set(PDFName.of('Next'), itemRefs[i + 1]);
    context.assign(itemRefs[i], item);
  });
  const outline = context.obj({ Type: 'Outlines', Count: titles.length });
  outline.set(PDFName.of('First'), itemRefs[0]);
  outline.set(PDFName.of('Last'), itemRefs[itemRefs.length - 1]);
  context.assign(outlineRef, outline);
  doc.catalog.set(PDFName.of('Outlines'), outlineRef);
  doc.catalog.set(PDFName.of('PageMode'), PDFName.of('UseOutlines'));
}
