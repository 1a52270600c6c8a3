export {
  requiredDilutionFromLimit,
  concentrationFromDilution,
  constituentSources,
  complianceFromEdgeDilution,
} from "./required-dilution";
export type { ComplianceAssessment, ConstituentSource } from "./required-dilution";
export { checkClaim } from "./claim";
export type { ClaimCheck, ClaimVerdict, ClaimMethodValue } from "./claim";
