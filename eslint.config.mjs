import nextCoreWebVitals from "eslint-config-next/core-web-vitals";
import nextTypescript from "eslint-config-next/typescript";
import prettier from "eslint-config-prettier";

const config = [
  {
    ignores: [
      ".next/**",
      "node_modules/**",
      ".data/**",
      "db/migrations/**",
      "next-env.d.ts",
      "coverage/**",
    ],
  },
  ...nextCoreWebVitals,
  ...nextTypescript,
  prettier,
  {
    rules: {
      "@typescript-eslint/no-unused-vars": [
        "error",
        { argsIgnorePattern: "^_", varsIgnorePattern: "^_" },
      ],
    },
  },
  {
    // The engine stays pure: it imports only itself, lib/units and its libraries
    // (rrule); no database, services, validation, React, Next or file system.
    files: ["lib/engine/**/*.ts"],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          patterns: [
            {
              group: ["@/*", "!@/lib", "!@/lib/engine", "!@/lib/engine/**", "!@/lib/units"],
              message: "lib/engine imports only lib/engine and lib/units",
            },
            {
              group: ["@/lib/*", "!@/lib/engine", "!@/lib/engine/**", "!@/lib/units"],
              message: "lib/engine imports only lib/engine and lib/units",
            },
            {
              group: ["react", "react/*", "next", "next/*", "node:*", "fs", "path", "zod"],
              message: "lib/engine is pure",
            },
            { group: ["../*", "./*"], message: "use @/lib/engine/… paths" },
          ],
        },
      ],
    },
  },
  {
    // Components get their data from their page or layout (props) or through React
    // Query; only app/ calls db/queries. A type-only import (a DTO's shape) reads
    // nothing and is erased at build, so it stays allowed.
    files: ["components/**/*.{ts,tsx}"],
    rules: {
      "@typescript-eslint/no-restricted-imports": [
        "error",
        {
          patterns: [
            {
              group: ["@/db", "@/db/*", "@/db/**", "**/db/*", "**/db/**"],
              allowTypeImports: true,
              message:
                "components/ never import db/: let the page or layout fetch and pass the data down",
            },
          ],
        },
      ],
    },
  },
];

export default config;
