/**
 * Input distributions for Monte Carlo studies, and the default spreads used when a scenario states none.
 * Parameters are SI, like the normalised scenario. A missing centre (normal mean, lognormal median,
 * triangular mode) is taken from the scenario's own value, so a distribution can be written as a spread.
 */
import type { Scenario, UncertainInput } from "../scenario/types";
import { standardNormal, type RandomSource } from "./random";
import { overridePathInfo, readPath } from "./overrides";
import { siToDisplay } from "../units";

export type DistributionName = UncertainInput["distribution"];

/** A distribution with every parameter resolved (centre filled from the base scenario). */
export type ResolvedDistribution =
  | { readonly path: string; readonly distribution: "normal"; readonly mean: number; readonly sd: number }
  | { readonly path: string; readonly distribution: "uniform"; readonly min: number; readonly max: number }
  | {
      readonly path: string;
      readonly distribution: "lognormal";
      readonly median: number;
      readonly gsd: number;
    }
  | {
      readonly path: string;
      readonly distribution: "triangular";
      readonly min: number;
      readonly mode: number;
      readonly max: number;
    };

export interface DistributionIssue {
  readonly path: string;
  readonly message: string;
}

/**
 * Draws one value. Each distribution consumes exactly two uniforms, whatever its kind, so adding or
 * changing one input never shifts the random numbers another input sees.
 */
export function sampleDistribution(d: ResolvedDistribution, rng: RandomSource): number {
  switch (d.distribution) {
    case "normal":
      return d.mean + d.sd * standardNormal(rng);
    case "lognormal":
      // ln X ~ N(ln median, ln gsd): median·gsd^z.
      return d.median * Math.exp(Math.log(d.gsd) * standardNormal(rng));
    case "uniform": {
      const u = rng.next();
      rng.next();
      return d.min + (d.max - d.min) * u;
    }
    case "triangular": {
      const u = rng.next();
      rng.next();
      return triangularQuantile(d.min, d.mode, d.max, u);
    }
  }
}

/** Inverse CDF of the triangular distribution on [a, b] with mode c (standard closed form). */
export function triangularQuantile(a: number, c: number, b: number, u: number): number {
  if (b === a) return a; // zero width: a point mass
  const fc = (c - a) / (b - a);
  if (u < fc) return a + Math.sqrt(u * (b - a) * (c - a));
  return b - Math.sqrt((1 - u) * (b - a) * (b - c));
}

/** Fills missing centres from the base scenario and checks every parameter; never throws. */
export function resolveDistribution(
  input: UncertainInput,
  base: Scenario,
): { ok: true; value: ResolvedDistribution } | { ok: false; issue: DistributionIssue } {
  const p = input.params;
  const path = input.path;
  const bad = (message: string) => ({ ok: false as const, issue: { path, message } });
  let centre: number;
  try {
    centre = readPath(base, path);
  } catch (err) {
    return bad(err instanceof Error ? err.message : String(err));
  }
  const finite = (v: number | undefined): v is number => v !== undefined && Number.isFinite(v);
  switch (input.distribution) {
    case "normal": {
      const mean = p.mean ?? centre;
      if (!finite(p.sd) || p.sd < 0) return bad("normal distribution needs sd ≥ 0");
      if (!finite(mean)) return bad("normal distribution mean must be a finite number");
      return { ok: true, value: { path, distribution: "normal", mean, sd: p.sd } };
    }
    case "uniform": {
      if (!finite(p.min) || !finite(p.max) || p.max < p.min) {
        return bad("uniform distribution needs min ≤ max");
      }
      return { ok: true, value: { path, distribution: "uniform", min: p.min, max: p.max } };
    }
    case "lognormal": {
      const median = p.median ?? centre;
      if (!finite(median) || median <= 0) return bad("lognormal distribution needs a positive median");
      if (!finite(p.gsd) || p.gsd < 1) {
        return bad("lognormal distribution needs a geometric standard deviation gsd ≥ 1");
      }
      return { ok: true, value: { path, distribution: "lognormal", median, gsd: p.gsd } };
    }
    case "triangular": {
      const mode = p.mode ?? centre;
      if (!finite(p.min) || !finite(p.max) || !finite(mode) || !(p.min <= mode && mode <= p.max)) {
        return bad("triangular distribution needs min ≤ mode ≤ max");
      }
      return { ok: true, value: { path, distribution: "triangular", min: p.min, mode, max: p.max } };
    }
  }
}

