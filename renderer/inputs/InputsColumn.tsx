/** The Design tab's inputs: name and description, then each input section. */
import { AmbientSection } from "./AmbientSection";
import { DiffuserSection } from "./DiffuserSection";
import { DischargeSection } from "./DischargeSection";
import { MixingZoneSection } from "./MixingZoneSection";
import { RecordIntakeSection } from "./RecordIntakeSection";
import { TextField } from "./fields";

export function InputsColumn() {
  return (
    <aside className="inputs" aria-label="Scenario inputs">
      <section className="input-section">
        <div className="field-grid">
          <TextField path="name" label="Scenario name" wide />
          <TextField path="description" label="Description" wide placeholder="site, case, assumptions" />
        </div>
      </section>
      <DischargeSection />
      <AmbientSection />
      <DiffuserSection />
      <MixingZoneSection />
      <RecordIntakeSection />
    </aside>
  );
}
