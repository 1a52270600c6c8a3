/**
 * Mutation-testing plan, folder by folder: each core folder is mutated on its own with a fast test set
 * (its own unit tests plus the property test at a reduced count). The slow generators (fuzz project,
 * hostile-input suite, study and report suites, browser tests) are deliberately not in any set.
 */
export const PROPERTY = "tests/core/properties-based.test.ts";

export const FOLDERS = {
  "core/scenario": ["tests/core/scenario/**/*.test.ts", PROPERTY],
  "core/compliance": ["tests/core/compliance/**/*.test.ts", PROPERTY],
  "core/nearfield": ["tests/core/nearfield/**/*.test.ts", PROPERTY],
  "core/farfield": ["tests/core/farfield/**/*.test.ts", PROPERTY],
  "core/multiport": ["tests/core/multiport/**/*.test.ts", PROPERTY],
  "core/properties": ["tests/core/properties/**/*.test.ts", PROPERTY],
  "core/correlations": ["tests/core/correlations/**/*.test.ts", PROPERTY],
  "core/ode": ["tests/core/ode/**/*.test.ts", PROPERTY],
  "core/units": ["tests/core/scenario/**/*.test.ts", PROPERTY],
};
