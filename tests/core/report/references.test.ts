/**
 * The citation table and referencesFromSources(): a method's free-text source finds the works it cites
 * by first author and year, never a co-author's own paper of the same year, and anything unmatched is
 * kept verbatim so the report never drops a stated basis.
 */
import { describe, expect, it } from "vitest";
import { REFERENCES, referencesFromSources, sourceCites } from "../../../core/report";

const byKey = (key: string) => {
  const r = REFERENCES.find((x) => x.key === key);
  if (!r) throw new Error(`no reference ${key}`);
  return r;
};

describe("the citation table", () => {
  it("has unique keys and a full citation with year for every entry", () => {
    const keys = REFERENCES.map((r) => r.key);
    expect(new Set(keys).size, "keys unique").toBe(keys.length);
    for (const r of REFERENCES) {
      expect(r.citation, `${r.key}: year in the citation`).toContain(`(${r.year})`);
      expect(r.citation.length, `${r.key}: a full citation, not a short name`).toBeGreaterThan(60);
    }
  });

  it("carries the published bibliographic details of the core dense-jet papers", () => {
    // Roberts, Ferrier & Daviero (1997), J. Hydraulic Eng. 123(8):693–699.
    expect(byKey("Roberts, Ferrier & Daviero 1997").citation, "Roberts 1997 pages").toContain("123(8), 693–699");
    // Lai & Lee (2012), J. Hydro-environment Research 6:9–28.
    expect(byKey("Lai & Lee 2012").citation, "Lai & Lee 2012 pages").toContain("6, 9–28");
    // Jirka (2004), Environmental Fluid Mechanics 4:1–56.
    expect(byKey("Jirka 2004").citation, "Jirka 2004 pages").toContain("Environmental Fluid Mechanics 4, 1–56");
  });
});

describe("sourceCites()", () => {
  it("matches first author and year in the usual ways of writing them", () => {
    const roberts = byKey("Roberts, Ferrier & Daviero 1997");
    for (const s of [
      "Roberts, Ferrier & Daviero (1997)",
      "Roberts et al. 1997",
      "Roberts et al. (1997), J. Hydraulic Eng.",
    ]) {
      expect(sourceCites(s, roberts), s).toBe(true);
    }
    expect(sourceCites("Roberts & Toms (1987)", roberts), "another Roberts paper").toBe(false);
  });

  it("does not take a co-author for a first author", () => {
    expect(sourceCites("Lai & Lee (2012)", byKey("Lee 2012")), "Lee is second author here").toBe(false);
    expect(sourceCites("Lai & Lee (2012)", byKey("Lai & Lee 2012")), "Lai is first author").toBe(true);
    expect(sourceCites("Ellison & Turner (1959)", byKey("Turner 1966")), "Turner second author, other year").toBe(
      false,
    );
  });

  it("ignores accents and finds works by alias", () => {
    expect(sourceCites("Sanchez-Lizaso et al. (2008)", byKey("Sánchez-Lizaso et al. 2008")), "accent folded").toBe(
      true,
    );
    expect(sourceCites("TEOS-10 Gibbs function", byKey("IOC, SCOR & IAPSO 2010")), "TEOS-10 alias").toBe(true);
  });
});

describe("referencesFromSources()", () => {
  it("collects each cited work once, in table order", () => {
    const { references, uncited } = referencesFromSources([
      "Lai & Lee (2012); Roberts et al. (1997)",
      "Roberts, Ferrier & Daviero (1997)",
      "Brooks (1960) 4/3-law lateral diffusion, as reproduced in Fischer et al. (1979) ch. 9",
    ]);
    expect(
      references.map((r) => r.key),
      "works found",
    ).toEqual([
      "Roberts, Ferrier & Daviero 1997",
      "Lai & Lee 2012",
      "Fischer et al. 1979",
      "Brooks 1960",
      "Richardson 1926",
    ]);
    expect(uncited, "all explained").toEqual([]);
  });

  it("keeps stated bases without a tabled work, and sources naming an untabled year, verbatim", () => {
    const { uncited } = referencesFromSources([
      "common practice, no source (about 2–6 m/s)",
      "Lai & Lee (2012) and Nobody (1888)",
      "",
      "common practice, no source (about 2–6 m/s)",
    ]);
    expect(uncited, "kept once each, empties dropped").toEqual([
      "common practice, no source (about 2–6 m/s)",
      "Lai & Lee (2012) and Nobody (1888)",
    ]);
  });
});
