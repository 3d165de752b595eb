import coreWebVitals from "eslint-config-next/core-web-vitals";
import typescript from "eslint-config-next/typescript";

const config = [
  ...coreWebVitals,
  ...typescript,
  {
    // `_name` marks a value taken apart on purpose and left unused.
    rules: { "@typescript-eslint/no-unused-vars": ["warn", { argsIgnorePattern: "^_", varsIgnorePattern: "^_", destructuredArrayIgnorePattern: "^_" }] },
  },
  { ignores: [".next*/**", "next-env.d.ts", ".data/**", "test-results/**", "playwright-report/**"] },
];

export default config;
