// The front page. Templates stay thin: the page is built by src/build/pages.
import { indexPage } from '../src/build/pages/pages.ts';
import type { SiteData } from '../src/build/siteView.ts';

export const data = { permalink: 'index.html' };

export function render(d: { site: SiteData }): string {
  return indexPage(d.site.view);
}
