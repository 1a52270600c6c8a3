/**
 * Nominal pipe sizes for the design search's `nominalSizes` option.
 *
 * Source: ISO 6708:1995, "Pipework components — Definition and selection of DN (nominal size)", the
 * preferred DN series (values from memory, not re-read in the standard). A DN number is a size
 * designation, approximately the bore in millimetres; it is not a measured dimension. The design search
 * takes DN/1000 m as the port diameter: the bore of the pipe, valve or nozzle actually chosen (which
 * depends on its material, wall class or schedule) must be entered for the final check.
 */
export const NOMINAL_SIZES_SOURCE =
  "ISO 6708:1995 preferred DN series (from memory); DN taken as the port bore in mm — enter the real bore of the chosen fitting for the final check";

/** Preferred DN designations (ISO 6708, from memory), mm. */
export const NOMINAL_SIZES_DN: readonly number[] = [
  15, 20, 25, 32, 40, 50, 65, 80, 100, 125, 150, 200, 250, 300, 350, 400, 450, 500, 600, 700, 800, 900, 1000, 1200,
];

/** The nominal sizes (as diameters in m) from `min` to `max` inclusive. */
export function nominalDiametersBetween(min: number, max: number): number[] {
  return NOMINAL_SIZES_DN.map((dn) => dn / 1000).filter((d) => d >= min - 1e-12 && d <= max + 1e-12);
}
