/**
 * Where a blend changes the sign of its buoyancy. Brine co-discharged with treated wastewater or cooling
 * water sinks at low blend ratios and may rise at high ones (or the reverse with cold, salty streams).
 * The blend ratio is the total blending flow ÷ the brine flow (`plant.blendRatio`); the streams are scaled
 * together (core/scenario/plant.ts). The density difference at the port is found by the same equation of
 * state as every run (core/properties) on a grid of ratios from 0 to 100, and each sign change is located
 * by bisection to 0.1 % of the ratio.
 */
import type { Scenario } from "../scenario/types";
import { blendRatioOfPlant, scenarioWithBlendRatio } from "../scenario/plant";
import { propertiesFromScenario } from "../properties";

export interface BlendResult {
  /** The scenario's blend ratio (total blending flow ÷ brine flow). */
  readonly ratio: number;
  /** "sinks" (denser than the sea at the port) or "rises" at the scenario's ratio. */
  readonly buoyancy: "sinks" | "rises";
  /** Reduced gravity at the port at the scenario's ratio, m/s² (positive sinks). */
  readonly reducedGravity: number;
  /** The blend ratio at which the buoyancy changes sign nearest the scenario's ratio; null if none in 0–100. */
  readonly signChangeRatio: number | null;
  /** Every blend ratio in 0–100 where the sign changes, ascending, with the buoyancy above it. */
  readonly signChanges: readonly { readonly ratio: number; readonly above: "sinks" | "rises" }[];
  readonly note: string;
}

const MAX_RATIO = 100;

function grid(): number[] {
  const out = [0];
  for (let k = 0; k <= 80; k++) out.push(0.01 * Math.pow(MAX_RATIO / 0.01, k / 80));
  return out;
}

/** The blend's buoyancy and sign changes, or null for a scenario without blending streams. */
export function blendSignChange(scenario: Scenario): BlendResult | null {
  const p = scenario.plant;
  if (!p || p.blending.length === 0) return null;
  const gAt = (r: number) => propertiesFromScenario(scenarioWithBlendRatio(scenario, r)).reducedGravity;
  const ratio = blendRatioOfPlant(p);
  const g0 = propertiesFromScenario(scenario).reducedGravity;
  const xs = grid();
  const gs = xs.map(gAt);
  const changes: { ratio: number; above: "sinks" | "rises" }[] = [];
  for (let i = 1; i < xs.length; i++) {
    const a = gs[i - 1]!;
    const b = gs[i]!;
    if (a > 0 === b > 0) continue;
    let lo = xs[i - 1]!;
    let hi = xs[i]!;
    let glo = a;
    while (hi - lo > 1e-3 * hi) {
      const mid = 0.5 * (lo + hi);
      const gm = gAt(mid);
      if (gm > 0 === glo > 0) {
        lo = mid;
        glo = gm;
      } else hi = mid;
    }
    changes.push({ ratio: 0.5 * (lo + hi), above: b > 0 ? "sinks" : "rises" });
  }
  const nearest = changes.reduce<{ ratio: number } | null>(
    (n, c) => (n === null || Math.abs(c.ratio - ratio) < Math.abs(n.ratio - ratio) ? c : n),
    null,
  );
  const buoyancy = g0 > 0 ? "sinks" : "rises";
  const fmt = (x: number) => x.toPrecision(3);
  const note =
    changes.length === 0
      ? `The blend ${buoyancy === "sinks" ? "sinks" : "rises"} at every blend ratio from 0 to ${MAX_RATIO} (blending flow ÷ brine flow).`
      : changes
          .map(
            (c) =>
              `at a blend ratio of ${fmt(c.ratio)} the discharge changes to ${c.above === "rises" ? "rising (lighter than the sea)" : "sinking (denser than the sea)"}`,
          )
          .join("; ") + `; this scenario's ratio is ${fmt(ratio)}, where it ${buoyancy}.`;
  return { ratio, buoyancy, reducedGravity: g0, signChangeRatio: nearest?.ratio ?? null, signChanges: changes, note };
}
