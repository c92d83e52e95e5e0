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
];

export default config;
