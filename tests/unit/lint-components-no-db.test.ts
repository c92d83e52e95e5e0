import path from "node:path";
import { ESLint } from "eslint";
import { describe, expect, it } from "vitest";

// Issue 12 item 12: components get their data from their page (props) or through
// React Query, never from the database. ESLint holds that line.
const root = path.resolve(__dirname, "../..");
const eslint = new ESLint({ cwd: root });
const restricted = (ruleId: string | null) => !!ruleId && ruleId.endsWith("no-restricted-imports");

describe("components/ never import db/", () => {
  it("the lint rule refuses a database query imported into a component", async () => {
    const [result] = await eslint.lintText(
      'import { listGardensForUser } from "@/db/queries/memberships";\nexport const x = listGardensForUser;\n',
      { filePath: path.join(root, "components/shell/example.tsx") },
    );
    const messages = result!.messages.filter((m) => restricted(m.ruleId));
    expect(messages.map((m) => m.message).join("\n")).toMatch(/components.*db/i);
    // ESLint loads the typed config on its first call: 7 s under a busy CI, past the 5 s default.
  }, 120_000);

  it("no file in components/ breaks it today", async () => {
    const results = await eslint.lintFiles(["components/**/*.{ts,tsx}"]);
    const offenders = results.flatMap((r) =>
      r.messages
        .filter((m) => restricted(m.ruleId))
        .map((m) => `${path.relative(root, r.filePath)}:${m.line} ${m.message}`),
    );
    expect(offenders).toEqual([]);
  }, 120_000);
});
