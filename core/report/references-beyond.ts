/**
 * The reference list's works beyond the near field: the spreading layer and diffusion, seawater and brine
 * properties, regulation and practice, rising plumes and background build-up (see references.ts).
 */
import { ref, type Reference } from "./reference-entry";

export const REFERENCES_BEYOND_NEAR_FIELD: readonly Reference[] = [
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
