import coreWebVitals from "eslint-config-next/core-web-vitals";
import typescript from "eslint-config-next/typescript";

const config = [
  ...coreWebVitals,
  ...typescript,
  { ignores: [".next/**", ".next-test/**", "next-env.d.ts", ".data/**", "test-results/**", "playwright-report/**"] },
];

export default config;
