/**
 * Key outputs of the demo scenarios, recorded so that any change to them is seen in review. This is a
 * regression record of Brinefield's own results (not an outside reference): physics checks against
 * published values live in tests/core. After an intended change, regenerate the record with
 * `npx tsx tests/regression/update-demo-key-outputs.ts` and explain the change in the commit message.
 */
import { readFileSync, readdirSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { parseScenario } from "../../core/scenario/parse";
import { runScenario } from "../../core/pipeline";

const here = dirname(fileURLToPath(import.meta.url));
export const DEMO_DIR = join(here, "../../demo-scenarios");
export const RECORD_FILE = join(here, "demo-key-outputs.json");

export function demoKeyOutputs(): Record<string, Record<string, number | string | boolean | null>> {
  const out: Record<string, Record<string, number | string | boolean | null>> = {};
  for (const file of readdirSync(DEMO_DIR)
    .filter((f) => f.endsWith(".json"))
    .sort()) {
    const parsed = parseScenario(JSON.parse(readFileSync(join(DEMO_DIR, file), "utf8")));
    if (!parsed.ok) throw new Error(`${file}: ${parsed.issues.map((i) => i.message).join("; ")}`);
    const r = runScenario(parsed.scenario);
    const row: Record<string, number | string | boolean | null> = {
      inputsHash: r.inputsHash,
      equationOfState: r.densities.equationOfState.name,
      dischargeDensity: r.densities.discharge,
      ambientDensity: r.densities.ambient,
      portVelocity: r.port.velocity,
      froude: r.port.froude,
      multiportRegime: r.multiport.regime,
      edgeDilution: r.mixingZone.dilution,
      edgeMethod: r.mixingZone.method,
      requiredDilution: r.compliance.requiredDilution,
      pass: r.compliance.pass,
    };
    for (const m of r.nearField) {
      row[`${m.method}.maxRiseHeight`] = m.maxRiseHeight;
      row[`${m.method}.impactDistance`] = m.impactDistance;
      row[`${m.method}.impactDilution`] = m.impactDilution;
    }
    out[file] = row;
  }
  return out;
}
