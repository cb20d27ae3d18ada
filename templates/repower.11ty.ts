// One repower comparison page per boat that lists repower options (paginated over the site's comparisons).
import { repowerPage } from '../src/site/pages/pages.ts';
import type { RepowerView, SiteData } from '../src/site/siteView.ts';

export const data = {
  pagination: { data: 'site.repowers', size: 1, alias: 'repower' },
  permalink: (d: { repower: RepowerView }) => d.repower.href,
};

export function render(d: { site: SiteData; repower: RepowerView }): string {
  return d.site.page(`repower ${d.repower.boatId}`, () => repowerPage(d.site.view, d.repower));
}
