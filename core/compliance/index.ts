export {
  requiredDilutionFromLimit,
  concentrationFromDilution,
  constituentSources,
  complianceFromEdgeDilution,
} from "./required-dilution";
export type { ComplianceAssessment, ConstituentSource } from "./required-dilution";
export { checkClaimFromCases, CLAIM_TOLERANCE } from "./claim";
export type { ClaimCheck, ClaimVerdict, ClaimChain, ClaimCase, ClaimCaseResult } from "./claim";
