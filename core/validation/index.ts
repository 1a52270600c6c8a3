export {
  validationTable,
  validationBand,
  VALIDATION_FORMAT,
  VALIDATION_VERSION,
  VALIDATION_CONFIGURATION,
} from "./validate";
export type { ValidationPoint, ValidationTable } from "./validate";
export { PUBLISHED_LAB_POINTS } from "./published-lab-points";
export type { PublishedLabPoint, ValidationQuantity } from "./published-lab-points";
