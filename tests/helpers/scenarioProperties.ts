/** The properties every scenario must satisfy; shared by the unit suite and the long fuzz run. */
import { expect } from "vitest";
import { parseScenario } from "../../core/scenario/parse";
import { runScenario } from "../../core/pipeline";
import type { BrinefieldResult } from "../../core/result/contract";
import type { Scenario } from "../../core/scenario/types";

const finite = (v: number | null | undefined) => v === null || v === undefined || Number.isFinite(v);

export function checkValidScenario(raw: unknown): void {
  const parsed = parseScenario(raw);
  if (!parsed.ok) throw new Error(`valid scenario rejected: ${parsed.issues.map((i) => i.message).join("; ")}`);
  // Either buoyancy is computed: a discharge lighter than the sea at the port rises (no refusal).
  const r = runScenario(parsed.scenario, { includePath: true });
  const rising = !(r.densities.reducedGravity > 0);
  for (const m of r.nearField) {
    expect(m.risingField !== undefined, `${m.method}: read as a rising plume exactly when lighter than the sea`).toBe(rising);
    if (rising && m.available && m.maxRiseHeight !== null) {
      const room = parsed.scenario.ambient.depth - parsed.scenario.diffuser.portHeight;
      expect(m.maxRiseHeight <= room * (1 + 1e-9), `${m.method}: a rising plume's upper edge (${m.maxRiseHeight} m) stays in the water (${room} m)`).toBe(true);
      expect(m.impactDilution, `${m.method}: a rising plume has no seabed impact`).toBeNull();
    }
  }
  for (const m of r.nearField) {
    for (const k of ["maxRiseHeight", "returnDistance", "impactDistance", "impactDilution", "nearFieldDistance", "nearFieldDilution", "entrainedFlow"] as const)
      expect(finite(m[k]), `${m.method}.${k} finite (${m[k]})`).toBe(true);
    if (m.impactDilution !== null) expect(m.impactDilution >= 1 - 1e-9, `${m.method}: impact dilution ${m.impactDilution} ≥ 1`).toBe(true);
    if (m.nearFieldDilution !== null && m.impactDilution !== null)
      expect(m.nearFieldDilution >= m.impactDilution * (1 - 1e-9), `${m.method}: near-field ≥ impact dilution`).toBe(true);
    const path = m.path ?? [];
    for (let i = 1; i < path.length; i++) {
      expect(path[i]!.dilution >= path[i - 1]!.dilution * (1 - 1e-9), `${m.method}: dilution non-decreasing along the path`).toBe(true);
      expect(path[i]!.s >= path[i - 1]!.s, "s ascends").toBe(true);
    }
  }
  const z = r.mixingZone;
  expect(Number.isFinite(z.dilution) && z.dilution >= 1 - 1e-9, `edge dilution ${z.dilution} finite and ≥ 1`).toBe(true);
  const s = z.series;
  for (let i = 1; i < s.dilution.length; i++) {
    expect(s.dilution[i]! >= s.dilution[i - 1]! * (1 - 1e-9), `series dilution non-decreasing with distance (${s.distance[i]} m)`).toBe(true);
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
    expect(c.concentration >= lo && c.concentration <= hi, `${c.constituent} ${c.concentration} between background and discharge`).toBe(true);
  }
  expect(Number.isFinite(r.compliance.margin) || r.compliance.margin === Number.POSITIVE_INFINITY, "margin is a number").toBe(true);
  checkVerdicts(r, parsed.scenario);
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
  expect(c.scopeReasons.length > 0, `scope reasons exactly when outside-scope (${c.verdict}: ${c.scopeReasons.join(" | ")})`).toBe(c.verdict === "outside-scope");
  // A dense jet at the surface is outside the methods' scope; a rising plume is meant to reach it.
  if (c.verdict === "meets" && r.densities.reducedGravity > 0) {
    for (const m of r.nearField) {
      if (!m.available || m.maxRiseHeight === null) continue;
      const top = s.diffuser.portHeight + m.maxRiseHeight;
      expect(top < s.ambient.depth, `"meets" with the ${m.method} jet's upper edge at ${top} m in ${s.ambient.depth} m of water`).toBe(true);
    }
  }
  if (c.verdict === "meets") {
    expect(r.nearField.some((m) => m.available), "a meets needs at least one available method").toBe(true);
    expect(c.margin >= 1, `"meets" with margin ${c.margin} < 1`).toBe(true);
  }
  if (c.verdict === "exceeds") expect(c.margin < 1, `"exceeds" with margin ${c.margin} ≥ 1`).toBe(true);
  if (c.verdict === "outside-scope") expect(Number.isFinite(r.mixingZone.dilution), "outside-scope keeps its edge dilution").toBe(true);
  for (const m of r.nearField) expect(m.available === (m.notAvailableReason === null), `${m.method}: a reason exactly when not available`).toBe(true);
  expect(r.cases[0]!.name, "the stated conditions are the first case").toBe("stated");
  expect(r.cases[0]!.verdict, "the stated case is the top-level verdict").toBe(c.verdict);
  expect(r.cases.length, "stated + listed + slack water").toBe(1 + s.ambientCases.length + (s.options.addSlackWater ? 1 : 0));
  for (const k of r.cases) {
    expect(k.scopeReasons.length > 0, `${k.name}: scope reasons exactly when outside-scope`).toBe(k.verdict === "outside-scope");
  }
  const o = r.overall;
  const deciding = r.cases.some((k) => k.verdict === "exceeds") ? "exceeds" : r.cases.some((k) => k.verdict === "outside-scope") ? "outside-scope" : "meets";
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
    expect(i.message.startsWith(i.path || "(file)"), `${c.what}: message begins with its path: ${i.message}`).toBe(true);
    expect(i.message.length < 600, `${c.what}: message is short`).toBe(true);
    expect(/\n\s+at /.test(i.message), `${c.what}: no stack trace`).toBe(false);
  }
}
