// The front page. Templates stay thin: the page is built by src/site/pages.
import { indexPage } from '../src/site/pages/pages.ts';
import type { SiteData } from '../src/site/siteView.ts';

export const data = { permalink: 'index.html' };

export function render(d: { site: SiteData }): string {
  return d.site.page('index', () => indexPage(d.site.view));
}
