// Lint: the framework's own rules (Next.js core web vitals and its TypeScript set), run by `npm test`.
import { defineConfig, globalIgnores } from "eslint/config";
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";

export default defineConfig([
  ...nextVitals,
  ...nextTs,
  {
    rules: {
      // A leading underscore marks a value taken apart on purpose and left unused (a field dropped from a copy).
      "@typescript-eslint/no-unused-vars": [
        "warn",
        { argsIgnorePattern: "^_", varsIgnorePattern: "^_", destructuredArrayIgnorePattern: "^_", ignoreRestSiblings: true },
      ],
    },
  },
  globalIgnores([".next/**", ".next-*/**", "node_modules/**", "coverage/**", "test-results/**", "data/**", "next-env.d.ts"]),
]);
