/**
 * Figures the model cannot compute with: a non-finite or out-of-range input, or a solver that met a
 * NaN. The data layer's ranges keep every loaded value clear of these; should one still arise, this
 * typed error (told apart by its name, as it may cross a worker thread) is reported by `check` and
 * `build` at the definition that asked for the sheet, like a sheet that does not fit, never as a fault.
 */
export class ModelInputError extends RangeError {
  constructor(message: string) {
    super(message);
    this.name = 'ModelInputError';
  }
}
