/**
 * Full citations for the report's reference list, keyed by short source names ("Roberts, Ferrier &
 * Daviero 1997"). Methods state their basis as free text in `source` strings; `referencesFromSources()`
 * finds the entries those strings cite by first author and year (or by an alias such as "TEOS-10").
 *
 * `detailsChecked` says whether the bibliographic details (volume, pages) were checked against a published
 * listing of the work; those not checked are recalled (from memory). The report names the unchecked ones
 * once, in plain words, below the list, together with the coefficients Brinefield takes from secondary
 * quotations rather than from the original papers (`SECONDARY_QUOTATIONS`).
 */

export interface Reference {
  /** Short name as methods cite it, e.g. "Lai & Lee 2012". */
  readonly key: string;
  /** First author's surname as it appears first in a source string. */
  readonly firstAuthor: string;
  readonly year: string;
  /** Full citation, plain text. */
  readonly citation: string;
  /** True when volume and pages were checked against a published listing; false when recalled. */
  readonly detailsChecked: boolean;
  /** Extra patterns that identify the work without an author–year pair. */
  readonly aliases?: readonly RegExp[];
}

const ref = (
  key: string,
  firstAuthor: string,
  year: string,
  citation: string,
  detailsChecked: boolean,
  aliases?: readonly RegExp[],
): Reference => ({ key, firstAuthor, year, citation, detailsChecked, aliases });

