import coreWebVitals from "eslint-config-next/core-web-vitals";
import typescript from "eslint-config-next/typescript";
import regexp from "eslint-plugin-regexp";

const config = [
  ...coreWebVitals,
  ...typescript,
  {
    // `_name` marks a value taken apart on purpose and left unused.
    rules: { "@typescript-eslint/no-unused-vars": ["warn", { argsIgnorePattern: "^_", varsIgnorePattern: "^_", destructuredArrayIgnorePattern: "^_" }] },
  },
  {
    // Patterns whose running time grows faster than their input (a footage of "1", 80,000 spaces
    // and "x" once froze the server for 7 s): lengths are bounded too, but no such pattern is kept.
    plugins: { regexp },
    rules: {
      "regexp/no-super-linear-move": ["error", { ignorePartial: false }],
      "regexp/no-super-linear-backtracking": ["error", { report: "potential" }],
    },
  },
  { ignores: [".next*/**", "next-env.d.ts", ".data/**", "test-results/**", "playwright-report/**"] },
];

export default config;
