/** What every sheet builder receives besides its request. */
import type { Boat, Project } from '../data/types.ts';
import { LayoutError } from './kit/errors.ts';

export interface SheetContext {
  readonly project: Project;
  /** ISO date printed on the sheet (YYYY-MM-DD). */
  readonly dateIso: string;
}

/** The boat a request names, or a LayoutError naming the ids that exist. */
export function findBoat(ctx: SheetContext, boatId: string, where: string): Boat {
  const boat = ctx.project.boats.find((b) => b.id === boatId);
  if (!boat) throw new LayoutError(where, `no boat "${boatId}" in the project; known boats: ${ctx.project.boats.map((b) => b.id).join(', ') || 'none'}`);
  return boat;
}
