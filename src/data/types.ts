/**
 * The validated, unit-normalised project that src/data hands to everything after it.
 * Built only by the loader (src/data/load.ts); never half-built: a load returns either a Project
 * or a list of located errors.
 */
import type {
  Ambient,
  DriveLineSpec,
  EngineSpec,
  Fuel,
  ImpellerFamilySpec,
  ImpellerSpec,
} from '../model/types.ts';
import type { Paper } from '../standards/paper.ts';

/** Where a definition came from, for messages and the site ("data/boats/river-runner.yaml"). */
export interface SourceRef {
  readonly file: string;
}

export interface EngineFamily {
  /** Lower-case slug; also the file name. */
  readonly id: string;
  readonly label: string;
  /** Fictional maker name in the demo. */
  readonly maker: string;
  readonly fuel: Fuel;
  readonly notes?: string;
  /** One EngineSpec per variant (tune); EngineSpec.id is "familyId/variantId". */
  readonly variants: readonly EngineVariant[];
  readonly source: SourceRef;
}

export interface EngineVariant extends EngineSpec {
  readonly familyId: string;
  readonly variantId: string;
  /** The variant's own label ("271 kW race"); EngineSpec.label is family label + variant label. */
  readonly variantLabel: string;
  readonly notes?: string;
}

export interface JetUnit {
  readonly id: string;
  readonly label: string;
  readonly maker: string;
  readonly family: ImpellerFamilySpec;
  /** In the order the file lists them (conventionally lightest first). */
  readonly impellers: readonly ImpellerSpec[];
  readonly notes?: string;
  readonly source: SourceRef;
}

export type WaterKind = 'fresh' | 'salt' | 'custom';

export interface Water {
  readonly kind: WaterKind;
  readonly densityKgM3: number;
}

/** Where the boat runs. altitudeM is kept when the file gave altitude rather than pressure. */
export interface Site {
  readonly label: string;
  readonly ambient: Ambient;
  readonly altitudeM?: number;
}

/** The site fields a file gives (kPa, °C, %), laid over another site for the ones it leaves out. */
export interface SiteFields {
  readonly label?: string;
  readonly pressureKpa?: number;
  /** Given with pressureKpa when the file gave an altitude. */
  readonly altitudeM?: number;
  readonly airTempC?: number;
  readonly relativeHumidityPct?: number;
}

/** A cruise setting of interest: by power, by engine rpm, or by boat speed (knots). */
export type CruiseSetting =
  | { readonly kind: 'power'; readonly label: string; readonly powerKw: number }
  | { readonly kind: 'rpm'; readonly label: string; readonly speedRpm: number }
  | { readonly kind: 'speed'; readonly label: string; readonly speedKn: number; /** The speed as typed, to print unchanged in its own unit. */ readonly typed?: { readonly value: number; readonly unit: SpeedUnit } };

export type HullType = 'runabout' | 'cruiser' | 'high-speed-runabout' | 'workboat' | 'race';

export interface Hull {
  readonly description: string;
  readonly type: HullType;
  /** Loaded displacement used for speed estimates. */
  readonly displacementKg: number;
  /** Crouch hull constant when the file states one. */
  readonly crouchConstant?: number;
}

/** One sea-trial record: what was measured at WOT with a given impeller. */
export interface SeaTrial {
  /** ISO date, YYYY-MM-DD. */
  readonly date: string;
  readonly impellerId: string;
  readonly wotRpm: number;
  readonly speedKn?: number;
  /** Load aboard beyond the hull's displacement (people, gear), kg. */
  readonly loadKg?: number;
  /** Conditions of the trial; the boat's site when the record gives none. */
  readonly ambient: Ambient;
  readonly water: Water;
  readonly notes?: string;
  /** Who ran the trial (a trial log's recorded_by column). */
  readonly recordedBy?: string;
  /** Where the trial is written: the boat file's line, or the trial log's row. */
  readonly origin?: { readonly file: string; readonly line: number };
}

/**
 * One option of a repower comparison: the boat with this engine variant, jet unit and impeller in place
 * of its own (each resolved: the boat's own where the file left it out), and the weight it adds.
 */
export interface RepowerOption {
  readonly label: string;
  readonly engineFamilyId: string;
  readonly engineVariantId: string;
  readonly engine: EngineVariant;
  readonly jetId: string;
  readonly jet: JetUnit;
  readonly impellerId: string;
  /** Weight the option adds to the loaded boat, kg (negative: lighter); absent when the file gives none. */
  readonly weightChangeKg?: number;
}

export interface Boat {
  readonly id: string;
  readonly name: string;
  readonly hull: Hull;
  readonly engineFamilyId: string;
  readonly engineVariantId: string;
  /** The resolved engine variant (same object as in the family). */
  readonly engine: EngineVariant;
  readonly jetId: string;
  readonly jet: JetUnit;
  readonly impellerId: string;
  readonly driveLine: DriveLineSpec;
  readonly water: Water;
  readonly site: Site;
  readonly cruise: readonly CruiseSetting[];
  readonly fuelTankL?: number;
  /** Share of the tank (%) kept in reserve for time and range; DEFAULT_RESERVE_FRACTION when absent. */
  readonly fuelReservePct?: number;
  readonly trials: readonly SeaTrial[];
  /** 2–6 options for the repower comparison sheet, in the file's order; absent when the file lists none. */
  readonly repowerOptions?: readonly RepowerOption[];
  readonly notes?: string;
  readonly source: SourceRef;
}

