/**
 * Walks the dense-jet length-scale check-value tables (tests/check-values/roberts-1997-*.json,
 * lai-lee-2012-*.json, lai-lee-2013-*.json) with the shared walker (tests/helpers/check-values.ts). Each
 * case names its source and tolerance in the table; each skipped item gives its reason there.
 */
import { roberts1997CoefficientsAtAngle } from "../../../core/correlations/roberts-1997-inclined-dense-jet";
import { laiLee2012CoefficientsAtAngle } from "../../../core/correlations/lai-lee-2012-inclined-dense-jet";
import {
  crossflowFroudeFromSpeeds,
  momentumLengthRatioFromCrossflowFroude,
} from "../../../core/correlations/lai-lee-2013-crossflow-regime";
import { describeCheckValueTables } from "../../helpers/check-values";
import roberts1997 from "../../check-values/roberts-1997-inclined-dense-jet.json";
import laiLee2012 from "../../check-values/lai-lee-2012-inclined-dense-jet.json";
import laiLee2013 from "../../check-values/lai-lee-2013-crossflow-regime.json";

describeCheckValueTables("dense-jet check-value tables", [roberts1997, laiLee2012, laiLee2013], {
  roberts1997CoefficientsAtAngle: (angle) => roberts1997CoefficientsAtAngle(angle),
  laiLee2012CoefficientsAtAngle: (angle) => laiLee2012CoefficientsAtAngle(angle),
  crossflowFroudeFromSpeeds: (ua, u, f) => crossflowFroudeFromSpeeds(ua, u, f),
  momentumLengthRatioFromCrossflowFroude: (fc) => momentumLengthRatioFromCrossflowFroude(fc),
});
