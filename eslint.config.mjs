import coreWebVitals from "eslint-config-next/core-web-vitals";
import typescript from "eslint-config-next/typescript";
import regexp from "eslint-plugin-regexp";

/** What the estimator may not import: it runs unchanged in the browser, on the server and on the command line. */
const estimatorPurity = {
  patterns: [
    { group: ["react", "react-dom", "react/*", "next", "next/*", "next-auth", "next-auth/*"], message: "The estimator is pure: no React or Next.js in lib/estimate." },
    { group: ["pg", "drizzle-orm", "drizzle-orm/*", "@/db", "@/db/*", "**/db/*", "server-only"], message: "The estimator is pure: no database in lib/estimate." },
    { group: ["node:*", "fs", "path", "http", "https", "net", "child_process"], message: "The estimator is pure: no file system or network in lib/estimate." },
    { group: ["@/app/*", "@/components/*", "@/lib/server/*", "**/app/*", "**/components/*"], message: "The estimator does not reach into the app." },
  ],
};

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
  {
    // The library does not import the app: routes build on lib, never the other way round.
    files: ["lib/**/*.ts", "lib/**/*.tsx"],
    rules: {
      "no-restricted-imports": ["error", { patterns: [{ group: ["@/app/*", "**/app/*"], message: "lib/ does not import from app/." }] }],
    },
  },
  {
    files: ["lib/estimate/**/*.ts"],
    ignores: ["lib/estimate/**/*.test.ts", "lib/estimate/test-support/**"],
    rules: {
      "no-restricted-imports": ["error", estimatorPurity],
      // Stages hand over typed values in one direction; a cycle would blur them.
      "import/no-cycle": ["error", { ignoreExternal: true }],
    },
  },
  { ignores: [".next*/**", "next-env.d.ts", ".data/**", "test-results/**", "playwright-report/**"] },
];

export default config;
