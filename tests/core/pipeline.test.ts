/**
 * The whole pipeline on the demo scenarios and on edge cases: contract shape, physical ordering and
 * a blend lighter than the sea computed as a rising plume.
 */
import { describe, it, expect } from "vitest";
import { readFileSync, readdirSync } from "node:fs";
import { join } from "node:path";
import { parseScenario } from "../../core/scenario/parse";
import { runAmbientCase, runScenario } from "../../core/pipeline";
import { evaluateScenario } from "../../core/study/evaluate";
import { summaryWithIntake } from "../../core/intake/summary";
import { expandCases } from "../../core/cases";

const demoDir = join(__dirname, "../../demo-scenarios");
const demos = readdirSync(demoDir).filter((f) => f.endsWith(".json"));
const load = (f: string) => JSON.parse(readFileSync(join(demoDir, f), "utf8"));
function scenarioOf(raw: unknown) {
  const r = parseScenario(raw);
  if (!r.ok) throw new Error(r.issues.map((i) => i.message).join("; "));
  return r.scenario;
}

describe("runScenario()", () => {
  it.each(demos)("gives a complete, serialisable result for %s", (file) => {
    const r = runScenario(scenarioOf(load(file)));
    expect(r.format, "format").toBe("brinefield-result");
    expect(r.version, "version").toBe(1);
    expect(r.caution.startsWith("Caution"), "caution begins with the word Caution").toBe(true);
    expect(JSON.parse(JSON.stringify(r)), "round-trips through JSON").toEqual(JSON.parse(JSON.stringify(r)));
    expect(
      r.nearField.map((m) => m.method),
      "both methods side by side",
    ).toEqual(["length-scale", "integral"]);
    const rising = r.densities.discharge <= r.densities.ambient;
    for (const m of r.nearField)
      expect(m.risingField !== undefined, `${m.method}: read as a rising plume exactly when lighter than the sea`).toBe(
        rising,
      );
    const gp = (9.80665 * (r.densities.discharge - r.densities.ambient)) / r.densities.ambient;
    expect(Math.abs(r.densities.reducedGravity - gp) < 1e-9, "g′ = g(ρ0 − ρa)/ρa").toBe(true);
    const froude = r.port.velocity / Math.sqrt(Math.abs(r.densities.reducedGravity) * r.port.diameter);
    expect(Math.abs(r.port.froude - froude) < 1e-9 * froude, "F = U/√(g′d)").toBe(true);
    expect(Math.abs(r.port.flow * r.port.count - r.discharge.flow) < 1e-12, "port flows add up").toBe(true);
    for (const m of r.nearField) {
      if (m.impactDilution !== null) expect(m.impactDilution >= 1, `${m.method}: impact dilution ≥ 1`).toBe(true);
      if (m.nearFieldDilution !== null && m.impactDilution !== null)
        expect(m.nearFieldDilution >= m.impactDilution, `${m.method}: near-field dilution ≥ impact dilution`).toBe(
          true,
        );
      expect(m.source.length > 10, `${m.method}: names its source`).toBe(true);
    }
    const edge = r.mixingZone.dilution;
    expect(Number.isFinite(edge) && edge >= 1, "edge dilution finite and ≥ 1").toBe(true);
    const s = r.mixingZone.series;
    for (let i = 1; i < s.dilution.length; i++) {
      expect(s.distance[i]! >= s.distance[i - 1]!, "series distances ascend").toBe(true);
      expect(
        s.dilution[i]! >= s.dilution[i - 1]! * (1 - 1e-9),
        `series dilution non-decreasing at ${s.distance[i]} m`,
      ).toBe(true);
    }
    for (const c of r.mixingZone.constituents) {
      const lo = Math.min(c.background, c.discharge) - 1e-9;
      const hi = Math.max(c.background, c.discharge) + 1e-9;
      expect(c.concentration >= lo && c.concentration <= hi, `${c.constituent} between background and discharge`).toBe(
        true,
      );
    }
    expect(r.compliance.margin, "margin = edge ÷ required").toBeCloseTo(edge / r.compliance.requiredDilution, 9);
  });

  it("computes a blend lighter than the sea at the port as a rising plume, by both methods", () => {
    const raw = load("sandy-shelf.json");
    raw.discharge.salinity = 30; // fresher than the 35.6 g/kg sea: it rises
    const r = runScenario(scenarioOf(raw));
    expect(r.densities.reducedGravity, "lighter than the sea").toBeLessThan(0);
    expect(r.nearField.map((m) => m.method)).toEqual(["length-scale", "integral"]);
    for (const m of r.nearField)
      expect(m.risingField?.kind, `${m.method} ends at the surface or a trap level`).toMatch(/^(surface|trapped)$/);
    expect(["meets", "exceeds", "outside-scope"]).toContain(r.overall.verdict);
    expect(Number.isFinite(r.mixingZone.dilution) && r.mixingZone.dilution >= 1, "an edge dilution").toBe(true);
  });

  it("reports the same numbers with and without the path (Monte Carlo mode)", () => {
    const s = scenarioOf(load("island-cove.json"));
    const a = runScenario(s);
    const b = runScenario(s, { includePath: false });
    expect(b.mixingZone.dilution, "edge dilution independent of path output").toBe(a.mixingZone.dilution);
    expect(b.nearField[1]!.impactDilution, "integral impact dilution independent of path output").toBe(
      a.nearField[1]!.impactDilution,
    );
  });

  it.each(demos)('gives the same edge verdict in the lighter "edge" detail used by study loops (%s)', (file) => {
    const s = scenarioOf(load(file));
    const full = runScenario(s);
    const edge = runScenario(s, { includePath: false, detail: "edge" });
    expect(edge.mixingZone.dilution, "edge dilution").toBe(full.mixingZone.dilution);
    expect(edge.compliance, "compliance").toEqual(full.compliance);
    expect(
      edge.nearField.map((m) => m.impactDilution),
      "near-field dilutions",
    ).toEqual(full.nearField.map((m) => m.impactDilution));
  });

  it.each(demos)("gives a study the summary and warnings of the full pipeline, case by case (%s)", (file) => {
    // The footprint is computed in full detail only, and with it its warning.
    const notFootprint = (w: { code: string }) => w.code !== "footprint-beyond-range";
    for (const c of expandCases(scenarioOf(load(file)))) {
      const full = runAmbientCase(c.scenario);
      const edge = runAmbientCase(c.scenario, { detail: "edge" });
      const fullWithoutFootprint = { ...full, warnings: full.warnings.filter(notFootprint) };
      expect(evaluateScenario(c.scenario), `${c.name}: study summary`).toEqual(
        summaryWithIntake(c.scenario, fullWithoutFootprint),
      );
      expect(edge.warnings, `${c.name}: warnings`).toEqual(fullWithoutFootprint.warnings);
      // Edge detail builds no texts: the merging reason and the methods' notes are empty, all else is equal.
      expect({ ...edge.multiport, reason: "" }, `${c.name}: merging`).toEqual({ ...full.multiport, reason: "" });
      // (A rising plume's stages build their texts in either detail.)
      const sinks = full.densities.reducedGravity > 0;
      if (sinks) expect(edge.multiport.reason, `${c.name}: no merging reason`).toBe("");
      expect(edge.port, `${c.name}: port`).toEqual(full.port);
      expect(edge.densities, `${c.name}: densities`).toEqual(full.densities);
      const withoutText = ({ notes: _n, variants, ...rest }: (typeof full.nearField)[number]) => ({
        ...rest,
        variants: variants?.map(({ note: _v, ...v }) => v),
      });
      for (const [i, m] of edge.nearField.entries()) {
        const f = full.nearField[i]!;
        expect(withoutText(m), `${c.name}: ${m.method}, all but the texts`).toEqual(withoutText(f));
        if (sinks) expect(m.notes, `${c.name}: ${m.method} builds no notes`).toEqual([]);
        expect(f.notes!.length > 0, `${c.name}: ${m.method} has notes in full detail`).toBe(true);
      }
    }
  });
});

