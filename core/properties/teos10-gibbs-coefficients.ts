/**
 * Coefficients of the TEOS-10 Gibbs function of seawater that enter its pressure derivative
 * (specific volume). Data, not code.
 *
 * The Gibbs function is g(SA, t, p) = g^W(t, p) + g^S(SA, t, p) with reduced variables
 *   x = √(SA / Su), Su = 40 g/kg × 35.16504/35 = 40.188617 g/kg,
 *   y = t / (40 °C),  z = p / (10⁴ dbar) = p / (10⁸ Pa),  p = sea pressure,
 * and g^W = Σ g0jk y^j z^k (pure water), g^S = Σ_{i≥2} gijk x^i y^j z^k plus terms in x² ln x that do
 * not depend on pressure. Each entry below is [i, j, k, gijk] in J/kg.
 *
 * Sources:
 * - Pure-water part (i = 0): IAPWS (2009), Supplementary Release on a Computationally Efficient
 *   Thermodynamic Formulation for Liquid Water for Oceanographic Use (IAPWS SR7-09), coefficient table;
 *   these are the pure-water coefficients of Feistel, R. (2003), "A new extended Gibbs thermodynamic
 *   potential of seawater", Progress in Oceanography 58:43–114.
 * - Saline part (i ≥ 2): IAPWS (2008), Release on the IAPWS Formulation 2008 for the Thermodynamic
 *   Properties of Seawater (IAPWS R13-08), coefficient table of the saline Gibbs function; Feistel, R.
 *   (2008), Deep-Sea Research I 55:1639–1671. The pressure-dependent saline coefficients are those of
 *   Feistel (2003).
 * - Manual: IOC, SCOR & IAPSO (2010), The international thermodynamic equation of seawater – 2010,
 *   IOC Manuals and Guides No. 56, UNESCO, Appendix (Gibbs function) — table numbers from memory.
 *
 * Provenance of the numbers: transcribed from a public tabulation of the Feistel (2003) coefficient
 * array (pressure-dependent entries only) and confirmed numerically: the density built from them matches
 * python3-gsw `rho_t_exact` to better than 1e-9 kg/m³ over the test grid
 * (tests/reference/teos10-grid.json, tests/core/properties/teos10-density.test.ts).
 */

/** [i, j, k, gijk] for i = 0 (pure water), k ≥ 1. J/kg. */
export const TEOS10_GIBBS_WATER_PRESSURE_TERMS: readonly (readonly [number, number, number, number])[] = [
  [0, 0, 1, 100015.695367145],
  [0, 1, 1, -270.983805184062],
  [0, 2, 1, 1455.0364540468],
  [0, 3, 1, -672.50778314507],
  [0, 4, 1, 397.968445406972],
  [0, 5, 1, -194.618310617595],
  [0, 6, 1, 63.5113936641785],
  [0, 7, 1, -9.63108119393062],
  [0, 0, 2, -2544.5765420363],
  [0, 1, 2, 776.153611613101],
  [0, 2, 2, -756.558385769359],
  [0, 3, 2, 499.360390819152],
  [0, 4, 2, -301.815380621876],
  [0, 5, 2, 120.520654902025],
  [0, 6, 2, -22.2897317140459],
  [0, 0, 3, 284.517778446287],
  [0, 1, 3, -196.51255088122],
  [0, 2, 3, 273.479662323528],
  [0, 3, 3, -239.545330654412],
  [0, 4, 3, 152.196371733841],
  [0, 5, 3, -55.2723052340152],
  [0, 6, 3, 8.17060541818112],
  [0, 0, 4, -33.3146754253611],
  [0, 1, 4, 28.9796526294175],
  [0, 2, 4, -55.5604063817218],
  [0, 3, 4, 48.8012518593872],
  [0, 4, 4, -26.3748377232802],
  [0, 5, 4, 6.48190668077221],
  [0, 0, 5, 4.20263108803084],
  [0, 1, 5, -2.13290083518327],
  [0, 2, 5, 4.34420671917197],
  [0, 3, 5, -1.66307106208905],
  [0, 0, 6, -0.546428511471039],
];

/** [i, j, k, gijk] for the saline part, i ≥ 2, k ≥ 1. J/kg. */
export const TEOS10_GIBBS_SALINE_PRESSURE_TERMS: readonly (readonly [number, number, number, number])[] = [
  [2, 0, 1, -3310.49154044839],
  [3, 0, 1, 199.459603073901],
  [4, 0, 1, -54.7919133532887],
  [5, 0, 1, 36.0284195611086],
  [2, 1, 1, 729.116529735046],
  [3, 1, 1, -175.292041186547],
  [4, 1, 1, -22.6683558512829],
  [2, 2, 1, -860.764303783977],
  [3, 2, 1, 383.058066002476],
  [2, 3, 1, 694.244814133268],
  [3, 3, 1, -460.319931801257],
  [2, 4, 1, -297.728741987187],
  [3, 4, 1, 234.565187611355],
  [2, 0, 2, 384.794152978599],
  [3, 0, 2, -52.2940909281335],
  [4, 0, 2, -4.08193978912261],
  [2, 1, 2, -343.956902961561],
  [3, 1, 2, 83.1923927801819],
  [2, 2, 2, 337.409530269367],
  [3, 2, 2, -54.1917262517112],
  [2, 3, 2, -204.889641964903],
  [2, 4, 2, 74.726141138756],
  [2, 0, 3, -96.5324320107458],
  [3, 0, 3, 68.0444942726459],
  [4, 0, 3, -30.1755111971161],
  [2, 1, 3, 124.687671116248],
  [3, 1, 3, -29.483064349429],
  [2, 2, 3, -178.314556207638],
  [3, 2, 3, 25.6398487389914],
  [2, 3, 3, 113.561697840594],
  [2, 4, 3, -36.4872919001588],
  [2, 0, 4, 15.8408172766824],
  [3, 0, 4, -3.41251932441282],
  [2, 1, 4, -31.656964386073],
  [2, 2, 4, 44.2040358308],
  [2, 3, 4, -11.1282734326413],
  [2, 0, 5, -2.62480156590992],
  [2, 1, 5, 7.04658803315449],
  [2, 2, 5, -7.92001547211682],
];

/** Salinity unit of the reduced salinity, g/kg: Su = 40 × 35.16504/35 (IAPWS R13-08). */
export const TEOS10_SALINITY_UNIT = (40 * 35.16504) / 35;
/** Temperature unit of the reduced temperature, °C. */
export const TEOS10_TEMPERATURE_UNIT = 40;
/** Pressure unit of the reduced pressure, Pa (10⁴ dbar). */
export const TEOS10_PRESSURE_UNIT_PA = 1e8;
