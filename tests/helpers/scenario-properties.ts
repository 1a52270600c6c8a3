/** The properties every scenario must satisfy; shared by the unit suite and the long fuzz run. */
import { expect } from "vitest";
import { parseScenario } from "../../core/scenario/parse";
import { runScenario } from "../../core/pipeline";
import type { BrinefieldResult } from "../../core/result/contract";
import type { Scenario } from "../../core/scenario/types";

const finite = (v: number | null | undefined) => v === null || v === undefined || Number.isFinite(v);

/** What one valid scenario came to: a verdict, or "refused" (the dense-jet scope refusal). */
export type ValidOutcome = "meets" | "exceeds" | "outside-scope" | "refused";

export function checkValidScenario(raw: unknown): ValidOutcome {
  const parsed = parseScenario(raw);
  if (!parsed.ok) throw new Error(`valid scenario rejected: ${parsed.issues.map((i) => i.message).join("; ")}`);
  // Either buoyancy is computed: a discharge lighter than the sea at the port rises (no refusal).
  const r = runScenario(parsed.scenario, { includePath: true });
  const rising = !(r.densities.reducedGravity > 0);
  for (const m of r.nearField) {
    expect(m.risingField !== undefined, `${m.method}: read as a rising plume exactly when lighter than the sea`).toBe(
      rising,
    );
    if (rising && m.available && m.maxRiseHeight !== null) {
      const room = parsed.scenario.ambient.depth - parsed.scenario.diffuser.portHeight;
      expect(
        m.maxRiseHeight <= room * (1 + 1e-9),
        `${m.method}: a rising plume's upper edge (${m.maxRiseHeight} m) stays in the water (${room} m)`,
      ).toBe(true);
      expect(m.impactDilution, `${m.method}: a rising plume has no seabed impact`).toBeNull();
    }
  }
  checkPhysicalOrder(r, parsed.scenario);
  for (const m of r.nearField) {
    for (const k of [
      "maxRiseHeight",
      "returnDistance",
      "impactDistance",
      "impactDilution",
      "nearFieldDistance",
      "nearFieldDilution",
      "entrainedFlow",
    ] as const)
      expect(finite(m[k]), `${m.method}.${k} finite (${m[k]})`).toBe(true);
    if (m.impactDilution !== null)
      expect(m.impactDilution >= 1 - 1e-9, `${m.method}: impact dilution ${m.impactDilution} ≥ 1`).toBe(true);
    if (m.nearFieldDilution !== null && m.impactDilution !== null)
      expect(m.nearFieldDilution >= m.impactDilution * (1 - 1e-9), `${m.method}: near-field ≥ impact dilution`).toBe(
        true,
      );
    const path = m.path ?? [];
    for (let i = 1; i < path.length; i++) {
      expect(
        path[i]!.dilution >= path[i - 1]!.dilution * (1 - 1e-9),
        `${m.method}: dilution non-decreasing along the path`,
      ).toBe(true);
      expect(path[i]!.s >= path[i - 1]!.s, "s ascends").toBe(true);
    }
  }
  const z = r.mixingZone;
  expect(Number.isFinite(z.dilution) && z.dilution >= 1 - 1e-9, `edge dilution ${z.dilution} finite and ≥ 1`).toBe(
    true,
  );
  const s = z.series;
  for (let i = 1; i < s.dilution.length; i++) {
    expect(
      s.dilution[i]! >= s.dilution[i - 1]! * (1 - 1e-9),
      `series dilution non-decreasing with distance (${s.distance[i]} m)`,
    ).toBe(true);
  }
  if (!z.edgeInsideNearField) {
    const nf = r.nearField.find((m) => m.method === z.nearFieldMethod) ?? r.nearField[0]!;
    const nfd = nf.nearFieldDilution ?? nf.impactDilution;
    if (nfd !== null && nf.nearFieldDistance !== null && nf.nearFieldDistance <= z.radius)
      expect(z.dilution >= nfd * (1 - 1e-6), `edge dilution ${z.dilution} ≥ near-field dilution ${nfd}`).toBe(true);
  }
  for (const c of z.constituents) {
    const lo = Math.min(c.background, c.discharge) - 1e-9;
    const hi = Math.max(c.background, c.discharge) + 1e-9;
    expect(
      c.concentration >= lo && c.concentration <= hi,
      `${c.constituent} ${c.concentration} between background and discharge`,
    ).toBe(true);
  }
  expect(
    Number.isFinite(r.compliance.margin) || r.compliance.margin === Number.POSITIVE_INFINITY,
    "margin is a number",
  ).toBe(true);
  checkVerdicts(r, parsed.scenario);
  checkMargins(r, parsed.scenario);
  return r.compliance.verdict;
}

