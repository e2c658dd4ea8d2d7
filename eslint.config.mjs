import { defineConfig, globalIgnores } from "eslint/config";
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

// Import boundaries (DEVELOPERS.md, "Layout"). ESLint applies the last matching no-restricted-imports,
// so each folder's block lists every group it may not import.
const rule = (message, group) => ({ group, message });
const COMPONENTS = rule("lib/ never imports components/: move the shared piece into lib/ (text, geometry, words).", [
  "@/components",
  "@/components/**",
  "**/components/**",
]);
const MODELS = rule("components/ and app/ never import models/: take the type from lib/ (e.g. lib/auth/role-list).", [
  "@/models",
  "@/models/**",
  "**/models",
  "**/models/**",
]);
const DEV_TOOLS = rule("Shipped code never imports the dev tools in scripts/ (the Stripe stand-in, the CLI, benchmarks).", ["@/scripts/**", "**/scripts/**"]);
const FRAMEWORK = rule("lib/solver and lib/flow are pure TypeScript: no framework, database or model (they run in the browser, the CLI and tests).", [
  "next",
  "next/**",
  "react",
  "react/**",
  "react-dom",
  "react-dom/**",
  "next-auth",
  "next-auth/**",
  "server-only",
  "sequelize",
  "pg",
  "@/lib/db",
  "@/lib/db/**",
  "@/lib/tables/current",
  "@/lib/tables/db/**",
  "@/lib/http",
  "@/lib/auth/**",
  "@/lib/payments/**",
  "@/lib/mail/**",
  "@/models",
  "@/models/**",
  "**/models/**",
]);
const NEXT_LINK = rule("Use Link from @/components/ui/link: it fetches the next page when the builder reaches for the link, not for every link on screen.", [
  "next/link",
]);
const restrict = (...patterns) => ({ "no-restricted-imports": ["error", { patterns }] });

export default defineConfig([
  ...nextVitals,
  ...nextTs,
  {
    rules: {
      "@typescript-eslint/no-explicit-any": "error",
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
    },
  },
  { files: ["lib/**/*.{ts,tsx}"], rules: restrict(COMPONENTS, DEV_TOOLS) },
  { files: ["lib/solver/**/*.{ts,tsx}", "lib/flow/**/*.{ts,tsx}"], rules: restrict(COMPONENTS, DEV_TOOLS, FRAMEWORK) },
  { files: ["components/**/*.{ts,tsx}", "app/**/*.{ts,tsx}"], rules: restrict(MODELS, DEV_TOOLS, NEXT_LINK) },
  { files: ["components/ui/link.tsx"], rules: restrict(MODELS, DEV_TOOLS) },
  { files: ["models/**/*.ts", "migrations/**/*.ts", "seeders/**/*.ts"], rules: restrict(COMPONENTS, DEV_TOOLS) },
  globalIgnores([".next/**", "out/**", "build/**", "next-env.d.ts", "node_modules/**", ".data/**", "tests/artifacts/**", "coverage/**"]),
]);