describe("a statically unstable ambient profile", () => {
  it("makes the case outside-scope with the reason, keeping the numbers", () => {
    const raw = load("sandy-shelf.json");
    const depth = 14; // the demo's "14 m"
    expect(raw.ambient.depth, "demo depth").toBe("14 m");
    // 35 g/kg at 10 °C over 35 g/kg at 20 °C: the bottom water is about 2 kg/m³ lighter (TEOS-10).
    const unstable = {
      ...raw,
      ambient: {
        depth: raw.ambient.depth,
        profile: [
          { depth: 0, salinity: 35, temperature: 10 },
          { depth, salinity: 35, temperature: 20 },
        ],
      },
    };
    delete unstable.ambientCases;
    const r = runScenario(scenarioOf(unstable));
    expect(r.warnings.find((w) => w.code === "ambient-statically-unstable")?.severity, "a serious warning").toBe(
      "serious",
    );
    expect(r.compliance.verdict, "no verdict on an overturning column").toBe("outside-scope");
    expect(
      r.compliance.scopeReasons.some((s) => /statically unstable/.test(s)),
      "the reason says why",
    ).toBe(true);
    expect(Number.isFinite(r.mixingZone.dilution), "numbers kept").toBe(true);
    const stable = {
      ...unstable,
      ambient: {
        ...unstable.ambient,
        profile: [
          { depth: 0, salinity: 35, temperature: 20 },
          { depth, salinity: 35, temperature: 10 },
        ],
      },
    };
    expect(
      runScenario(scenarioOf(stable)).warnings.some((w) => w.code === "ambient-statically-unstable"),
      "the stable column (swapped) raises nothing",
    ).toBe(false);
  });

  it("checks the viscosity fit's range where the port stage uses it (Sharqawy et al. 2010: 0–150 g/kg)", () => {
    const raw = load(demos[0]!);
    const at = (salinity: number) => {
      const file = { ...raw, discharge: { flow: 0.1, salinity, temperature: 25 } };
      delete (file as { plant?: unknown }).plant;
      return runScenario(scenarioOf(file)).warnings.filter((w) => w.code === "viscosity-salinity-range");
    };
    const outside = at(155);
    expect(outside.length, "155 g/kg is outside the fit").toBe(1);
    expect(outside[0]!.parameter, "names the field").toBe("discharge.salinity");
    expect(at(70), "70 g/kg is inside").toEqual([]);
  });
});
