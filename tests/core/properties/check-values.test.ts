/**
 * Walks the properties check-value tables (tests/check-values/teos10-*.json, sharqawy-*.json, nayar-*.json)
 * with the shared walker (tests/helpers/check-values.ts). Every case carries its own source and tolerance in
 * the table; skipped cases carry a reason.
 */
import {
  absoluteSalinityFromPractical,
  densitySharqawy2010,
  densitySharqawyNayar,
  densityTeos10,
} from "../../../core/properties";
import { describeCheckValueTables } from "../../helpers/check-values";
import teos10Density from "../../check-values/teos10-density.json";
import teos10Salinity from "../../check-values/teos10-salinity.json";
import sharqawyDensity from "../../check-values/sharqawy-2010-density.json";
import nayarDensity from "../../check-values/nayar-2016-density.json";

describeCheckValueTables(
  "properties check-value tables",
  [teos10Density, teos10Salinity, sharqawyDensity, nayarDensity],
  {
    densityTeos10: (sa, t, p) => densityTeos10(sa, t, p),
    absoluteSalinityFromPractical: (sp) => absoluteSalinityFromPractical(sp),
    densitySharqawy2010: (s, t) => densitySharqawy2010(s, t),
    densitySharqawyNayar: (s, t, p) => densitySharqawyNayar(s, t, p),
  },
);
