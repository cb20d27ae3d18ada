/** What a match chart draws per series: an impeller's absorption law and an engine variant's curves. */
import type { EngineCurve } from '../../analysis/index.ts';
import type { PowerLaw } from '../kit/curves.ts';
import type { SeriesStyle } from '../kit/style.ts';

export interface ImpellerSeries {
  readonly id: string;
  readonly label: string;
  readonly law: PowerLaw;
  /** Rating tolerance as a fraction (0.05 = ±5 %). */
  readonly tolerance: number;
  readonly style: SeriesStyle;
}

export interface EngineSeries {
  readonly id: string;
  readonly label: string;
  readonly site: EngineCurve;
  /** The published curve, drawn thin and dashed when it differs from the site curve. */
  readonly reference?: EngineCurve;
  readonly referenceLabel?: string;
  /** Line width (mm); variants differ by weight as well as label. */
  readonly widthMm: number;
  readonly dashMm: readonly number[];
}
