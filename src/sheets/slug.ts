/** Stable file names for sheets. */
import type { SheetRequest } from '../data/types.ts';

/** "wall-chart-<family>-<jet>", "spec-<boat>", "card-<boat>", "upgrade-<boat>", "repower-<boat>". */
export function sheetSlug(request: SheetRequest): string {
  switch (request.kind) {
    case 'wallChart':
      return `wall-chart-${request.engineFamilyId}-${request.jetId}`;
    case 'specSheet':
      return `spec-${request.boatId}`;
    case 'consoleCard':
      return `card-${request.boatId}`;
    case 'upgradeSheet':
      return `upgrade-${request.boatId}`;
    case 'repowerSheet':
      return `repower-${request.boatId}`;
  }
}
