/**
 * A repower comparison: one hull with each of its 2–6 repower options (boat.repowerOptions) in place of
 * its own install. Each option is the boat with that engine variant, jet unit and impeller swapped in and
 * its weight change added to the loaded displacement, analysed as any boat is (analyseBoat: the WOT band,
 * top speed, cruise rpm, fuel, time and range). The options stand on the makers' data (the data-sheet
 * model) so they compare alike: the boat's sea trials were run with its own install, so they calibrate
 * none of the options; only the hull constant a trial speed measured is kept, since it belongs to the hull.
 */
import type { Boat, Project, RepowerOption } from '../data/types.ts';
import { analyseBoat } from './boat.ts';
import type { CruiseRow } from './boatFigures.ts';
import type { BandResult, LimitsResult } from './results.ts';

export interface RepowerOptionResult {
  readonly label: string;
  readonly engineFamilyId: string;
  readonly engineVariantId: string;
  readonly engineLabel: string;
  readonly jetId: string;
  readonly jetLabel: string;
  readonly impellerId: string;
  readonly impellerLabel: string;
  /** 'yes' when the option is the boat's install as it is: same engine variant, jet and impeller, no weight change. */
  readonly fitted: 'yes' | 'no';
  /** The weight change the file gives, kg (negative: lighter). */
  readonly weightChangeKg?: number;
  /** Loaded displacement the speed estimates use, kg: the hull's plus the weight change. */
  readonly displacementKg: number;
  /** The option engine's limits (its own window and maximum). */
  readonly limits: LimitsResult;
  /** WOT band on the data-sheet model. */
  readonly wot: BandResult;
  /** Crouch top-speed estimate at the nominal WOT power, knots. */
  readonly topSpeedKn: number;
  /** Fuel at WOT, L/h. */
  readonly wotFuelLPerH: number;
  /** The boat's cruise settings with this option, as a boat's cruise rows. */
  readonly cruise: readonly CruiseRow[];
}

export interface RepowerResult {
  readonly boatId: string;
  /** In the file's order. */
  readonly options: readonly RepowerOptionResult[];
  /** Labels of the options whose most likely WOT rpm lies inside their engine's recommended window (status matched), in order. */
  readonly matchedLabels: readonly string[];
  /** The hull constant every option uses, and where it came from ('trial': measured on the boat's own sea trials). */
  readonly hull: { readonly crouchConstant: number; readonly source: string; readonly trialDates: readonly string[] };
  /** Share of the tank (%) the time and range figures keep in reserve. */
  readonly fuelReservePct: number;
}

/** The boat with an option's install in place of its own (trials dropped; a trial-measured hull constant kept as stated). */
export function repowerBoat(boat: Boat, option: RepowerOption, hullConstant?: number): Boat {
  const { repowerOptions: _options, ...rest } = boat;
  return {
    ...rest,
    engineFamilyId: option.engineFamilyId,
    engineVariantId: option.engineVariantId,
    engine: option.engine,
    jetId: option.jetId,
    jet: option.jet,
    impellerId: option.impellerId,
    hull: {
      ...boat.hull,
      displacementKg: boat.hull.displacementKg + (option.weightChangeKg ?? 0),
      ...(hullConstant !== undefined ? { crouchConstant: hullConstant } : {}),
    },
    trials: [],
  };
}

/** Whether an option is the boat's install as it is. */
function isFitted(boat: Boat, o: RepowerOption): boolean {
  return o.engine === boat.engine && o.jetId === boat.jetId && o.impellerId === boat.impellerId && (o.weightChangeKg ?? 0) === 0;
}

/**
 * The comparison of a boat's repower options (powers kW, speeds rpm, boat speeds knots); undefined for a
 * boat without options. Remembered per (boat, project) like analyseBoat.
 */
export function analyseRepower(args: { boat: Boat; project: Project }): RepowerResult | undefined {
  if (!args.boat.repowerOptions) return undefined;
  let perProject = REMEMBERED.get(args.boat);
  if (!perProject) {
    perProject = new WeakMap();
    REMEMBERED.set(args.boat, perProject);
  }
  let result = perProject.get(args.project);
  if (!result) {
    result = computeRepower(args.boat, args.project, args.boat.repowerOptions);
    perProject.set(args.project, result);
  }
  return result;
}

const REMEMBERED = new WeakMap<Boat, WeakMap<Project, RepowerResult>>();

function computeRepower(boat: Boat, project: Project, options: readonly RepowerOption[]): RepowerResult {
  const own = analyseBoat({ boat, project }).estimates;
  const measured = own.hull.source === 'trial' ? own.hull.crouchConstant : undefined;
  const results = options.map((o): RepowerOptionResult => {
    const swapped = repowerBoat(boat, o, measured);
    const r = analyseBoat({ boat: swapped, project });
    return {
      label: o.label,
      engineFamilyId: o.engineFamilyId,
      engineVariantId: o.engineVariantId,
      engineLabel: o.engine.label,
      jetId: o.jetId,
      jetLabel: o.jet.label,
      impellerId: o.impellerId,
      impellerLabel: r.impellerLabel,
      fitted: isFitted(boat, o) ? 'yes' : 'no',
      ...(o.weightChangeKg !== undefined ? { weightChangeKg: o.weightChangeKg } : {}),
      displacementKg: swapped.hull.displacementKg,
      limits: r.limits,
      wot: r.wot,
      topSpeedKn: r.estimates.wotSpeedKn,
      wotFuelLPerH: r.estimates.wotFuelLPerH,
      cruise: r.cruise,
    };
  });
  return {
    boatId: boat.id,
    options: results,
    matchedLabels: results.filter((o) => o.wot.nominal.status === 'matched').map((o) => o.label),
    hull: { crouchConstant: own.hull.crouchConstant, source: own.hull.source, trialDates: own.hull.trialDates },
    fuelReservePct: own.fuelReservePct,
  };
}