/**
 * Physical order and every value within its own range:
 * - the jet's upper edge (port height + maximum rise) stays in the water unless the verdict is
 *   outside-scope (a jet reaching the surface is outside the dense-jet methods);
 * - the length-scale rise is at most 2.5 d·F for a single unmerged dense jet: the largest published
 *   terminal-rise coefficient of the inclined dense jet is y_t/(dF) = 2.2 at 60° (Roberts, Ferrier &
 *   Daviero 1997, J. Hydraul. Eng. 123(8):693–699); other angles and a current give less;
 * - the integral model's rise lies within its own path: between the highest centreline point and that
 *   point's upper edge (centreline + 2 half-widths, a generous envelope for any half-width definition);
 * - each method's impact dilution lies within its own [low, high] range, and low ≥ 1;
 * - the dense layer is no thicker than the water unless outside-scope; the footprint is not negative.
 */
export function checkPhysicalOrder(r: BrinefieldResult, s: Scenario): void {
  const outside = r.compliance.verdict === "outside-scope";
  const room = s.ambient.depth - s.diffuser.portHeight;
  for (const m of r.nearField) {
    if (!m.available) continue;
    if (m.maxRiseHeight !== null) {
      expect(m.maxRiseHeight >= 0, `${m.method}: rise ${m.maxRiseHeight} m not negative`).toBe(true);
      if (!outside)
        expect(
          m.maxRiseHeight <= room * (1 + 1e-9),
          `${m.method}: rise ${m.maxRiseHeight} m ≤ water above the port ${room} m (verdict ${r.compliance.verdict})`,
        ).toBe(true);
      if (m.method === "length-scale" && !r.multiport.merged && r.port.froude > 0 && r.densities.reducedGravity > 0) {
        const ratio = m.maxRiseHeight / (r.port.diameter * r.port.froude);
        expect(ratio <= 2.5, `length-scale rise ${m.maxRiseHeight} m = ${ratio} d·F, above the published 2.2 d·F`).toBe(
          true,
        );
      }
      const path = m.path ?? [];
      if (m.method === "integral" && path.length > 1) {
        let top = -Infinity;
        let edge = -Infinity;
        for (const p of path) {
          top = Math.max(top, p.z);
          edge = Math.max(edge, p.z + 2 * p.halfWidth);
        }
        expect(
          m.maxRiseHeight <= edge + 1e-6 && m.maxRiseHeight >= Math.min(top, 0) - 1e-6,
          `integral rise ${m.maxRiseHeight} m within its path (centreline top ${top} m, upper envelope ${edge} m)`,
        ).toBe(true);
      }
    }
    if (m.dilutionRange !== null && m.impactDilution !== null) {
      const [lo, hi] = m.dilutionRange;
      expect(lo >= 1 - 1e-9 && lo <= hi, `${m.method}: dilution range [${lo}, ${hi}] ordered, low ≥ 1`).toBe(true);
      expect(
        m.impactDilution >= lo * (1 - 1e-9) && m.impactDilution <= hi * (1 + 1e-9),
        `${m.method}: impact dilution ${m.impactDilution} within its range [${lo}, ${hi}]`,
      ).toBe(true);
    }
  }
  const z = r.mixingZone;
  if (z.layerThickness !== null) {
    expect(z.layerThickness >= 0, `layer thickness ${z.layerThickness} m not negative`).toBe(true);
    if (!outside)
      expect(
        z.layerThickness <= s.ambient.depth * (1 + 1e-9),
        `layer ${z.layerThickness} m no thicker than the water ${s.ambient.depth} m`,
      ).toBe(true);
  }
  expect(z.footprint.area >= 0 && z.footprint.furthestExtent >= 0, "footprint area and extent not negative").toBe(true);
}

/**
 * Verdict against margin, from the definitions (common practice, no source): the dilution a limit needs
 * is S_req = max(1, (C_discharge − C_background)/(C_limit − C_background)); a limit's margin is the edge
 * dilution ÷ S_req; it passes when the margin is at least 1; the governing margin is the smallest;
 * "meets" needs every limit passed and "exceeds" at least one failed.
 */
export function checkMargins(r: BrinefieldResult, s: Scenario): void {
  const c = r.compliance;
  const edge = r.mixingZone.dilution;
  expect(c.constituents.length, "one compliance line per limit").toBe(s.mixingZone.limits.length);
  let smallest = Infinity;
  s.mixingZone.limits.forEach((limit, i) => {
    const line = c.constituents[i]!;
    const at = r.mixingZone.constituents.find((k) => k.constituent.toLowerCase() === limit.constituent.toLowerCase());
    expect(at, `limit ${limit.constituent} has its constituent at the edge`).toBeDefined();
    if (!at) return;
    const bg = limit.background ?? at.background;
    const cap = Math.min(
      limit.maxIncrease !== undefined ? bg + limit.maxIncrease : Infinity,
      limit.maxConcentration ?? Infinity,
    );
    const required = cap <= bg ? Infinity : Math.max(1, (at.discharge - bg) / (cap - bg));
    expect(
      Math.abs(line.requiredDilution - required) <= 1e-9 * required,
      `${limit.constituent}: required dilution ${line.requiredDilution} = ${required} from the limit`,
    ).toBe(true);
    expect(line.edgeDilution, `${limit.constituent}: the edge dilution is the mixing zone's`).toBe(edge);
    const margin = Number.isFinite(required) ? edge / required : 0;
    expect(
      Math.abs(line.margin - margin) <= 1e-9 * Math.max(1, margin),
      `${limit.constituent}: margin ${line.margin} = ${edge} ÷ ${required}`,
    ).toBe(true);
    expect(line.pass, `${limit.constituent}: pass exactly when the margin ${line.margin} is at least 1`).toBe(
      line.margin >= 1,
    );
    smallest = Math.min(smallest, line.margin);
  });
  expect(c.margin, "the governing margin is the smallest").toBe(smallest);
  if (c.verdict === "meets")
    expect(
      c.constituents.every((k) => k.pass),
      "meets: every limit passed",
    ).toBe(true);
  if (c.verdict === "exceeds")
    expect(
      c.constituents.some((k) => !k.pass),
      "exceeds: at least one limit failed",
    ).toBe(true);
  if (c.scopeReasons.length === 0)
    expect(c.verdict, `in scope: the verdict follows the margin ${c.margin}`).toBe(c.margin >= 1 ? "meets" : "exceeds");
}