export const REFERENCES: readonly Reference[] = [
  // Inclined dense jets, stagnant ambient
  ref(
    "Zeitoun et al. 1970",
    "Zeitoun",
    "1970",
    "Zeitoun, M.A., McIlhenny, W.F., Reid, R.O. et al. (1970). Conceptual designs of outfall systems for desalting plants. US Office of Saline Water, Research and Development Progress Report 536 (also cited as 1972).",
    false,
    [/\bZeitoun\b[^0-9;]{0,40}1972/],
  ),
  ref(
    "Roberts & Toms 1987",
    "Roberts",
    "1987",
    "Roberts, P.J.W., Toms, G. (1987). Inclined dense jets in flowing current. Journal of Hydraulic Engineering 113(3), 323–341.",
    false,
  ),
  ref(
    "Roberts, Ferrier & Daviero 1997",
    "Roberts",
    "1997",
    "Roberts, P.J.W., Ferrier, A., Daviero, G. (1997). Mixing in inclined dense jets. Journal of Hydraulic Engineering 123(8), 693–699.",
    true,
  ),
  ref(
    "Cipollina et al. 2005",
    "Cipollina",
    "2005",
    "Cipollina, A., Brucato, A., Grisafi, F., Nicosia, S. (2005). Bench-scale investigation of inclined dense jets. Journal of Hydraulic Engineering 131(11), 1017–1022.",
    true,
  ),
  ref(
    "Kikkert, Davidson & Nokes 2007",
    "Kikkert",
    "2007",
    "Kikkert, G.A., Davidson, M.J., Nokes, R.I. (2007). Inclined negatively buoyant discharges. Journal of Hydraulic Engineering 133(5), 545–554.",
    true,
  ),
  ref(
    "Oliver, Davidson & Nokes 2008",
    "Oliver",
    "2008",
    "Oliver, C.J., Davidson, M.J., Nokes, R.I. (2008). k-ε predictions of the initial mixing of desalination discharges. Environmental Fluid Mechanics 8(5–6), 617–625.",
    false,
  ),
  ref(
    "Oliver, Davidson & Nokes 2013",
    "Oliver",
    "2013",
    "Oliver, C.J., Davidson, M.J., Nokes, R.I. (2013). Predicting the near-field mixing of desalination discharges in a stationary environment. Desalination 309, 148–155.",
    true,
  ),
  ref(
    "Shao & Law 2010",
    "Shao",
    "2010",
    "Shao, D., Law, A.W.K. (2010). Mixing and boundary interactions of 30° and 45° inclined dense jets. Environmental Fluid Mechanics 10(5), 521–553.",
    false,
  ),
  ref(
    "Papakonstantis et al. 2011",
    "Papakonstantis",
    "2011",
    "Papakonstantis, I.G., Christodoulou, G.C., Papanicolaou, P.N. (2011). Inclined negatively buoyant jets 1: geometrical characteristics; 2: concentration measurements. Journal of Hydraulic Research 49(1), 3–12 and 13–22.",
    false,
  ),
  ref(
    "Papakonstantis & Christodoulou 2010",
    "Papakonstantis",
    "2010",
    "Papakonstantis, I.G., Christodoulou, G.C. (2010). Spreading of round dense jets impinging on a horizontal bottom. Journal of Hydro-environment Research 4, 289–300.",
    true,
  ),
  ref(
    "Papakonstantis & Christodoulou 2020",
    "Papakonstantis",
    "2020",
    "Papakonstantis, I.G., Christodoulou, G.C. (2020). Simplified modelling of inclined turbulent dense jets. Fluids 5(4), 204. doi:10.3390/fluids5040204.",
    true,
  ),
  ref(
    "Christodoulou & Papakonstantis 2010",
    "Christodoulou",
    "2010",
    "Christodoulou, G.C., Papakonstantis, I.G. (2010). Simplified estimates of trajectory of inclined negatively buoyant jets. In: Environmental Hydraulics, vol. I, Taylor & Francis, 165–170.",
    true,
  ),
  ref(
    "Bloutsos & Yannopoulos 2020",
    "Bloutsos",
    "2020",
    "Bloutsos, A.A., Yannopoulos, P.C. (2020). Revisiting mean flow and mixing properties of negatively round buoyant jets using the escaping mass approach. Fluids 5(3), 131.",
    true,
  ),
  ref(
    "Lai & Lee 2012",
    "Lai",
    "2012",
    "Lai, C.C.K., Lee, J.H.W. (2012). Mixing of inclined dense jets in stationary ambient. Journal of Hydro-environment Research 6, 9–28.",
    true,
  ),
  ref(
    "Lai & Lee 2013",
    "Lai",
    "2013",
    "Lai, C.C.K., Lee, J.H.W. (2013). Initial mixing of inclined dense jet in perpendicular crossflow. Environmental Fluid Mechanics. doi:10.1007/s10652-013-9290-7.",
    true,
  ),
  ref(
    "Palomar et al. 2012",
    "Palomar",
    "2012",
    "Palomar, P., Lara, J.L., Losada, I.J., Rodrigo, M., Alvárez, A. (2012). Near field brine discharge modelling, part 1: analysis of commercial tools; Palomar, P., Lara, J.L., Losada, I.J. part 2: validation of commercial tools. Desalination 290, 14–27 and 28–42.",
    true,
  ),
  ref(
    "Jirka 2008",
    "Jirka",
    "2008",
    "Jirka, G.H. (2008). Improved discharge configurations for brine effluents from desalination plants. Journal of Hydraulic Engineering 134(1), 116–120.",
    true,
  ),
  ref(
    "Bleninger & Jirka 2008",
    "Bleninger",
    "2008",
    "Bleninger, T., Jirka, G.H. (2008). Modelling and environmentally sound management of brine discharges from desalination plants. Desalination 221, 585–597.",
    true,
  ),
  ref(
    "Turner 1966",
    "Turner",
    "1966",
    "Turner, J.S. (1966). Jets and plumes with negative or reversing buoyancy. Journal of Fluid Mechanics 26, 779–792.",
    false,
  ),
  // Currents and multiport diffusers
  ref(
    "Abessi & Roberts 2014",
    "Abessi",
    "2014",
    "Abessi, O., Roberts, P.J.W. (2014). Multiport diffusers for dense discharges. Journal of Hydraulic Engineering 140(8), 04014032.",
    false,
  ),
  ref(
    "Abessi & Roberts 2016",
    "Abessi",
    "2016",
    "Abessi, O., Roberts, P.J.W. (2016). Dense discharge in flowing water through rosette diffuser. Proceedings of the International Symposium on Outfall Systems, IAHR.",
    true,
  ),
  ref(
    "Abessi & Roberts 2017",
    "Abessi",
    "2017",
    "Abessi, O., Roberts, P.J.W. (2017). Multiport diffusers for dense discharge in flowing ambient water. Journal of Hydraulic Engineering 143(6).",
    true,
  ),
  ref(
    "Roberts, Snyder & Baumgartner 1989",
    "Roberts",
    "1989",
    "Roberts, P.J.W., Snyder, W.H., Baumgartner, D.J. (1989). Ocean outfalls. III: Effect of diffuser design on submerged wastefield. Journal of Hydraulic Engineering 115(1), 49–70.",
    false,
  ),
  ref(
    "Lee 2012",
    "Lee",
    "2012",
    "Lee, J.H.W. (2012). Mixing of multiple buoyant jets. Journal of Hydraulic Engineering 138, 1008–1021.",
    true,
  ),
  ref(
    "Saeidi Hosseini et al. 2022",
    "Saeidi Hosseini",
    "2022",
    "Saeidi Hosseini, S.A.R., Mohammadian, A., Roberts, P.J.W., Abessi, O. (2022). Numerical study on the effect of port orientation on multiple inclined dense jets. Journal of Marine Science and Engineering 10(5), 590.",
    true,
  ),
  ref(
    "Ben Meftah et al. 2017",
    "Ben Meftah",
    "2017",
    "Ben Meftah, M., Malcangio, D., De Serio, F., Mossa, M. (2017). Vertical dense jet in flowing current. Environmental Fluid Mechanics. doi:10.1007/s10652-017-9515-2.",
    true,
  ),
  ref(
    "Jiang, Law & Zhang 2018",
    "Jiang",
    "2018",
    "Jiang, M.T., Law, A.W.K., Zhang, S. (2018). Mixing behavior of 45° inclined dense jets in currents. Journal of Hydro-environment Research 18, 37–48.",
    true,
  ),
  ref(
    "Davis 1999",
    "Davis",
    "1999",
    "Davis, L.R. (1999). Fundamentals of Environmental Discharge Modeling. CRC Press, Boca Raton.",
    false,
  ),
  ref(
    "Chen & Jirka 1999",
    "Chen",
    "1999",
    "Chen, D.Y., Jirka, G.H. (1999). LIF study of plane jet bounded in shallow water layer. Journal of Hydraulic Engineering 125, 817–826.",
    true,
  ),
  ref(
    "Jirka & Doneker 1991",
    "Jirka",
    "1991",
    "Jirka, G.H., Doneker, R.L. (1991). Hydrodynamic classification of submerged single-port discharges. Journal of Hydraulic Engineering 117, 1095–1112.",
    true,
  ),
  // Integral models and jet/plume constants
  ref(
    "Jirka 2004",
    "Jirka",
    "2004",
    "Jirka, G.H. (2004). Integral model for turbulent buoyant jets in unbounded stratified flows. Part I: Single round jet. Environmental Fluid Mechanics 4, 1–56.",
    true,
  ),
  ref(
    "Lee & Cheung 1990",
    "Lee",
    "1990",
    "Lee, J.H.W., Cheung, V. (1990). Generalized Lagrangian model for buoyant jets in current. Journal of Environmental Engineering 116(6), 1085–1106.",
    false,
  ),
  ref(
    "Lee & Chu 2003",
    "Lee",
    "2003",
    "Lee, J.H.W., Chu, V.H. (2003). Turbulent Jets and Plumes: A Lagrangian Approach. Kluwer Academic, Boston. doi:10.1007/978-1-4615-0407-8.",
    false,
  ),
  ref(
    "Fischer et al. 1979",
    "Fischer",
    "1979",
    "Fischer, H.B., List, E.J., Koh, R.C.Y., Imberger, J., Brooks, N.H. (1979). Mixing in Inland and Coastal Waters. Academic Press, New York.",
    false,
  ),
  ref(
    "Chen & Rodi 1980",
    "Chen",
    "1980",
    "Chen, C.J., Rodi, W. (1980). Vertical Turbulent Buoyant Jets: A Review of Experimental Data. HMT Series 4, Pergamon, Oxford.",
    true,
  ),
  ref(
    "van Reeuwijk & Craske 2015",
    "van Reeuwijk",
    "2015",
    "van Reeuwijk, M., Craske, J. (2015). Energy-consistent entrainment relations for jets and plumes. Journal of Fluid Mechanics 782, 333–355.",
    true,
  ),
  // Beyond the near field
  ref(
    "Ellison & Turner 1959",
    "Ellison",
    "1959",
    "Ellison, T.H., Turner, J.S. (1959). Turbulent entrainment in stratified flows. Journal of Fluid Mechanics 6, 423–448.",
    true,
  ),
  ref(
    "Turner 1986",
    "Turner",
    "1986",
    "Turner, J.S. (1986). Turbulent entrainment: the development of the entrainment assumption, and its application to geophysical flows. Journal of Fluid Mechanics 173, 431–471.",
    true,
  ),
  ref(
    "Kato & Phillips 1969",
    "Kato",
    "1969",
    "Kato, H., Phillips, O.M. (1969). On the penetration of a turbulent layer into stratified fluid. Journal of Fluid Mechanics 37(4), 643–655.",
    false,
  ),
  ref(
    "Brooks 1960",
    "Brooks",
    "1960",
    "Brooks, N.H. (1960). Diffusion of sewage effluent in an ocean current. Proceedings of the 1st International Conference on Waste Disposal in the Marine Environment, Pergamon, 246–267.",
    false,
  ),
  ref(
    "Richardson 1926",
    "Richardson",
    "1926",
    "Richardson, L.F. (1926). Atmospheric diffusion shown on a distance-neighbour graph. Proceedings of the Royal Society of London A 110, 709–737.",
    false,
    [/4\/3[- ]law/i],
  ),
  ref(
    "Okubo 1971",
    "Okubo",
    "1971",
    "Okubo, A. (1971). Oceanic diffusion diagrams. Deep-Sea Research 18, 789–802.",
    false,
  ),
  // Seawater and brine properties
  ref(
    "IOC, SCOR & IAPSO 2010",
    "IOC",
    "2010",
    "IOC, SCOR, IAPSO (2010). The international thermodynamic equation of seawater – 2010: Calculation and use of thermodynamic properties. Intergovernmental Oceanographic Commission, Manuals and Guides No. 56, UNESCO.",
    false,
    [/\bTEOS-10\b/],
  ),
  ref(
    "Feistel 2008",
    "Feistel",
    "2008",
    "Feistel, R. (2008). A Gibbs function for seawater thermodynamics for −6 to 80 °C and salinity up to 120 g kg⁻¹. Deep-Sea Research I 55, 1639–1671.",
    true,
    [/IAPWS R13-08/],
  ),
  ref(
    "Feistel 2003",
    "Feistel",
    "2003",
    "Feistel, R. (2003). A new extended Gibbs thermodynamic potential of seawater. Progress in Oceanography 58, 43–114.",
    false,
    [/IAPWS SR7-09/],
  ),
  ref(
    "Sharqawy, Lienhard & Zubair 2010",
    "Sharqawy",
    "2010",
    "Sharqawy, M.H., Lienhard V, J.H., Zubair, S.M. (2010). Thermophysical properties of seawater: a review of existing correlations and data. Desalination and Water Treatment 16, 354–380. doi:10.5004/dwt.2010.1079.",
    true,
  ),
  ref(
    "Nayar et al. 2016",
    "Nayar",
    "2016",
    "Nayar, K.G., Sharqawy, M.H., Banchik, L.D., Lienhard V, J.H. (2016). Thermophysical properties of seawater: a review and new correlations that include pressure dependence. Desalination 390, 1–24. doi:10.1016/j.desal.2016.02.024.",
    true,
  ),
  ref(
    "Fofonoff & Millard 1983",
    "Fofonoff",
    "1983",
    "Fofonoff, N.P., Millard, R.C. (1983). Algorithms for computation of fundamental properties of seawater. UNESCO Technical Papers in Marine Science 44.",
    true,
    [/\bEOS-80\b/],
  ),
  ref(
    "Abramowitz & Stegun 1964",
    "Abramowitz",
    "1964",
    "Abramowitz, M., Stegun, I.A. (1964). Handbook of Mathematical Functions. National Bureau of Standards, Applied Mathematics Series 55.",
    false,
  ),
  // Regulation and practice
  ref(
    "SWRCB 2015",
    "SWRCB",
    "2015",
    "State Water Resources Control Board, California (2015). Amendment to the Water Quality Control Plan for Ocean Waters of California addressing desalination facility intakes, brine discharges (Ocean Plan chapter III.M), adopted 6 May 2015.",
    true,
    [/Ocean Plan/i],
  ),
  ref(
    "Jenkins et al. 2012",
    "Jenkins",
    "2012",
    "Jenkins, S., Paduan, J., Roberts, P., Schlenk, D., Weis, J. (2012). Management of brine discharges to coastal waters: recommendations of a science advisory panel. Southern California Coastal Water Research Project, Technical Report 694.",
    true,
    [/SCCWRP/],
  ),
  ref(
    "Sánchez-Lizaso et al. 2008",
    "Sánchez-Lizaso",
    "2008",
    "Sánchez-Lizaso, J.L., Romero, J., Ruiz, J., Gacia, E., Buceta, J.L., Invers, O., Fernández Torquemada, Y., Mas, J., Ruiz-Mateo, A., Manzanera, M. (2008). Salinity tolerance of the Mediterranean seagrass Posidonia oceanica: recommendations to minimize the impact of brine discharges from desalination plants. Desalination 221, 602–607.",
    false,
  ),
  // Rising plumes and background build-up
  ref(
    "Morton, Taylor & Turner 1956",
    "Morton",
    "1956",
    "Morton, B.R., Taylor, G.I., Turner, J.S. (1956). Turbulent gravitational convection from maintained and instantaneous sources. Proceedings of the Royal Society of London A 234, 1–23.",
    true,
  ),
  ref(
    "Wright 1984",
    "Wright",
    "1984",
    "Wright, S.J. (1984). Buoyant jets in density-stratified crossflow. Journal of Hydraulic Engineering 110.",
    false,
  ),
  ref(
    "Officer 1976",
    "Officer",
    "1976",
    "Officer, C.B. (1976). Physical Oceanography of Estuaries (and Associated Coastal Waters). Wiley, New York.",
    false,
  ),
];

