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

import { ref, type Reference } from "./reference-entry";
import { REFERENCES_BEYOND_NEAR_FIELD } from "./references-beyond";

export type { Reference } from "./reference-entry";

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
  ...REFERENCES_BEYOND_NEAR_FIELD,
];
