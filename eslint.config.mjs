// ESLint flat configuration: typescript-eslint's recommended rules over the TypeScript sources, tests, bench and
// scripts, ESLint's recommended rules over the plain JavaScript build and dev-server files. Not type-aware: the
// type-checked rule set costs about 10 s more per run on two cores; `npm run typecheck` runs tsc strict instead.
// Layout is Prettier's job (.prettierrc); no formatting rules here.
import js from "@eslint/js";
import globals from "globals";
import tseslint from "typescript-eslint";

export default tseslint.config(
  { ignores: ["dist/**", "node_modules/**", "test-results/**", "coverage/**", "data/demo/**"] },
  { linterOptions: { reportUnusedDisableDirectives: "error" } },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ["**/*.ts", "**/*.mts"],
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    rules: {
      // A leading underscore marks a binding kept on purpose (a parameter a callback must accept, a property
      // dropped by a rest destructuring).
      "@typescript-eslint/no-unused-vars": [
        "error",
        { argsIgnorePattern: "^_", varsIgnorePattern: "^_", caughtErrorsIgnorePattern: "^_", ignoreRestSiblings: true },
      ],
    },
  },
  {
    // webpack.config.js and the .cjs files are CommonJS, loaded by Node with require().
    files: ["**/*.js", "**/*.cjs"],
    languageOptions: { sourceType: "commonjs", globals: { ...globals.node } },
    rules: { "@typescript-eslint/no-require-imports": "off" },
  },
  {
    files: ["**/*.mjs"],
    languageOptions: { globals: { ...globals.node } },
  },
  {
    // Tests hand the worksheet functions hostile, untyped cell values through the host's any[][] signatures and
    // walk parsed XML of unknown shape: `any` is the honest type there. Sources keep the rule.
    files: ["tests/**/*.ts"],
    rules: { "@typescript-eslint/no-explicit-any": "off" },
  },
  {
    // The Office.js stand-in returns proxy objects whose methods close over the fake workbook, as Office.js does.
    files: ["tests/browser/excel-fake.ts"],
    rules: { "@typescript-eslint/no-this-alias": "off" },
  },
);
