import "@/tests/support/integration/env";
import fs from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { settleAfterResponseWork } from "@/lib/after-response";
import {
  call,
  closeHarness,
  cookieFor,
  errorCode,
  makeGardenWithRoles,
  snapshotDb,
  type GardenWorld,
} from "@/tests/support/integration/harness";
import {
  actors,
  matrixExclusions,
  roleMatrix,
  runOrder,
  type Actor,
  type MatrixRow,
} from "@/tests/support/integration/role-matrix-table";

// Which status means what comes from lib/errors.ts and the rule in
// lib/auth/require-role.ts (401 signed out, 404 non-member, 403 role too low);
// the status codes themselves are RFC 9110 §15.

let people: GardenWorld;

beforeAll(async () => {
  people = await makeGardenWithRoles();
});
afterAll(closeHarness);

const rowName = (row: MatrixRow) =>
  `${row.method} ${row.file.replace(/^app|\/route\.ts$/g, "")}${row.variant ? ` (${row.variant})` : ""}`;

describe("role matrix", () => {
  it("lists every handler of every route file under app/api", () => {
    const apiDir = path.join(process.cwd(), "app", "api");
    const files = (fs.readdirSync(apiDir, { recursive: true }) as string[])
      .filter((f) => f.endsWith("route.ts"))
      .map((f) => path.posix.join("app/api", f.split(path.sep).join("/")));
    const missing: string[] = [];
    for (const file of files) {
      if (file in matrixExclusions) continue;
      const source = fs.readFileSync(path.join(process.cwd(), file), "utf8");
      const methods = [
        ...source.matchAll(
          /export\s+(?:const|async\s+function|function)\s+(GET|POST|PUT|PATCH|DELETE)\b/g,
        ),
      ].map((m) => m[1]);
      for (const method of methods) {
        if (!roleMatrix.some((r) => r.file === file && r.method === method))
          missing.push(`${method} ${file}`);
      }
    }
    expect(files.length).toBeGreaterThan(10);
    expect(missing).toEqual([]);
    // And no row points at a file that is gone.
    for (const row of roleMatrix) expect(files).toContain(row.file);
  });

  for (const row of roleMatrix) {
    it(rowName(row), async () => {
      // A fresh garden per row (same people), so one row's changes cannot leak into the next.
      const world = await makeGardenWithRoles(people);
      const answers: Partial<Record<Actor, number>> = {};
      for (const actor of runOrder) {
        const user = actor === "signedOut" ? world.bystander : world[actor];
        const spec = await row.request({ world, actor, user });
        // Minted per call: rows like "sign out everywhere" end the caller's earlier sessions.
        const cookie = actor === "signedOut" ? undefined : await cookieFor(user);
        const before = await snapshotDb();
        const res = await call(row.handler, { ...spec, method: row.method, cookie });
        // Some work (reset mail and its token) runs after the response: let it finish.
        await settleAfterResponseWork();
        const after = await snapshotDb();
        const mutates = typeof row.mutates === "function" ? row.mutates(actor) : row.mutates;
        answers[actor] = res.status;
        const ok = res.status >= 200 && res.status < 300;
        if (!ok) {
          expect(errorCode(res), `${actor}: error body`).toMatch(/^[a-z_]+(:[a-z_]+)?$/);
          expect(after, `${actor} was refused (${res.status}) but the database changed`).toBe(
            before,
          );
        } else if (mutates) {
          expect(after, `${actor} got ${res.status} but nothing changed`).not.toBe(before);
        } else {
          expect(after, `${actor}: a read changed the database`).toBe(before);
        }
      }
      // Compared as a whole so a failure shows the full row.
      const expected = Object.fromEntries(actors.map((a) => [a, row.expect[a]]));
      expect(Object.fromEntries(actors.map((a) => [a, answers[a]]))).toEqual(expected);
    });
  }
});