/**
 * Coefficients taken from secondary quotations (textbooks, reviews and later papers that quote them) or
 * recalled, rather than checked against the original paper. The report's references section and
 * README's methods section state this once, in plain words.
 */
export interface SecondaryQuotation {
  /** Key of the work in REFERENCES the coefficients belong to. */
  readonly reference: string;
  /** The coefficients, in words a reader can find in the methods. */
  readonly what: string;
}

export const SECONDARY_QUOTATIONS: readonly SecondaryQuotation[] = [
  {
    reference: "Roberts, Ferrier & Daviero 1997",
    what: "the 60° coefficients of Roberts, Ferrier & Daviero (1997): rise 2.2·dF, return distance 2.4·dF, impact dilution 1.6·F, end of the near field 9.0·dF and dilution there 2.6·F",
  },
  {
    reference: "Lee & Cheung 1990",
    what: "the entrainment constants of Lee & Cheung (1990): 0.057, 0.554 and 5 (one quotation gives 0.544 for 0.554)",
  },
  {
    reference: "Turner 1986",
    what: "the entrainment law of Turner (1986), E = (0.08 − 0.1·Ri)/(1 + 5·Ri); only its cut-off at Ri = 0.8 was read in Ellison & Turner (1959)",
  },
  {
    reference: "Brooks 1960",
    what: "the lateral-diffusion solution of Brooks (1960) and its 4/3-law coefficient 0.01 cm^(2/3)/s, as reproduced in Fischer et al. (1979)",
  },
  {
    reference: "Fischer et al. 1979",
    what: "the round-jet spreading rate 0.127 and the line-plume coefficient 0.27 of Fischer et al. (1979)",
  },
];

