/**
 * Mutation-testing plan, folder by folder: each core folder is mutated on its own with a fast test set
 * (its own unit tests, the suites that check its rules or published values through the pipeline, and the
 * property test at a reduced count). The slow generators (fuzz project, study and report suites, browser
 * tests, the hostile-input suite, which starts real command-line processes) are deliberately not in
 * any set: the scenario reader's rules are checked in-process by tests/core/scenario/, so the scenario set
 * leaves out the property test too (each of its cases runs the whole pipeline).
 */
export const PROPERTY = "tests/core/properties-based.test.ts";

export const FOLDERS = {
  "core/scenario": [
    "tests/core/scenario/**/*.test.ts",
    "tests/core/validation/**/*.test.ts",
    "tests/core/units/**/*.test.ts",
    "tests/core/study/same-rules-every-path.test.ts",
  ],
  "core/compliance": ["tests/core/compliance/**/*.test.ts", PROPERTY],
  // The near field's own rule, event and published-value tests: as for the far field, the whole-pipeline
  // suites would cost seconds for each of its 1,400 mutants on a 2-core machine.
  "core/nearfield": [
    "tests/core/nearfield/**/*.test.ts",
    "tests/core/correlations/**/*.test.ts",
    "tests/core/rising/**/*.test.ts",
  ],
  // The far field's own rule and closed-form tests only: the whole-pipeline suites (demos, the property
  // test) would cost seconds for each of its 1,100 mutants.
  "core/farfield": ["tests/core/farfield/**/*.test.ts"],
  "core/multiport": ["tests/core/multiport/**/*.test.ts", PROPERTY],
  "core/properties": ["tests/core/properties/**/*.test.ts", PROPERTY],
  "core/correlations": ["tests/core/correlations/**/*.test.ts", PROPERTY],
  "core/ode": ["tests/core/ode/**/*.test.ts", PROPERTY],
  "core/units": ["tests/core/scenario/**/*.test.ts", PROPERTY],
};
