// One page per engine family (paginated over the site's families).
import { familyPage } from '../src/site/pages/pages.ts';
import type { FamilyView, SiteData } from '../src/site/siteView.ts';

export const data = {
  pagination: { data: 'site.families', size: 1, alias: 'family' },
  permalink: (d: { family: FamilyView }) => d.family.href,
};

export function render(d: { site: SiteData; family: FamilyView }): string {
  return d.site.page(`family ${d.family.id}`, () => familyPage(d.site.view, d.family));
}
