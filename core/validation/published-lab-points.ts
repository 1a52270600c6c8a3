/**
 * Published laboratory points for inclined dense jets in stagnant, unstratified water that Brinefield holds,
 * each with its source and how reliably it is known ("original": read in the paper; "quoted": quoted by
 * another source, not read in the paper). Lengths are ÷ d·F, dilutions ÷ F (asymptotic in F, see
 * core/correlations/dense-jet-dataset.ts). Definitions differ between studies (upper edge or centreline for
 * the rise; minimum or mean for dilutions), which is part of the scatter between them.
 */

export type ValidationQuantity =
  "maxRiseHeight" | "maxRiseDilution" | "impactDistance" | "impactDilution" | "nearFieldDistance" | "nearFieldDilution";

export interface PublishedLabPoint {
  readonly quantity: ValidationQuantity;
  /** Discharge angle above horizontal, degrees. */
  readonly angle: number;
  /** Published value ÷ d·F (lengths) or ÷ F (dilutions). */
  readonly published: number;
  readonly source: string;
  readonly mark: "original" | "quoted";
}

const LAI_LEE_2012 =
  "Lai & Lee (2012), Mixing of inclined dense jets in stationary ambient, J. Hydro-environment Research 6:9–28";
const LAI_LEE_2012_RISE = `${LAI_LEE_2012}: Z_max/(F·D), F ≥ 25`;
const LAI_LEE_2012_SI = `${LAI_LEE_2012}: S_i/F = 1.06 for F ≥ 20, insensitive to angle over 38°–60°`;
const LAI_LEE_2012_ST = `${LAI_LEE_2012}: S_t/F = 0.45 (terminal rise), little difference over 38°–60°`;
const ROBERTS_1997 =
  "Roberts, Ferrier & Daviero (1997), Mixing in inclined dense jets, J. Hydraulic Eng. 123(8):693–699";
const SHAO_LAW_2010 =
  "Shao & Law (2010), Mixing and boundary interactions of 30° and 45° inclined dense jets, Environ. Fluid Mech. 10(5):521–553";
const PAPAKONSTANTIS_2011 =
  "Papakonstantis, Christodoulou & Papanicolaou (2011), Inclined negatively buoyant jets 1 and 2, J. Hydraulic Research 49(1):3–22";

/** Every published laboratory point held, in the order the validation table lists them. */
export const PUBLISHED_LAB_POINTS: readonly PublishedLabPoint[] = [
  { quantity: "maxRiseHeight", angle: 15, published: 0.44, source: LAI_LEE_2012_RISE, mark: "original" },
  { quantity: "maxRiseHeight", angle: 60, published: 2.08, source: LAI_LEE_2012_RISE, mark: "original" },
  ...[38, 45, 52, 60].map((angle) => ({
    quantity: "impactDilution" as const,
    angle,
    published: 1.06,
    source: LAI_LEE_2012_SI,
    mark: "original" as const,
  })),
  ...[38, 45, 52, 60].map((angle) => ({
    quantity: "maxRiseDilution" as const,
    angle,
    published: 0.45,
    source: LAI_LEE_2012_ST,
    mark: "original" as const,
  })),
  { quantity: "maxRiseHeight", angle: 60, published: 2.2, source: `${ROBERTS_1997}: y_t (upper edge)`, mark: "quoted" },
  { quantity: "impactDistance", angle: 60, published: 2.4, source: `${ROBERTS_1997}: x_i`, mark: "quoted" },
  { quantity: "impactDilution", angle: 60, published: 1.6, source: `${ROBERTS_1997}: S_i (minimum)`, mark: "quoted" },
  { quantity: "nearFieldDistance", angle: 60, published: 9.0, source: `${ROBERTS_1997}: x_n`, mark: "quoted" },
  { quantity: "nearFieldDilution", angle: 60, published: 2.6, source: `${ROBERTS_1997}: S_n`, mark: "quoted" },
  { quantity: "impactDistance", angle: 60, published: 2.84, source: `${LAI_LEE_2012}: X_i/(D·F)`, mark: "quoted" },
  { quantity: "impactDistance", angle: 45, published: 3.33, source: `${SHAO_LAW_2010}: X_i/(F·D)`, mark: "quoted" },
  { quantity: "impactDilution", angle: 45, published: 1.26, source: `${SHAO_LAW_2010}: S_i/F`, mark: "quoted" },
  {
    quantity: "maxRiseHeight",
    angle: 60,
    published: 2.15,
    source: `${PAPAKONSTANTIS_2011}: z_t/(D·F)`,
    mark: "quoted",
  },
  { quantity: "impactDilution", angle: 60, published: 1.68, source: `${PAPAKONSTANTIS_2011}: S_i/F`, mark: "quoted" },
];