/** The value a distribution is centred on (mean, median or mode); the deviation reference for cases. */
export function distributionCentre(d: ResolvedDistribution): number {
  switch (d.distribution) {
    case "normal":
      return d.mean;
    case "lognormal":
      return d.median;
    case "uniform":
      return (d.min + d.max) / 2;
    case "triangular":
      return d.mode;
  }
}

/** Readable one-line statement of a distribution, SI units. */
export function describeDistribution(d: ResolvedDistribution): string {
  const info = overridePathInfo(d.path);
  const unit = info ? siToDisplay(1, info.kind, "si").unit : "";
  const u = (v: number) => (unit ? `${fmt(v)} ${unit}` : fmt(v));
  const what = info ? `${info.label} (${d.path})` : d.path;
  switch (d.distribution) {
    case "normal":
      return `${what}: normal, mean ${u(d.mean)}, standard deviation ${u(d.sd)}`;
    case "lognormal":
      return `${what}: lognormal, median ${u(d.median)}, geometric standard deviation ${fmt(d.gsd)} (about two runs in three lie between the median ÷ ${fmt(d.gsd)} and × ${fmt(d.gsd)})`;
    case "uniform":
      return `${what}: uniform from ${u(d.min)} to ${u(d.max)}`;
    case "triangular":
      return `${what}: triangular, min ${u(d.min)}, most likely ${u(d.mode)}, max ${u(d.max)}`;
  }
}

function fmt(v: number): string {
  return Number(v.toPrecision(4)).toString();
}

/**
 * Default spreads, used only when the scenario lists no uncertain inputs. They are screening
 * judgements (common practice, no source), chosen to be plainly stated rather than precise:
 * - current speed: lognormal about the stated speed, geometric sd 1.5 (currents are skewed and
 *   positive); left fixed when the stated speed is zero (slack water stays slack);
 * - ambient salinity: normal, sd 0.5 g/kg; ambient temperature: normal, sd 1.5 °C;
 * - brine (discharge) salinity: normal, sd 2 % of the stated value; brine flow: normal, sd 5 %.
 */
export function defaultUncertainInputs(base: Scenario): UncertainInput[] {
  const inputs: UncertainInput[] = [];
  if (base.ambient.currentSpeed > 0) {
    inputs.push({ path: "ambient.currentSpeed", distribution: "lognormal", params: { gsd: 1.5 } });
  }
  inputs.push({ path: "ambient.salinity", distribution: "normal", params: { sd: 0.5 } });
  inputs.push({ path: "ambient.temperature", distribution: "normal", params: { sd: 1.5 } });
  const brineSalinitySd = 0.02 * base.discharge.salinity;
  inputs.push({ path: "discharge.salinity", distribution: "normal", params: { sd: brineSalinitySd } });
  inputs.push({ path: "discharge.flow", distribution: "normal", params: { sd: 0.05 * base.discharge.flow } });
  return inputs;
}

export const DEFAULT_SPREADS_NOTE =
  "The scenario states no uncertain inputs, so default spreads were used (screening judgement, no source): " +
  "current speed lognormal with geometric sd 1.5 about the stated speed (fixed if zero), ambient salinity " +
  "normal sd 0.5 g/kg, ambient temperature normal sd 1.5 °C, brine salinity normal sd 2 %, " +
  "brine flow normal sd 5 %.";
