/** Mixing zone radius and the limits that apply at its edge; method choices. */
import { appendArrayItem, removeArrayItem, setField } from "../state/actions";
import { getAtPath, isPlainObject } from "../state/scenario-state";
import { useEditor } from "./EditorContext";
import { ChoiceField, QuantityField, SectionIssues, TextField } from "./fields";

/** Unit a limit is stated in: its own, else g/kg for salinity, °C for temperature, else the constituent's. */
export function limitUnit(file: unknown, limit: unknown): string {
  if (!isPlainObject(limit)) return "–";
  if (typeof limit["unit"] === "string" && limit["unit"].trim() !== "") return limit["unit"];
  const name = typeof limit["constituent"] === "string" ? limit["constituent"].trim().toLowerCase() : "";
  if (name === "salinity") return "g/kg";
  if (name === "temperature") return "°C";
  const constituents = getAtPath(file, "discharge.constituents");
  const match = Array.isArray(constituents)
    ? constituents.find(
        (c) => isPlainObject(c) && typeof c["name"] === "string" && c["name"].trim().toLowerCase() === name,
      )
    : undefined;
  return isPlainObject(match) && typeof match["unit"] === "string" ? match["unit"] : "–";
}

export function MixingZoneSection() {
  const editor = useEditor();
  const limits = getAtPath(editor.file, "mixingZone.limits");
  const list = Array.isArray(limits) ? limits : [];
  return (
    <section className="input-section" aria-labelledby="sec-mz">
      <header>
        <h2 id="sec-mz">Mixing zone and limits</h2>
      </header>
      <div className="field-grid">
        <QuantityField path="mixingZone.radius" label="Mixing-zone radius" kind="length" hint="from the diffuser" />
        <ChoiceField
          path="options.nearFieldForEdge"
          label="Near field carried to edge"
          fallback="conservative"
          options={[
            { value: "conservative", label: "Lower of the methods" },
            { value: "length-scale", label: "Length-scale (experiments)" },
            { value: "integral", label: "Integral jet model" },
          ]}
        />
        <ChoiceField
          path="options.farField"
          label="Beyond the near field"
          fallback="conservative"
          options={[
            { value: "conservative", label: "Lower of the methods" },
            { value: "gravity-current", label: "Spreading gravity current" },
            { value: "passive-diffusion", label: "Passive diffusion" },
          ]}
        />
      </div>
      <div className="sub-table">
        <h3>Limits at the edge</h3>
        {list.map((limit, i) => {
          const byIncrease = !(
            isPlainObject(limit) &&
            limit["maxConcentration"] !== undefined &&
            limit["maxIncrease"] === undefined
          );
          const base = `mixingZone.limits.${i}`;
          return (
            <div className="row-fields" key={i}>
              <TextField path={`${base}.constituent`} label="Constituent" placeholder="salinity" />
              <div className="field">
                <label htmlFor={`limit-kind-${i}`}>Limit on</label>
                <select
                  id={`limit-kind-${i}`}
                  value={byIncrease ? "increase" : "absolute"}
                  onChange={(e) => {
                    const current = isPlainObject(limit) ? limit : {};
                    const value = current["maxIncrease"] ?? current["maxConcentration"] ?? 2;
                    const { maxIncrease: _a, maxConcentration: _b, ...rest } = current;
                    editor.perform(setField, {
                      path: base,
                      value: { ...rest, [e.target.value === "increase" ? "maxIncrease" : "maxConcentration"]: value },
                    });
                  }}
                >
                  <option value="increase">increase over background</option>
                  <option value="absolute">absolute concentration</option>
                </select>
              </div>
              {byIncrease ? (
                <QuantityField
                  path={`${base}.maxIncrease`}
                  label="Max increase"
                  kind="ratio"
                  unitText={limitUnit(editor.file, limit)}
                />
              ) : (
                <QuantityField
                  path={`${base}.maxConcentration`}
                  label="Max concentration"
                  kind="ratio"
                  unitText={limitUnit(editor.file, limit)}
                />
              )}
              <TextField path={`${base}.unit`} label="Unit" placeholder="g/kg" />
              <TextField path={`${base}.basis`} label="Basis" placeholder="permit, rule…" />
              <button
                type="button"
                className="icon-button"
                aria-label={`Remove limit ${i + 1}`}
                onClick={() => editor.perform(removeArrayItem, { path: "mixingZone.limits", index: i })}
              >
                ×
              </button>
            </div>
          );
        })}
        <button
          type="button"
          className="link-button"
          onClick={() =>
            editor.perform(appendArrayItem, {
              path: "mixingZone.limits",
              item: { constituent: "salinity", maxIncrease: 2, unit: "g/kg" },
            })
          }
        >
          + Add limit
        </button>
      </div>
      <SectionIssues
        path="mixingZone"
        shownPaths={[
          "mixingZone.radius",
          ...list.flatMap((_, i) =>
            ["constituent", "maxIncrease", "maxConcentration", "unit", "basis"].map(
              (k) => `mixingZone.limits.${i}.${k}`,
            ),
          ),
        ]}
      />
      <SectionIssues path="options" shownPaths={["options.nearFieldForEdge", "options.farField"]} />
    </section>
  );
}
