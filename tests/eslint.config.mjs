// ESLint for the whole tree (`npm run lint`, part of `npm test`): typescript-eslint's recommended rules,
// the React hooks rules for renderer/, and the import boundaries of DEVELOPERS.md ("Layering"), which
// tests/project/layering.test.ts checks as well. Every disabled rule below says why.
import tseslint from "typescript-eslint";
import reactHooks from "eslint-plugin-react-hooks";

const NODE_BUILTINS = [
  "node:*",
  "fs",
  "fs/*",
  "path",
  "os",
  "child_process",
  "worker_threads",
  "http",
  "https",
  "net",
  "crypto",
  "url",
];

/** Imports core/ (outside core/cli/) may not make: Node, the UI, Electron, the command-line adapter. */
const CORE_FORBIDDEN = [
  { group: NODE_BUILTINS, message: "core/ is pure: Node belongs in core/cli/ (see DEVELOPERS.md, Layering)." },
  {
    group: [
      "three",
      "three/*",
      "d3",
      "d3-selection",
      "react",
      "react/*",
      "react-dom",
      "react-dom/*",
      "electron",
      "playwright-core",
    ],
    message: "core/ is pure: no UI, Electron or browser driving.",
  },
  { group: ["**/renderer/**", "**/electron/**"], message: "core/ imports only core/." },
  { group: ["**/cli", "**/cli/**"], message: "core/cli is the Node adapter: nothing else in core/ imports it." },
];

export default tseslint.config(
  {
    ignores: [
      "node_modules/**",
      "dist/**",
      "release/**",
      "test-artifacts/**",
      "**/*.d.mts",
      "tests/mutation/.stryker-tmp/**",
      "tests/mutation/.reports/**",
    ],
  },
  {
    files: ["**/*.{ts,tsx,mts,mjs,cjs}"],
    extends: [tseslint.configs.recommended],
    linterOptions: { reportUnusedDisableDirectives: "error" },
    rules: {
      // A few of ESLint's own rules (its recommended set is a separate package we do not install).
      "no-control-regex": "error",
      "no-debugger": "error",
      "no-empty": ["error", { allowEmptyCatch: false }],
      "no-fallthrough": "error",
      // No silent catch: a failure reaches the user or the log (DEVELOPERS.md).
      "no-restricted-syntax": [
        "error",
        {
          selector:
            "CallExpression[callee.property.name='catch'] > :matches(ArrowFunctionExpression, FunctionExpression)[body.type='BlockStatement'][body.body.length=0]",
          message:
            "No silent catch: report the failure to the user or the log, or say in a comment why it is safe to drop.",
        },
      ],
      // Unused names are errors, except a leading underscore that marks a value deliberately dropped
      // (`{ path: _path, ...rest }`).
      "@typescript-eslint/no-unused-vars": [
        "error",
        {
          argsIgnorePattern: "^_",
          varsIgnorePattern: "^_",
          destructuredArrayIgnorePattern: "^_",
          caughtErrors: "none",
        },
      ],
    },
  },
  {
    files: ["tests/**/*.{ts,tsx}"],
    rules: {
      // Hostile-input and contract tests hand deliberately ill-typed values to the parsers; `any` is how
      // such a value gets past the compiler. Production code keeps the rule.
      "@typescript-eslint/no-explicit-any": "off",
    },
  },
  {
    files: ["**/*.cjs"],
    rules: {
      // CommonJS config files (electron-builder) are loaded with require by their tools.
      "@typescript-eslint/no-require-imports": "off",
    },
  },
  {
    files: ["renderer/**/*.{ts,tsx}"],
    plugins: { "react-hooks": reactHooks },
    rules: {
      // The classic hooks rules. The plug-in's React Compiler rules (refs, set-state-in-effect, purity, …)
      // are not enabled: the app is not compiled with the React Compiler, and those rules ask for a
      // different state design (no refs read during render) that is its own change.
      "react-hooks/rules-of-hooks": "error",
      "react-hooks/exhaustive-deps": "error",
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            { group: NODE_BUILTINS, message: "renderer/ runs in the browser: no Node." },
            { group: ["**/core/cli", "**/core/cli/**"], message: "core/cli is the Node adapter." },
            {
              group: ["**/electron/**", "!**/electron/contract", "!**/electron/csp"],
              message: "renderer/ reaches the host only through renderer/platform and electron/contract.ts (types).",
            },
          ],
        },
      ],
    },
  },
  {
    // The renderer's build configuration runs in Node, not in the browser.
    files: ["renderer/vite.config.ts"],
    rules: { "no-restricted-imports": "off" },
  },
  {
    files: ["core/**/*.ts"],
    ignores: ["core/cli/**"],
    rules: { "no-restricted-imports": ["error", { patterns: CORE_FORBIDDEN }] },
  },
  {
    files: ["core/cli/**/*.{ts,mjs}"],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            {
              group: ["**/renderer/**", "**/electron/**"],
              message: "The command line uses core/ and core/cli/node/ only.",
            },
          ],
        },
      ],
    },
  },
  {
    files: ["electron/**/*.{ts,mjs}"],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            { group: ["**/renderer/**"], message: "electron/ never imports the renderer." },
            {
              regex: "(^|/)core/(?!cli/node(/|$))",
              allowTypeImports: true,
              message:
                "electron/ imports core for types only (physics runs in the renderer's worker); file I/O comes from core/cli/node/.",
            },
          ],
        },
      ],
    },
  },
);
