// One page per boat (paginated over the site's boats).
import { boatPage } from '../src/site/pages/pages.ts';
import type { BoatView, SiteData } from '../src/site/siteView.ts';

export const data = {
  pagination: { data: 'site.boats', size: 1, alias: 'boat' },
  permalink: (d: { boat: BoatView }) => d.boat.href,
};

export function render(d: { site: SiteData; boat: BoatView }): string {
  return d.site.page(`boat ${d.boat.id}`, () => boatPage(d.site.view, d.boat));
}
