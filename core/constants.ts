/**
 * Physical constants and trade bands used in more than one stage, defined once. Stage-specific
 * coefficients stay beside the formula that uses them.
 */

/** Standard gravity, m/s² (3rd CGPM, 1901). */
export const STANDARD_GRAVITY = 9.80665;

/**
 * The usual design band of port exit velocities, m/s: about 2–6 m/s (common practice, no source; Jirka 2008
 * and Bleninger & Jirka 2008, Desalination 221:585–597, give about 3–6 m/s, from memory). Velocities outside
 * it get one warning (core/multiport/port-hydraulics.ts).
 */
export const USUAL_EXIT_VELOCITY: readonly [number, number] = [2, 6];

/** The usual exit-velocity band as text, "2–6 m/s", for warnings and help. */
export const USUAL_EXIT_VELOCITY_TEXT = `${USUAL_EXIT_VELOCITY[0]}–${USUAL_EXIT_VELOCITY[1]} m/s`;
