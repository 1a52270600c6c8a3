/**
 * Brine at the plant's intake. Checks: an intake at the diffuser centre sees the near-field dilution the
 * near-field stage reports; far upstream in a strong current the layer's front is arrested (a gravity-
 * current front moves at √2·√(g′h) in deep water: Benjamin, T.B., J. Fluid Mech. 31(2):209–248, 1968,
 * value from memory) and the intake sees no brine; the plant balance with recirculation against a hand
 * calculation (mass balance of the trade's screening convention, common practice, no source).
 */
import { describe, it, expect } from "vitest";
import { runScenario } from "../../../core/pipeline";
import { evaluateCases } from "../../../core/study/summary";
import { evaluateScenario } from "../../../core/study/evaluate";
import { intakeFromSeries, bearingDifference } from "../../../core/intake/intake";
import { recirculationFromPlant } from "../../../core/intake/recirculation";
import { scenarioWith } from "../record/fixtures";
import type { SeriesStage } from "../../../core/result/contract";

const run = (ambient: Record<string, unknown>, intake: Record<string, unknown>) =>
  runScenario(scenarioWith({ ambient, intake }), { includePath: false });

describe("intake: dilution and salinity increase", () => {
  it("an intake at the diffuser centre sees the near-field dilution", () => {
    for (const currentSpeed of [0, 0.1, 0.4]) {
      const r = run({ currentSpeed }, { distance: 0, bearing: 0, heightAboveSeabed: 1 });
      const nf = r.nearField.find((m) => m.method === r.mixingZone.nearFieldMethod)!;
      expect(r.intake!.dilution, `current ${currentSpeed} m/s`).toBeCloseTo(nf.nearFieldDilution!, 9);
      expect(r.intake!.salinityIncrease).toBeCloseTo((65 - 36) / nf.nearFieldDilution!, 6);
    }
  });

  it("far upstream in a strong current sees no increase; the same distance downstream does", () => {
    const up = run({ currentSpeed: 0.8, currentDirection: 90 }, { distance: 600, bearing: 270, heightAboveSeabed: 1 });
    expect(up.intake!.salinityIncrease).toBe(0);
    expect(up.intake!.dilution).toBeNull();
    expect(up.intake!.upstreamReach!).toBeLessThan(600);
    const down = run({ currentSpeed: 0.8, currentDirection: 90 }, { distance: 600, bearing: 90, heightAboveSeabed: 1 });
    expect(down.intake!.salinityIncrease).toBeGreaterThan(0);
  });

  it("in slack water the layer spreads the same way in every direction", () => {
    const a = run({ currentSpeed: 0 }, { distance: 150, bearing: 10, heightAboveSeabed: 0.5 });
    const b = run({ currentSpeed: 0 }, { distance: 150, bearing: 250, heightAboveSeabed: 0.5 });
    expect(a.intake!.dilution).toBe(b.intake!.dilution);
    expect(a.intake!.inDenseLayer, "0.5 m above the seabed is inside a layer over a metre thick").toBe(true);
    expect(a.warnings.some((w) => w.code === "intake-in-dense-layer")).toBe(true);
  });

  it("arrest rule: the upstream reach is where √2·√(g′h) falls to the opposing current", () => {
    const series = {
      distance: [0, 10, 20, 40, 80],
      dilution: [1, 20, 30, 40, 50],
      salinityIncrease: [30, 1.5, 1, 0.75, 0.6],
      layerThickness: [null, 1, 0.8, 0.5, 0.4],
      stage: ["jet", "spreading-layer", "spreading-layer", "spreading-layer", "spreading-layer"] as SeriesStage[],
    };
    const g0 = 0.25;
    // Front speeds: √2·√(0.25/20·1) = 0.158; /30·0.8 → 0.115; /40·0.5 → 0.079; /50·0.4 → 0.063 m/s.
    const at = (distance: number, speed: number) =>
      intakeFromSeries({ distance, bearing: 180, heightAboveSeabed: 2 }, series, { speed, direction: 0 }, g0);
    expect(at(30, 0.1).upstreamReach, "arrested between 20 m (0.115 m/s) and 40 m (0.079 m/s)").toBe(20);
    expect(at(30, 0.1).salinityIncrease).toBe(0);
    expect(at(15, 0.1).dilution).toBeCloseTo(25, 12);
    expect(at(30, 0.05).upstreamReach, "never arrested: taken to reach (conservative)").toBeNull();
    expect(at(30, 0.05).dilution).toBeCloseTo(35, 12);
    expect(at(5, 0.5).dilution, "inside the near field always the near-field dilution").toBe(20);
    expect(bearingDifference(350, 10)).toBe(20);
  });

  it("the study path gives the intake the same figures and folds its limit into the verdict", () => {
    const s = scenarioWith({
      ambient: { currentSpeed: 0.1 },
      intake: { distance: 50, bearing: 90, heightAboveSeabed: 1, maxSalinityIncrease: 0.01 },
      options: { addSlackWater: true },
    });
    const r = runScenario(s, { includePath: false });
    const study = evaluateCases(s, evaluateScenario);
    expect(r.intake!.verdict).toBe("exceeds");
    expect(r.overall.verdict).toBe("exceeds");
    expect(r.overall.governingCase).toBe("intake");
    expect(study.overall).toEqual(r.overall);
  });
});

describe("intake: plant balance with the brine drawn back in", () => {
  it("matches a hand calculation", () => {
    const plant = { productFlow: 0.5, recovery: 0.45, feedSalinity: 37, saltRejection: 0.997, feedTemperature: 22 };
    const s = scenarioWith({
      plant,
      ambient: { salinity: 37 },
      intake: { distance: 0, bearing: 0, heightAboveSeabed: 1 },
    });
    // Hand calculation: brine/feed k = (1 − r·(1 − rejection))/(1 − r) = (1 − 0.45·0.003)/0.55 = 1.8157273
    // Steady feed S_f = 37 + (k·S_f − 37)/D  ⇒  S_f = (37 − 37/D)/(1 − k/D); D = 20: S_f = 35.15/0.90921364 = 38.659...
    const k = (1 - 0.45 * 0.003) / 0.55;
    const D = 20;
    const feed = (37 - 37 / D) / (1 - k / D);
    const rc = recirculationFromPlant(s, D, 37)!;
    expect(rc.feedSalinity!).toBeCloseTo(feed, 10);
    expect(rc.feedSalinity!).toBeCloseTo(38.6598, 3);
    expect(rc.brineSalinity!).toBeCloseTo(k * feed, 10);
    expect(rc.brineFlow).toBeCloseTo((0.5 * 0.55) / 0.45, 12);
    // Fixed point: the discharge of the raised feed, diluted D times, raises the feed by exactly that.
    expect(37 + (rc.brineSalinity! - 37) / D).toBeCloseTo(rc.feedSalinity!, 10);
    expect(recirculationFromPlant(s, null, 37)!.feedSalinity, "no brine at the intake: the stated feed").toBe(37);
    expect(recirculationFromPlant(s, 1.5, 37)!.feedSalinity, "dilution below k: no steady state").toBeNull();
    const r = runScenario(s, { includePath: false });
    expect(r.intake!.recirculation!.feedSalinity!, "through the pipeline").toBeGreaterThan(37);
  });
});
