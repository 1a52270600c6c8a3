export {
  QUANTITY_KINDS,
  quantityToSI,
  siToDisplay,
  displayToSI,
  formatNumber,
  unitSymbol,
  siLabel,
  matchPracticalSalinity,
  matchTds,
  convertUnit,
} from "./units";
export type { QuantityKind, UnitSystem, QuantityParse } from "./units";
