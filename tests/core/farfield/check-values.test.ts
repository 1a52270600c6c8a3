/**
 * Walks the far-field, multiport and compliance check-value tables with the shared walker
 * (tests/helpers/check-values.ts). Every case names its source and tolerance in the table; skipped cases
 * carry a reason.
 */
import { entrainmentFromRichardson } from "../../../core/farfield/turner-1986-entrainment";
import { brooksDilutionFromDistance } from "../../../core/farfield/brooks-1960-diffusion";
import { linePlumeDilutionFromFlux } from "../../../core/multiport/line-plume";
import { requiredDilutionFromLimit } from "../../../core/compliance/required-dilution";
import { describeCheckValueTables } from "../../helpers/check-values";
import turner from "../../check-values/turner-1986-entrainment.json";
import brooks from "../../check-values/brooks-1960-diffusion.json";
import linePlume from "../../check-values/line-plume.json";
import required from "../../check-values/required-dilution.json";

describeCheckValueTables("beyond-the-near-field check-value tables", [turner, brooks, linePlume, required], {
  entrainmentFromRichardson: (ri) => entrainmentFromRichardson(ri),
  brooksDilutionFromDistance: (x, b, u) =>
    brooksDilutionFromDistance({ distance: x, initialWidth: b, currentSpeed: u }),
  linePlumeDilutionFromFlux: (q, g, z) => linePlumeDilutionFromFlux(q, g, z),
  requiredDilutionFromLimit: (cd, cb, cl) => requiredDilutionFromLimit(cd, cb, cl),
});
