/**
 * Part of normalising a scenario (normalise.ts): the discharge, given directly or computed from the plant
 * (mass balance, blending), and its listed constituents.
 */
import type { ConstituentInput, Scenario } from "./types";
import type { ScenarioFileParsed } from "./schema";
import { blendingAtRatio, brineFlowFromPlant, brineFromPlant } from "./plant";
import { formatNumber } from "../units";
import { issue, type NormaliseContext as Ctx } from "./issue";
import { resolveSalinity } from "./normalise-ambient";

/** Default salt rejection of seawater RO membranes when not given (common practice, no source). */
export const DEFAULT_SALT_REJECTION = 0.997;

/** The discharge's flow (m³/s), salinity (g/kg) and temperature (°C), and the plant they came from. */
export interface NormalisedDischarge {
  readonly flow: number;
  readonly salinity: number;
  readonly temperature: number;
  readonly plant?: Scenario["plant"];
}

/** The discharge, from the plant or as given; null (with issues) when it cannot be worked out. */
export function dischargeFromFile(f: ScenarioFileParsed, ctx: Ctx): NormalisedDischarge | null {
  const d = f.discharge ?? {};
  if (f.plant) {
    if (d.flow !== undefined || d.salinity !== undefined) {
      ctx.issues.push(
        issue(
          "plant",
          "(plant and discharge.flow/salinity)",
          "give either plant (to compute the brine) or discharge.flow and discharge.salinity, not both",
        ),
      );
      return null;
    }
    return dischargeFromPlant(f.plant, d.temperature, ctx);
  }
  if (d.flow === undefined)
    ctx.issues.push(
      issue(
        "discharge.flow",
        undefined,
        'expected the total brine flow (m³/s, e.g. 0.5 or "12 MGD"), or a plant section',
      ),
    );
  if (d.salinity === undefined)
    ctx.issues.push(issue("discharge.salinity", undefined, "expected the brine salinity (g/kg), or a plant section"));
  if (d.temperature === undefined)
    ctx.issues.push(issue("discharge.temperature", undefined, "expected the brine temperature (°C)"));
  if (d.flow === undefined || d.salinity === undefined || d.temperature === undefined) return null;
  return {
    flow: d.flow,
    temperature: d.temperature,
    salinity: resolveSalinity(d.salinity, d.temperature, "discharge.salinity", ctx),
  };
}

/** The brine of the plant (mass balance, then blending), with the conversion notes. */
function dischargeFromPlant(
  p: NonNullable<ScenarioFileParsed["plant"]>,
  brineTemperature: number | undefined,
  ctx: Ctx,
): NormalisedDischarge | null {
  const brineT = brineTemperature ?? p.feedTemperature;
  if (brineT === undefined) {
    ctx.issues.push(
      issue("discharge.temperature", undefined, "expected the brine temperature (°C), or plant.feedTemperature"),
    );
    return null;
  }
  const feedS = resolveSalinity(p.feedSalinity, p.feedTemperature ?? brineT, "plant.feedSalinity", ctx);
  let blending = (p.blending ?? []).map((b, i) => ({
    name: b.name,
    flow: b.flow,
    temperature: b.temperature,
    salinity: resolveSalinity(b.salinity, b.temperature, `plant.blending.${i}.salinity`, ctx),
  }));
  if (p.blendRatio !== undefined) {
    if (blending.length === 0)
      ctx.issues.push(
        issue("plant.blendRatio", p.blendRatio, "needs at least one stream under plant.blending to scale"),
      );
    else {
      blending = blendingAtRatio(blending, brineFlowFromPlant(p.productFlow, p.recovery), p.blendRatio);
      ctx.conversions.push(
        `plant.blendRatio: blending streams scaled together to ${formatNumber(p.blendRatio)} × the brine flow`,
      );
    }
  }
  const rej = p.saltRejection ?? DEFAULT_SALT_REJECTION;
  const bal = brineFromPlant({
    productFlow: p.productFlow,
    recovery: p.recovery,
    feedSalinity: feedS,
    saltRejection: rej,
    brineTemperature: brineT,
    blending,
  });
  const flow = bal.dischargeFlow;
  const salinity = bal.dischargeSalinity;
  const temperature = bal.dischargeTemperature;
  ctx.conversions.push(
    `plant: product ${formatNumber(p.productFlow)} m³/s at recovery ${formatNumber(p.recovery)} and salt rejection ${formatNumber(rej)}${p.saltRejection === undefined ? " (default)" : ""} → brine ${formatNumber(bal.brineFlow)} m³/s at ${formatNumber(bal.brineSalinity)} g/kg (${formatNumber(bal.concentrationFactor, 3)}× the feed)` +
      (blending.length
        ? `; after blending ${blending.length} stream(s): ${formatNumber(flow)} m³/s at ${formatNumber(salinity)} g/kg, ${formatNumber(temperature)} °C`
        : ""),
  );
  const plant: NonNullable<Scenario["plant"]> = {
    productFlow: p.productFlow,
    recovery: p.recovery,
    feedSalinity: feedS,
    saltRejection: rej,
    feedTemperature: p.feedTemperature,
    blending,
  };
  return { flow, salinity, temperature, plant };
}

/** The discharge's listed constituents, each named once and not salinity or temperature. */
export function constituentsFromFile(f: ScenarioFileParsed, ctx: Ctx): ConstituentInput[] {
  const d = f.discharge ?? {};
  const constituents: ConstituentInput[] = (d.constituents ?? []).map((c) => ({
    name: c.name,
    concentration: c.concentration,
    unit: c.unit,
    background: c.background ?? 0,
  }));
  const names = new Set<string>();
  constituents.forEach((c, i) => {
    const k = c.name.toLowerCase();
    if (k === "salinity" || k === "temperature")
      ctx.issues.push(
        issue(
          `discharge.constituents.${i}.name`,
          c.name,
          "is implicit: salinity and temperature come from the discharge and ambient; use another name",
        ),
      );
    if (names.has(k)) ctx.issues.push(issue(`discharge.constituents.${i}.name`, c.name, "is listed twice"));
    names.add(k);
  });
  return constituents;
}