/**
 * The verdict contract (common practice of a screening tool, no source): three states; `pass` exactly
 * for "meets"; scope reasons exactly for "outside-scope"; no "meets" when a dense jet rises to or above
 * the water surface; outside-scope results keep their numbers; `overall` is the deciding case.
 */
export function checkVerdicts(r: BrinefieldResult, s: Scenario): void {
  const c = r.compliance;
  expect(["meets", "exceeds", "outside-scope"], "verdict is one of the three words").toContain(c.verdict);
  expect(c.pass, `pass (${c.pass}) equals verdict === "meets" (${c.verdict})`).toBe(c.verdict === "meets");
  expect(
    c.scopeReasons.length > 0,
    `scope reasons exactly when outside-scope (${c.verdict}: ${c.scopeReasons.join(" | ")})`,
  ).toBe(c.verdict === "outside-scope");
  // A dense jet at the surface is outside the methods' scope; a rising plume is meant to reach it.
  if (c.verdict === "meets" && r.densities.reducedGravity > 0) {
    for (const m of r.nearField) {
      if (!m.available || m.maxRiseHeight === null) continue;
      const top = s.diffuser.portHeight + m.maxRiseHeight;
      expect(
        top < s.ambient.depth,
        `"meets" with the ${m.method} jet's upper edge at ${top} m in ${s.ambient.depth} m of water`,
      ).toBe(true);
    }
  }
  if (c.verdict === "meets") {
    expect(
      r.nearField.some((m) => m.available),
      "a meets needs at least one available method",
    ).toBe(true);
    expect(c.margin >= 1, `"meets" with margin ${c.margin} < 1`).toBe(true);
  }
  if (c.verdict === "exceeds") expect(c.margin < 1, `"exceeds" with margin ${c.margin} ≥ 1`).toBe(true);
  if (c.verdict === "outside-scope")
    expect(Number.isFinite(r.mixingZone.dilution), "outside-scope keeps its edge dilution").toBe(true);
  for (const m of r.nearField)
    expect(m.available === (m.notAvailableReason === null), `${m.method}: a reason exactly when not available`).toBe(
      true,
    );
  expect(r.cases[0]!.name, "the stated conditions are the first case").toBe("stated");
  expect(r.cases[0]!.verdict, "the stated case is the top-level verdict").toBe(c.verdict);
  expect(r.cases.length, "stated + listed + slack water").toBe(
    1 + s.ambientCases.length + (s.options.addSlackWater ? 1 : 0),
  );
  for (const k of r.cases) {
    expect(k.scopeReasons.length > 0, `${k.name}: scope reasons exactly when outside-scope`).toBe(
      k.verdict === "outside-scope",
    );
  }
  const o = r.overall;
  const deciding = r.cases.some((k) => k.verdict === "exceeds")
    ? "exceeds"
    : r.cases.some((k) => k.verdict === "outside-scope")
      ? "outside-scope"
      : "meets";
  expect(o.verdict, "overall: exceeds if any case exceeds, else outside-scope if any is, else meets").toBe(deciding);
  const g = r.cases.find((k) => k.name === o.governingCase)!;
  expect(g.verdict, "the governing case has the overall verdict").toBe(o.verdict);
  expect(o.margin, "overall margin is the governing case's").toBe(g.margin);
}

export function checkInvalidScenario(raw: unknown, c: { what: string; apply: (o: any) => void }): void {
  const copy = raw && typeof raw === "object" ? structuredClone(raw) : raw;
  if (copy && typeof copy === "object") c.apply(copy);
  const r = parseScenario(copy);
  expect(r.ok, `${c.what}: must be refused`).toBe(false);
  if (r.ok) return;
  expect(r.issues.length > 0, `${c.what}: at least one issue`).toBe(true);
  for (const i of r.issues) {
    expect(typeof i.path, `${c.what}: issue has a path`).toBe("string");
    expect(i.message.startsWith(i.path || "(file)"), `${c.what}: message begins with its path: ${i.message}`).toBe(
      true,
    );
    expect(i.message.length < 600, `${c.what}: message is short`).toBe(true);
    expect(/\n\s+at /.test(i.message), `${c.what}: no stack trace`).toBe(false);
  }
}
