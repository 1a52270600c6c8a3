/**
 * The sentence naming the ambient cases that were run. Case names are the user's own text and may
 * contain commas, so each name is quoted (common practice, no source).
 */
import { describe, expect, it } from "vitest";
import { describeCases, expandCases } from "../../../core/cases";
import { fourPortRaw, scenarioFrom } from "../study/fixtures";

describe("describeCases", () => {
  it("quotes each case name so a comma inside a name cannot be read as two cases", () => {
    const raw = fourPortRaw() as Record<string, any>;
    raw.ambientCases = [
      { name: "Slack water, summer", currentSpeed: 0 },
      { name: "Storm", currentSpeed: 0.4 },
    ];
    const s = scenarioFrom(raw);
    const text = describeCases(expandCases(s), s);
    expect(text).toContain("“Slack water, summer”");
    expect(text).toContain("“Storm”");
    expect(text).toMatch(/^Ambient cases: “stated”, /);
  });
});
