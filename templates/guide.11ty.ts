// One page per user guide of docs/ (paginated over the site's guides).
import { guidePage } from '../src/site/pages/guidePage.ts';
import type { GuideView, SiteData } from '../src/site/siteView.ts';

export const data = {
  pagination: { data: 'site.guides', size: 1, alias: 'guide' },
  permalink: (d: { guide: GuideView }) => d.guide.href,
};

export function render(d: { site: SiteData; guide: GuideView }): string {
  return d.site.page(`guide ${d.guide.slug}`, () => guidePage(d.site.view, d.guide));
}
