/** Raised when a sheet cannot be laid out without clipping, overlapping or printing a bad value. */
export class LayoutError extends Error {
  /** Which sheet and which part of it ("wall-chart-x-y: results table"). */
  readonly where: string;
  constructor(where: string, message: string, options?: { cause?: unknown }) {
    super(`${where}: ${message}`, options);
    this.name = 'LayoutError';
    this.where = where;
  }
}
