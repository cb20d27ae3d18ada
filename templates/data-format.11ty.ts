// The data-format page with links to the JSON Schemas.
import { dataFormatPage } from '../src/site/pages/dataFormatPage.ts';
import type { SiteData } from '../src/site/siteView.ts';

export const data = { permalink: 'data-format/index.html' };

export function render(d: { site: SiteData }): string {
  return dataFormatPage(d.site.view);
}
