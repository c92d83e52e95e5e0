import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { roleDescriptions, roles } from "@/lib/auth/roles";
import { invitationMail } from "@/services/mail";

// Issue 12 item 11: the words describe what the product does at this commit. There
// is no calendar feed, no reminder mail and no one-tap quick log yet (later issues),
// so no page, dialog, role description or invitation may promise them.
const promises = /calendar|remind|\biCal\b|quick[- ]log|one[- ]tap/i;
const root = path.resolve(__dirname, "../..");

function sourceFiles(dir: string): string[] {
  return fs.readdirSync(path.join(root, dir), { withFileTypes: true }).flatMap((entry) => {
    const rel = path.join(dir, entry.name);
    if (entry.isDirectory()) return sourceFiles(rel);
    return /\.(ts|tsx)$/.test(entry.name) ? [rel] : [];
  });
}

/** Lines of a file that are not comments (a comment may say why a word is absent). */
function copyLines(file: string): { line: number; text: string }[] {
  return fs
    .readFileSync(path.join(root, file), "utf8")
    .split("\n")
    .map((text, i) => ({ line: i + 1, text }))
    .filter(({ text }) => !/^\s*(\/\/|\*|\/\*|\{\/\*)/.test(text));
}

describe("UI copy promises only what exists", () => {
  it("no page or component mentions a calendar, reminders, iCal or one-tap logging", () => {
    const found = [...sourceFiles("app"), ...sourceFiles("components")].flatMap((file) =>
      copyLines(file)
        .filter(({ text }) => promises.test(text))
        .map(({ line, text }) => `${file}:${line}: ${text.trim()}`),
    );
    expect(found).toEqual([]);
  });

  it("role descriptions and invitation e-mails say only what each role can do today", () => {
    for (const role of roles) {
      expect(roleDescriptions[role]).not.toMatch(promises);
      const mail = invitationMail({
        gardenName: "Hollis Street Garden",
        inviterName: "Maren Okafor",
        role,
        acceptUrl: "https://garden.example.org/invitations/abc",
        expiresAt: new Date("2026-12-09T03:20:00Z"),
      });
      expect(mail.text).not.toMatch(promises);
    }
  });
});