export type { Orientation, Paper, PaperSize } from '../standards/paper.ts';

/** Conditions a wall chart is drawn for, when no boat fixes them. */
export interface ChartConditions {
  readonly driveLine: DriveLineSpec;
  readonly water: Water;
  readonly site: Site;
  /** Constant-power cruise lines to draw, kW. */
  readonly cruisePowersKw: readonly number[];
}

/** Cautions a book adds to the site's: its sheets carry them (and so are files of their own). */
export interface BookCautions {
  readonly bookId: string;
  readonly texts: readonly string[];
}

export type SheetRequest = { readonly bookCautions?: BookCautions; readonly units?: UnitsOverride } & (
  | {
      readonly kind: 'wallChart';
      readonly engineFamilyId: string;
      readonly jetId: string;
      readonly conditions: ChartConditions;
      readonly paper: Paper;
    }
  | { readonly kind: 'specSheet'; readonly boatId: string; readonly paper: Paper }
  | { readonly kind: 'consoleCard'; readonly boatId: string; readonly paper: Paper }
  | { readonly kind: 'upgradeSheet'; readonly boatId: string; readonly paper: Paper }
  | { readonly kind: 'repowerSheet'; readonly boatId: string; readonly paper: Paper });

export type Audience = 'shop' | 'dealer' | 'owner';

/**
 * A book's wall-chart conditions as its file gives them: what it leaves out comes from the pairing's
 * default chart (analysis/defaults.ts), so a book chart without conditions is the pairing's own chart.
 */
export interface BookChartConditions {
  readonly driveLine?: DriveLineSpec;
  readonly water?: Water;
  readonly site?: SiteFields;
  /** Constant-power cruise lines, kW; the default chart's automatic ones when absent. */
  readonly cruisePowersKw?: readonly number[];
}

/** A sheet a book lists: a SheetRequest, except that a wall chart's conditions are still to be completed. */
export type BookSheet =
  | Exclude<SheetRequest, { readonly kind: 'wallChart' }>
  | {
      readonly kind: 'wallChart';
      readonly engineFamilyId: string;
      readonly jetId: string;
      readonly conditions: BookChartConditions;
      readonly paper: Paper;
      readonly bookCautions?: BookCautions;
      readonly units?: UnitsOverride;
    };

export interface Book {
  readonly id: string;
  readonly title: string;
  readonly audience: Audience;
  readonly sheets: readonly BookSheet[];
  /** The book's own cautions (after the built-in ones and the site's). */
  readonly extraCautions?: readonly string[];
  readonly source: SourceRef;
}

export type PowerUnit = 'kW' | 'hp';
export type SpeedUnit = 'kn' | 'mph' | 'km/h';
export type FuelUnit = 'L/h' | 'US gal/h' | 'imp gal/h';

/** Units a book or one of its sheets prints in instead of the site's (each field given replaces the site's). */
export interface UnitsOverride {
  readonly powerUnitFirst?: PowerUnit;
  readonly speedUnit?: SpeedUnit;
  /** A second speed unit in brackets; null: none, even where the site gives one. */
  readonly speedAlso?: SpeedUnit | null;
  readonly fuelUnit?: FuelUnit;
}

export interface SiteConfig {
  readonly shopName: string;
  readonly contactLine: string;
  readonly powerUnitFirst: PowerUnit;
  readonly speedUnit: SpeedUnit;
  /** A second speed unit, printed in brackets after the first. */
  readonly speedAlso?: SpeedUnit;
  readonly fuelUnit: FuelUnit;
  /** The shop's own cautions (site.yaml `cautions`), printed after the built-in ones, which always print. */
  readonly extraCautions?: readonly string[];
  /** Shown on every sheet as the data revision ("2026-11 rev 3"). */
  readonly dataRevision: string;
  /** ISO date printed on sheets when SOURCE_DATE_EPOCH is not set. */
  readonly issueDate: string;
}

export interface Project {
  readonly site: SiteConfig;
  /** Each list sorted by id. */
  readonly engines: readonly EngineFamily[];
  readonly jets: readonly JetUnit[];
  readonly boats: readonly Boat[];
  readonly books: readonly Book[];
}

/** A located problem in the data. line and column are 1-based. */
export interface DataError {
  readonly file: string;
  readonly line: number;
  readonly column: number;
  /** Dotted path of the field, e.g. "impellers[2].rating_kw". Empty for whole-file problems. */
  readonly field: string;
  /** What was found, shown to the user (already shortened). */
  readonly found: string;
  /** What was expected ("must be a positive number"). */
  readonly expected: string;
  /** How to fix it, when there is more to say than the expectation. */
  readonly fix?: string;
  /** The whole sentence, as printed: "data/jets/x.yaml:14:17 rating_kw must be ..., found -3.4". */
  readonly message: string;
  /** Lines printed under the sentence: for a YAML syntax error the offending line, a caret under the spot and the parser's words. */
  readonly detail?: readonly string[];
}

export type LoadResult =
  | { readonly ok: true; readonly project: Project; readonly warnings: readonly DataError[] }
  | { readonly ok: false; readonly errors: readonly DataError[]; readonly warnings: readonly DataError[] };