/** The secondary quotations that belong to works among `references` (in SECONDARY_QUOTATIONS order). */
export function secondaryQuotationsFor(references: readonly Reference[]): SecondaryQuotation[] {
  const keys = new Set(references.map((r) => r.key));
  return SECONDARY_QUOTATIONS.filter((q) => keys.has(q.reference));
}

/** Removes accents and folds case so "Alvárez" and "alvarez" compare equal. */
function fold(text: string): string {
  return text
    .normalize("NFD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase();
}

function escapeRegExp(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
}

const patternCache = new Map<string, RegExp>();

/**
 * First author followed, within a short stretch of text, by the year; the author must not follow "&",
 * "," or "and" (so "Lai & Lee (2012)" does not cite "Lee 2012").
 */
function authorYearPattern(entry: Reference): RegExp {
  const cacheKey = `${entry.firstAuthor}|${entry.year}`;
  let pattern = patternCache.get(cacheKey);
  if (!pattern) {
    const author = escapeRegExp(fold(entry.firstAuthor));
    pattern = new RegExp(`(?<!(?:&|,|\\band)\\s*)\\b${author}\\b[^0-9;]{0,70}?\\b${entry.year}[a-z]?\\b`);
    patternCache.set(cacheKey, pattern);
  }
  return pattern;
}

/** True when the free-text `source` cites `entry`. */
export function sourceCites(source: string, entry: Reference): boolean {
  const folded = fold(source);
  if (authorYearPattern(entry).test(folded)) return true;
  return (entry.aliases ?? []).some((alias) => alias.test(source));
}

export interface CollectedReferences {
  /** Cited works, in the order of the table above (grouped by topic). */
  readonly references: readonly Reference[];
  /**
   * Source strings kept verbatim because they cite nothing in the table (e.g. "common practice, no
   * source") or mention a year no tabled work accounts for (a work missing from the table).
   */
  readonly uncited: readonly string[];
}

/** Finds every tabled reference cited by any of `sources`; sources citing none are returned as-is. */
export function referencesFromSources(sources: readonly string[]): CollectedReferences {
  const unique = [...new Set(sources.map((s) => s.trim()).filter((s) => s !== ""))];
  const cited = new Set<Reference>();
  const uncited: string[] = [];
  for (const source of unique) {
    const hits = REFERENCES.filter((entry) => sourceCites(source, entry));
    hits.forEach((hit) => cited.add(hit));
    const years = source.match(/\b(?:1[89]|20)\d{2}\b/g) ?? [];
    const unexplained = years.some(
      (y) => !hits.some((h) => h.year === y || (h.aliases ?? []).some((a) => a.test(source) && source.includes(y))),
    );
    if (hits.length === 0 || unexplained) uncited.push(source);
  }
  return { references: REFERENCES.filter((entry) => cited.has(entry)), uncited };
}
