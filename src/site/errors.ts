/**
 * A sheet that cannot be drawn from the data as given (it does not fit its paper, or a name holds a
 * character the font lacks) is a problem the user fixes in the data, not a fault in matchbook: it is
 * reported with the sheet's name, the reason and the fix, and the build exits with status 1.
 */

/** Errors of src/sheets, src/render and src/model (figures it cannot compute with) the user fixes; told apart by name, as they may come from a worker. */
const USER_FIXABLE = new Set(['LayoutError', 'UnsupportedCharacterError', 'ModelInputError']);

export class SheetDrawError extends Error {
  constructor(
    readonly slug: string,
    cause: Error,
  ) {
    super(`sheet ${slug} cannot be drawn: ${cause.message}`, { cause });
    this.name = 'SheetDrawError';
  }
}

/** A drawing error the user fixes in the data (as opposed to a fault in matchbook). */
export function isUserFixable(error: unknown): error is Error {
  return error instanceof Error && USER_FIXABLE.has(error.name);
}

/** Runs fn; turns the two user-fixable drawing errors into a SheetDrawError naming the sheet. */
export async function drawingSheet<T>(slug: string, fn: () => T | Promise<T>): Promise<T> {
  try {
    return await fn();
  } catch (error) {
    if (isUserFixable(error)) throw new SheetDrawError(slug, error);
    throw error;
  }
}
