/**
 * Reading the diffuser: layout, port count and spacing, flow split, vena-contracta contraction and the
 * risers of a rosette, with their defaults. Ports pointing across the diffuser axis by default and ports
 * spread evenly round a riser are the trade's habit (common practice, no source); a contraction
 * coefficient scales the flow area, so the effective diameter is d·√Cc (geometry: area ∝ d²).
 */
import { describe, it, expect } from "vitest";
import { defaultDiffuserAzimuth } from "../../../core/scenario/normalise";
import { accepted, edited, refusedIssues, refusedMessages, type Raw } from "./rule-fixtures";

function diffuserOf(edit: (d: Raw) => void) {
  return accepted(edited((r) => edit(r.diffuser))).diffuser;
}

function refusal(edit: (d: Raw) => void): string[] {
  return refusedMessages(edited((r) => edit(r.diffuser)));
}

const rosette = (d: Raw, risers: Raw = {}) => {
  delete d.layout;
  delete d.portCount;
  delete d.portSpacing;
  d.risers = { count: 2, portsPerRiser: 3, spacing: 10, ...risers };
};

describe("layout defaults", () => {
  it("is a rosette with risers, a line with several ports and a single port otherwise", () => {
    const r = diffuserOf((d) => rosette(d));
    expect(r.layout).toBe("rosette");
    expect(r.portCount).toBe(6);
    expect(
      diffuserOf((d) => {
        delete d.layout;
      }).layout,
    ).toBe("line");
    const one = diffuserOf((d) => {
      delete d.layout;
      delete d.portCount;
    });
    expect(one.layout).toBe("single");
    expect(one.portCount).toBe(1);
    expect(
      diffuserOf((d) => {
        delete d.layout;
        d.portCount = 1;
      }).layout,
    ).toBe("single");
  });

  it("points the diffuser axis across the ports (port azimuth + 90°, modulo 360)", () => {
    expect(defaultDiffuserAzimuth(0)).toBe(90);
    expect(defaultDiffuserAzimuth(300)).toBe(30);
    expect(defaultDiffuserAzimuth(270)).toBe(0);
    const d = diffuserOf((g) => {
      delete g.diffuserAzimuth;
      g.portAzimuth = 300;
    });
    expect(d.diffuserAzimuth).toBe(30);
    expect(
      diffuserOf((g) => {
        delete g.diffuserAzimuth;
        delete g.portAzimuth;
      }),
    ).toMatchObject({ portAzimuth: 0, diffuserAzimuth: 90 });
  });

  it("takes the length of the port layout when none is given", () => {
    expect(
      diffuserOf((d) => {
        delete d.length;
      }).length,
    ).toBe(15);
    expect(diffuserOf((d) => rosette(d, { count: 3 })).length).toBe(20);
    expect(diffuserOf((d) => (d.length = 40)).length).toBe(40);
  });
});

describe("rosettes", () => {
  it("needs risers", () => {
    expect(
      refusal((d) => {
        d.layout = "rosette";
      }),
    ).toEqual(["diffuser.risers: is missing; expected {count, portsPerRiser, spacing} for a rosette diffuser"]);
  });

  it("takes the port count from the risers, refusing a different one", () => {
    expect(refusal((d) => (rosette(d), (d.portCount = 5)))).toEqual([
      "diffuser.portCount: 5 must equal risers.count × risers.portsPerRiser = 6 (or be left out)",
    ]);
    expect(diffuserOf((d) => (rosette(d), (d.portCount = 6))).portCount).toBe(6);
  });

  it("needs a riser spacing with more than one riser only", () => {
    expect(
      refusal((d) => {
        rosette(d);
        delete d.risers.spacing;
      }),
    ).toEqual(["diffuser.risers.spacing: is missing; expected the spacing between risers (m)"]);
    const one = diffuserOf((d) => {
      rosette(d, { count: 1 });
      delete d.risers.spacing;
    });
    expect(one.risers).toEqual({ count: 1, portsPerRiser: 3, spacing: 0, portAzimuths: [0, 120, 240] });
    expect(one.length).toBe(0);
  });

  it("spreads the ports evenly round each riser from the port azimuth, or takes one azimuth per port", () => {
    const d = diffuserOf((g) => (rosette(g, { portsPerRiser: 4 }), (g.portAzimuth = 30)));
    expect(d.risers!.portAzimuths).toEqual([30, 120, 210, 300]);
    const wrapped = diffuserOf((g) => (rosette(g, { portsPerRiser: 4 }), (g.portAzimuth = 300)));
    expect(wrapped.risers!.portAzimuths).toEqual([300, 30, 120, 210]);
    expect(diffuserOf((g) => rosette(g, { portAzimuths: [10, 20, 30] })).risers!.portAzimuths).toEqual([10, 20, 30]);
    const issues = refusedIssues(edited((r) => rosette(r.diffuser, { portAzimuths: [0, 90] })));
    expect(issues.map((i) => i.message)).toEqual([
      "diffuser.risers.portAzimuths: [0,90] must list 3 azimuths, one per port on a riser",
    ]);
  });
});

