/**
 * jetSourceWarnings(): port-level checks before any near-field method runs.
 */
import { describe, expect, it } from "vitest";
import { denseJet, uniformColumn, type JetOptions } from "../../helpers/jets";
import { jetSourceWarnings } from "../../../core/nearfield/source-checks";
import type { AmbientColumn, JetSource } from "../../../core/nearfield/types";

const makeJet = (p: JetOptions = {}): JetSource => denseJet({ azimuth: 0, portHeight: 1, ...p });
const makeColumn = (depth: number): AmbientColumn => uniformColumn(depth);

const codes = (jet: JetSource, depth: number) => jetSourceWarnings(jet, makeColumn(depth)).map((w) => w.code);

describe("jetSourceWarnings()", () => {
  it("is silent for a well-placed 60° port in deep water", () => {
    // rise 2.2 dF = 11 m (Roberts et al. 1997, the larger of the two 60° values) + 1 m port height ≪ 30 m
    expect(jetSourceWarnings(makeJet(), makeColumn(30)), "no warnings").toEqual([]);
  });

  it("warns that the jet reaches the surface, using the largest published rise", () => {
    // 2.2 × 0.2 × 25 = 11 m rise + 1 m port height = 12 m ≥ 11.5 m depth; Lai & Lee's 2.08 dF alone
    // (10.4 + 1 m) would not reach it — the check must use the largest dataset.
    const w = jetSourceWarnings(makeJet(), makeColumn(11.5)).find((x) => x.code === "jet-reaches-surface");
    expect(w, "surface warning").toBeDefined();
    expect(w!.severity, "serious").toBe("serious");
    expect(w!.message, "quotes rise, port height and depth").toMatch(/11\.00 m.*1\.00 m.*12\.00 m.*11\.50 m/);
    expect(w!.source, "names the dataset").toMatch(/Roberts/);
    expect(w!.stage, "stage").toBe("source");
  });

  it("warns when the jet comes within 10 % of the surface", () => {
    expect(codes(makeJet(), 13), "12 m of 13 m").toContain("jet-near-surface");
    expect(codes(makeJet(), 13), "not through it").not.toContain("jet-reaches-surface");
  });

  it("warns of seabed attachment for shallow angles and for ports close to the bed", () => {
    expect(codes(makeJet({ angle: 8 }), 30), "8° port").toContain("seabed-attachment-shallow-angle");
    const low = codes(makeJet({ portHeight: 0.3 }), 30);
    expect(low, "0.3 m < 2 d = 0.4 m").toContain("seabed-attachment-low-port");
    const ok = codes(makeJet({ portHeight: 0.5 }), 30);
    expect(ok, "0.5 m ≥ 0.4 m").not.toContain("seabed-attachment-low-port");
  });

  it("warns when the port Reynolds number is below 10⁴ (Abdel-Rahman et al. 1996)", () => {
    // U = 0.5 m/s, d = 0.01 m: Re ≈ 0.5 × 0.01 / 1.1e-6 ≈ 4.5e3 — a laboratory-scale port.
    const w = jetSourceWarnings(makeJet({ U: 0.5, d: 0.01, portHeight: 1 }), makeColumn(30)).find(
      (x) => x.code === "port-reynolds-low",
    );
    expect(w, "low-Re warning").toBeDefined();
    expect(w!.value!, "Re of order 4e3").toBeGreaterThan(3e3);
    expect(w!.value!, "Re of order 4e3").toBeLessThan(6e3);
    expect(w!.source, "cites the Reynolds-number study").toMatch(/Abdel-Rahman/);
    expect(codes(makeJet(), 30), "prototype port, Re ≈ 7e5").not.toContain("port-reynolds-low");
  });

  it("leaves the exit-velocity band to the port stage, so one fact gives one warning", () => {
    const all = jetSourceWarnings(makeJet({ U: 7 }), makeColumn(30)).map((w) => w.message);
    expect(
      all.filter((m) => /exit velocity/i.test(m)),
      "no exit-velocity warning here",
    ).toEqual([]);
  });
});
