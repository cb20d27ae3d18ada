/**
 * `matchbook check` as the build sees the data: the definitions (src/data), then the text the sheet
 * font cannot print, then every sheet of the build laid out with the same plan and scene code (no
 * rendering). So `check` OK means `build` OK, and `check` lists every problem in one run.
 */
import { checkReport, type CheckReport } from '../data/check.ts';
import { loadProject } from '../data/load.ts';
import type { PrintOverride } from '../standards/paper.ts';
import { buildDateIso } from './dateIso.ts';
import { layoutProblems } from './sheetProblems.ts';
import { unprintableText } from './unprintable.ts';

export async function checkSite(dataDir: string, opts: { sourceDateEpoch?: string; print?: PrintOverride } = {}): Promise<CheckReport> {
  const loaded = await loadProject(dataDir);
  if (!loaded.ok) return checkReport({ dataDir, errors: loaded.errors, warnings: loaded.warnings });
  const { project } = loaded;
  const unprintable = unprintableText(project, { dataDir });
  const dateIso = buildDateIso({ sourceDateEpoch: opts.sourceDateEpoch, issueDate: project.site.issueDate });
  // A character the font lacks would stop its sheets' layout too; it is already reported where it was typed.
  const layout = layoutProblems(project, { dateIso, print: opts.print }).filter((e) => unprintable.length === 0 || !/has no glyph/.test(e.found));
  return checkReport({ dataDir, errors: [...unprintable, ...layout], warnings: loaded.warnings, project });
}