describe("single ports and lines of ports", () => {
  it("a single layout has one port", () => {
    expect(refusal((d) => (d.layout = "single"))).toEqual([
      'diffuser.portCount: 4 must be 1 for layout "single" (use "line" or "rosette" for more ports)',
    ]);
  });

  it("a line of several ports needs a spacing of at least one port diameter", () => {
    expect(
      refusal((d) => {
        delete d.portSpacing;
      }),
    ).toEqual([
      "diffuser.portSpacing: is missing; expected the spacing between ports (m) for a diffuser with more than one port",
    ]);
    expect(refusal((d) => (d.portSpacing = 0.1))).toEqual([
      "diffuser.portSpacing: 0.1 must be at least the port diameter (0.12 m): closer ports would overlap",
    ]);
    expect(diffuserOf((d) => (d.portSpacing = 0.12)).portSpacing).toBe(0.12);
    const one = diffuserOf((d) => {
      d.portCount = 1;
      delete d.portSpacing;
    });
    expect(one).toMatchObject({ layout: "line", portCount: 1, portSpacing: 0, length: 0, flowSplit: [1] });
  });
});

describe("flow split", () => {
  it("is equal shares by default", () => {
    expect(diffuserOf(() => {}).flowSplit).toEqual([0.25, 0.25, 0.25, 0.25]);
  });

  it("normalises the given shares to sum to one", () => {
    expect(diffuserOf((d) => (d.flowSplit = [1, 2, 3, 4])).flowSplit).toEqual([0.1, 0.2, 0.3, 0.4]);
    expect(diffuserOf((d) => (d.flowSplit = [5, 5, 5, 5])).flowSplit).toEqual([0.25, 0.25, 0.25, 0.25]);
  });

  it("lists one share per port", () => {
    expect(refusal((d) => (d.flowSplit = [1, 1, 1]))).toEqual([
      'diffuser.flowSplit: "3 values" must list one share per port (4)',
    ]);
    expect(refusal((d) => (d.flowSplit = [1, 0, 1]))).toEqual([
      'diffuser.flowSplit: "3 values" must list one share per port (4)',
    ]);
  });

  it("lists positive shares only, showing the first five", () => {
    expect(refusal((d) => (d.flowSplit = [1, 1, 0, 1]))).toEqual([
      "diffuser.flowSplit: [1,1,0,1] must list positive shares (any scale; they are normalised)",
    ]);
    expect(refusal((d) => (d.flowSplit = [0, 0, 0, 0]))).toEqual([
      "diffuser.flowSplit: [0,0,0,0] must list positive shares (any scale; they are normalised)",
    ]);
    expect(
      refusal((d) => {
        d.portCount = 6;
        d.length = 30;
        d.flowSplit = [1, 1, 1, 1, 1, 0];
      }),
    ).toEqual(["diffuser.flowSplit: [1,1,1,1,1] must list positive shares (any scale; they are normalised)"]);
  });
});

describe("contraction", () => {
  it("scales the area: effective diameter d·√Cc, nominal kept, and says so", () => {
    const s = accepted(edited((r) => (r.diffuser.contraction = 0.64)));
    expect(s.diffuser.portDiameter).toBeCloseTo(0.096, 15);
    expect(s.diffuser.portDiameterNominal).toBe(0.12);
    expect(s.diffuser.contraction).toBe(0.64);
    expect(s.conversions).toContain(
      "diffuser.portDiameter: vena-contracta contraction 0.64 applied to the area → effective diameter 0.096 m",
    );
  });

  it("is 1 by default, with no note", () => {
    const s = accepted(edited(() => {}));
    expect(s.diffuser.contraction).toBe(1);
    expect(s.diffuser.portDiameter).toBe(0.12);
    expect(s.conversions.some((c) => c.includes("vena-contracta"))).toBe(false);
  });
});
