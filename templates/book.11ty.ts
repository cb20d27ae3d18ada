// One page per chart book (paginated over the site's books).
import { bookPage } from '../src/site/pages/pages.ts';
import type { BookView, SiteData } from '../src/site/siteView.ts';

export const data = {
  pagination: { data: 'site.books', size: 1, alias: 'book' },
  permalink: (d: { book: BookView }) => d.book.href,
};

export function render(d: { site: SiteData; book: BookView }): string {
  return d.site.page(`book ${d.book.id}`, () => bookPage(d.site.view, d.book));
}
