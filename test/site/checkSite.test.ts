/**
 * `check` lays out every sheet the build draws (same plan, same scene code, no rendering), and a sheet
 * that cannot be laid out is said at the definition that asked for it, never only by its slug.
 */
import { describe, expect, it } from 'vitest';
import { loadProject } from '../../src/data/load.ts';
import type { JetUnit, Project } from '../../src/data/types.ts';
import { LayoutError } from '../../src/sheets/index.ts';
import { checkSite } from '../../src/site/checkSite.ts';
import { SheetDrawError } from '../../src/site/errors.ts';
import { planSheets } from '../../src/site/planSheets.ts';
import { layoutProblems, sheetDrawProblem } from '../../src/site/sheetProblems.ts';

async function demo(): Promise<Project> {
  const r = await loadProject('data');
  if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('\n'));
  return r.project;
}

/** The demo with one jet given n impellers (far past what a wall chart holds), built in memory past the loader's limits. */
function withImpellers(project: Project, jetId: string, n: number): Project {
  const jet = project.jets.find((j) => j.id === jetId)!;
  const extra = Array.from({ length: n - jet.impellers.length }, (_, i) => ({ ...jet.impellers[0], id: `x${i}`, label: `X${i}-EXTRA-LABEL`, ratingKw: 1 + i * 0.05 }));
  const bigger: JetUnit = { ...jet, impellers: [...jet.impellers, ...extra] };
  return {
    ...project,
    jets: project.jets.map((j) => (j.id === jetId ? bigger : j)),
    boats: project.boats.map((b) => (b.jetId === jetId ? { ...b, jet: bigger } : b)),
  };
}

describe('check lays out what build draws', () => {
  it('passes the demo with the same one-line summary as before', async () => {
    const report = await checkSite('data', { sourceDateEpoch: '1767225600' });
    expect(report).toEqual({ exitCode: 0, text: 'OK data: 3 engine families (6 variants), 2 jet units (11 impellers), 6 boats (9 sea trials), 3 books (16 sheets), 0 warnings\n' });
  });

  it('lays out every planned sheet of the demo without a problem', async () => {
    const project = await demo();
    // 3 default wall charts (the pairings boats use), 3 sheets for each of 6 boats, the repower comparison
    // of the one boat that lists options, 5 more the books ask for (a salt-water wall chart, the Letter spec
    // sheet, three 4 × 6 in cards); the books' other two wall charts and the comparison are the site's own.
    expect(planSheets(project).sheets.length).toBe(27);
    expect(layoutProblems(project, { dateIso: '2026-01-01' })).toEqual([]);
  });

  it('says a wall chart that cannot be laid out at the jet file\'s impellers: line and at the book entry that asks for it', async () => {
    const project = withImpellers(await demo(), 'kelpspindle-riffle', 200);
    const problems = layoutProblems(project, { dateIso: '2026-01-01' }).filter((e) => e.expected.startsWith('asks for a wall chart'));
    const places = problems.map((e) => `${e.file}:${e.line}:${e.column} ${e.field}`);
    // 200 impellers (past the limit of 24, which the loader refuses first) do not fit even four row pages.
    // A default wall chart no book lists (thimblefinch-trotter): the jet's impellers list (line 10 of the demo file).
    expect(places).toContain('data/jets/kelpspindle-riffle.yaml:10:1 impellers');
    // The book's wall charts of the pairing: sheets[0] (which is copperwhistle-strider's default chart) and sheets[2].
    expect(places).toContain('data/books/shop-wall-charts.yaml:13:5 sheets[0]');
    expect(places).toContain('data/books/shop-wall-charts.yaml:21:5 sheets[2]');
    expect(places.length).toBe(3);
    const first = problems.find((e) => e.file === 'data/jets/kelpspindle-riffle.yaml')!;
    expect(first.message).toMatch(
      /^data\/jets\/kelpspindle-riffle\.yaml:10:1 impellers asks for a wall chart \(engine family thimblefinch-trotter with jet kelpspindle-riffle, A3 landscape; file wall-chart-\S+\) that must fit its paper, found 200 impellers × \d engine variants .* — use larger paper, fewer impellers per jet \(at most 24\)/,
    );
  });

  it('words a SheetDrawError from a build at the definition, not the slug alone', async () => {
    const project = await demo();
    const error = new SheetDrawError('upgrade-greyling', new LayoutError('upgrade-greyling: results table', 'the content is 4.5 mm too tall for the sheet; use larger paper or fewer rows'));
    const e = sheetDrawProblem(project, error);
    expect(e.message).toBe(
      'data/boats/greyling.yaml:4:1 name asks for an upgrade sheet (boat greyling, A4 portrait; file upgrade-greyling) that must fit its paper, found the content is 4.5 mm too tall for the sheet — use larger paper or fewer rows',
    );
  });
});
