/** Demo scenarios bundled from demo-scenarios/*.json, in file-name order. */
import type { ScenarioFile } from "./state/scenario-state";

export interface DemoScenario {
  readonly id: string;
  readonly name: string;
  readonly description: string;
  readonly file: ScenarioFile;
}

const modules = import.meta.glob<ScenarioFile>("../demo-scenarios/*.json", { eager: true, import: "default" });

export const DEMO_SCENARIOS: readonly DemoScenario[] = Object.keys(modules)
  .sort()
  .map((key) => {
    const file = modules[key];
    const id = key.replace(/^.*\//, "").replace(/\.json$/, "");
    return {
      id,
      name: typeof file["name"] === "string" ? file["name"] : id,
      description: typeof file["description"] === "string" ? file["description"] : "",
      file,
    };
  });
