/** PDF bookmarks (document outline): one entry per page, built from low-level pdf-lib objects. */
import { PDFHexString, PDFName } from 'pdf-lib';
import type { PDFDocument, PDFRef } from 'pdf-lib';

/**
 * Adds a flat outline: byPage[i], when given, is a bookmark that opens page i (whole page in view); a
 * page whose entry is undefined gets none (a sheet's further pages).
 */
export function addOutline(doc: PDFDocument, byPage: readonly (string | undefined)[]): void {
  const allPages = doc.getPages();
  if (byPage.length !== allPages.length) {
    throw new RangeError(`the outline has ${byPage.length} entries for ${allPages.length} pages; give one entry per page`);
  }
  const marked = byPage.flatMap((title, i) => (title === undefined ? [] : [{ title, page: allPages[i] }]));
  if (marked.length === 0) return;
  const titles = marked.map((m) => m.title);
  const pages = marked.map((m) => m.page);
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
