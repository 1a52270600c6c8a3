/**
 * The normalised scenario: every quantity in SI (m, s, kg, g/kg, degrees Celsius,
 * angles in degrees as entered in the file). Produced by `parseScenario` and frozen.
 * Frames: x east, y north, z up. Azimuths are degrees clockwise from north.
 */

import type { BasinInput } from "../basin/box-model";
import type { ResultWarning } from "../warnings";
export type { BasinInput } from "../basin/box-model";

export interface ProfilePoint {
  /** Depth below the water surface, m (0 = surface). */
  readonly depth: number;
  /** Absolute Salinity, g/kg. */
  readonly salinity: number;
  /** In-situ temperature, °C. */
  readonly temperature: number;
}

export interface ConstituentInput {
  /** Name as the user wrote it, e.g. "antiscalant". Salinity and temperature are implicit. */
  readonly name: string;
  /** Concentration in the discharge, in `unit`. */
  readonly concentration: number;
  /** Free-text unit the user works in (e.g. "mg/L"); concentrations are kept in this unit. */
  readonly unit: string;
  /** Background concentration in the receiving water, same unit (default 0). */
  readonly background: number;
}

export interface LimitInput {
  /** "salinity", "temperature" or the name of a listed constituent. */
  readonly constituent: string;
  /** Allowed increase over background (same unit as the constituent). */
  readonly maxIncrease?: number;
  /** Allowed absolute concentration (same unit as the constituent). */
  readonly maxConcentration?: number;
  /** Unit of the limit: "g/kg" for salinity, "degC" for temperature, else the constituent's. */
  readonly unit: string;
  /** Background concentration; defaults to ambient for salinity/temperature, 0 otherwise. */
  readonly background?: number;
  /** Where the limit comes from (a rule, a permit), free text. */
  readonly basis?: string;
}

export interface BlendStream {
  readonly name: string;
  readonly flow: number; // m³/s
  readonly salinity: number; // g/kg
  readonly temperature: number; // °C
}

export interface PlantInput {
  readonly productFlow: number; // m³/s
  readonly recovery: number; // 0–1
  readonly feedSalinity: number; // g/kg
  readonly saltRejection: number; // 0–1
  readonly feedTemperature?: number; // °C, brine temperature if discharge.temperature absent
  readonly blending: readonly BlendStream[];
}

export interface AmbientInput {
  /** Water depth at the diffuser, m. */
  readonly depth: number;
  /** Profile sorted by depth, at least two points (a uniform ambient is stored as two equal points). */
  readonly profile: readonly ProfilePoint[];
  /** True when the user gave a uniform salinity/temperature rather than a profile. */
  readonly uniform: boolean;
  /** Depth-averaged current speed, m/s (0 = stagnant). */
  readonly currentSpeed: number;
  /** Direction the current flows toward, degrees clockwise from north. */
  readonly currentDirection: number;
  /** Bed slope, rise over run (0 = flat). */
  readonly bedSlope: number;
  /** Azimuth the bed slopes down toward, degrees clockwise from north. */
  readonly bedSlopeAzimuth: number;
  /** Enclosed water whose background builds up (well-mixed box model, core/basin); absent for open water. */
  readonly basin?: BasinInput;
  /** A record of ambient states over time (core/record): its steps replace the ambient cases. */
  readonly record?: AmbientRecord;
}

/**
 * An ambient record, in SI: times in seconds from the first step (strictly increasing), and one value per
 * step for each column given. Columns left out follow the stated ambient (also when a study changes it).
 */
export interface AmbientRecord {
  readonly time: readonly number[];
  readonly currentSpeed: readonly number[];
  readonly currentDirection: readonly number[];
  readonly depth?: readonly number[];
  /** Absolute Salinity, g/kg (uniform over the column at that step). */
  readonly salinity?: readonly number[];
  /** °C (uniform over the column at that step). */
  readonly temperature?: readonly number[];
  /** ISO 8601 date-time of the first step when the times were given as date-times. */
  readonly start?: string;
}

/** The plant's seawater intake, measured from the diffuser centre (core/intake). */
export interface IntakeInput {
  /** Plan distance from the diffuser centre, m. */
  readonly distance: number;
  /** Bearing of the intake from the diffuser centre, degrees clockwise from north. */
  readonly bearing: number;
  /** Height of the intake mouth above the seabed, m. */
  readonly heightAboveSeabed: number;
  /** Largest allowed salinity increase at the intake, g/kg (optional limit). */
  readonly maxSalinityIncrease?: number;
}

/** The ambient fields an ambient case may set itself (a profile sets salinity and temperature). */
export type AmbientCaseField = "depth" | "salinity" | "temperature" | "currentSpeed" | "currentDirection";
export const AMBIENT_CASE_FIELDS: readonly AmbientCaseField[] = [
  "depth",
  "salinity",
  "temperature",
  "currentSpeed",
  "currentDirection",
];

export interface AmbientCase extends AmbientInput {
  readonly name: string;
  readonly weight: number;
  /**
   * The fields the case sets itself; every other field follows the stated ambient (also when a study,
   * sweep or Monte Carlo draw changes it).
   */
  readonly sets: readonly AmbientCaseField[];
}

export type DiffuserLayout = "single" | "line" | "rosette";

export interface RiserInput {
  readonly count: number;
  readonly portsPerRiser: number;
  /** Spacing between risers along the diffuser, m. */
  readonly spacing: number;
  /** Port azimuths around each riser, degrees clockwise from north. */
  readonly portAzimuths: readonly number[];
}

export interface DiffuserInput {
  readonly layout: DiffuserLayout;
  readonly portCount: number;
  /** Effective port diameter, m (after any vena-contracta contraction; see `contraction`). */
  readonly portDiameter: number;
  /** Diameter as entered, m. */
  readonly portDiameterNominal: number;
  /** Contraction coefficient applied to the nominal area (1 = none). */
  readonly contraction: number;
  readonly portAngle: number; // degrees above horizontal, 0–90
  readonly portHeight: number; // m above seabed
  readonly portSpacing: number; // m between ports along the diffuser
  readonly portAzimuth: number; // degrees clockwise from north
  /** Azimuth of the diffuser axis, degrees clockwise from north. */
  readonly diffuserAzimuth: number;
  /** Diffuser length, m: (portCount − 1) × portSpacing unless given. */
  readonly length: number;
  /** Per-port flow fractions summing to 1 (equal split by default). */
  readonly flowSplit: readonly number[];
  /** Port discharge coefficient for head-loss estimate, if given. */
  readonly dischargeCoefficient?: number;
  readonly risers?: RiserInput;
}

export interface DischargeInput {
  readonly flow: number; // m³/s total
  readonly salinity: number; // g/kg
  readonly temperature: number; // °C
  readonly constituents: readonly ConstituentInput[];
}

export type NearFieldChoice = "conservative" | "length-scale" | "integral";
export type FarFieldChoice = "conservative" | "gravity-current" | "passive-diffusion";

export interface ScenarioOptions {
  /** Which near-field dilution is carried to the mixing-zone edge. */
  readonly nearFieldForEdge: NearFieldChoice;
  /** Which beyond-near-field method governs the edge dilution. */
  readonly farField: FarFieldChoice;
  /** Add a slack-water case (no current) to studies unless false. */
  readonly addSlackWater: boolean;
}

export interface UncertainInput {
  /** Scenario path, e.g. "ambient.currentSpeed". */
  readonly path: string;
  readonly distribution: "normal" | "uniform" | "lognormal" | "triangular";
  /** Parameters in SI: normal {mean?, sd}; uniform {min,max}; lognormal {median?, gsd}; triangular {min, mode?, max}. */
  readonly params: Readonly<Record<string, number>>;
}

export interface Scenario {
  readonly format: "brinefield-scenario";
  readonly version: 1;
  readonly name: string;
  readonly description?: string;
  readonly discharge: DischargeInput;
  readonly plant?: PlantInput;
  readonly ambient: AmbientInput;
  readonly ambientCases: readonly AmbientCase[];
  readonly diffuser: DiffuserInput;
  readonly mixingZone: {
    readonly radius: number;
    readonly limits: readonly LimitInput[];
    /** With a record: the verdict is "met for at least percentOfTime % of the record". */
    readonly timeCompliance?: { readonly percentOfTime: number };
  };
  readonly intake?: IntakeInput;
  readonly options: ScenarioOptions;
  readonly uncertainty?: { readonly inputs: readonly UncertainInput[] };
  /** Human-readable notes on conversions applied while reading the file. */
  readonly conversions: readonly string[];
  /**
   * Range warnings of the conversion formulas used while reading the file (practical salinity and TDS to
   * g/kg); absent when there are none. The properties stage hands them on with its own warnings.
   */
  readonly conversionWarnings?: readonly ResultWarning[];
}
