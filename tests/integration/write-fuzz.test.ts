import "@/tests/support/integration/env";
import fs from "node:fs";
import path from "node:path";
import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  call,
  closeHarness,
  cookieFor,
  errorCode,
  makeGardenWithRoles,
  snapshotDb,
  type GardenWorld,
} from "@/tests/support/integration/harness";
import { hostileBody, hostileParams } from "@/tests/support/integration/hostile-input";
import {
  matrixExclusions,
  roleMatrix,
  runOrder,
  type Actor,
  type MatrixRow,
} from "@/tests/support/integration/role-matrix-table";

// Property: whatever hostile input a member with enough role sends to a write
// route, the answer is a 4xx in our { error: { code, message } } shape and the
// database is byte-for-byte what it was. The routes come from the files under
// app/api (the same scan as the role matrix), each called the way its first
// role-matrix row calls it, so a route added later is fuzzed as soon as it has
// its matrix row, and this file fails until it does. Status classes: RFC 9110 §15.

const RUNS = Number(process.env.FUZZ_RUNS ?? 100);

/** Write handlers with nothing a caller controls (no body read, no path parameter). */
const nothingToFuzz: Record<string, string> = {
  "DELETE app/api/session/route.ts": "sign out: reads only the cookie",
  "POST app/api/session/everywhere/route.ts": "sign out everywhere: reads only the cookie",
  "POST app/api/gardens/[gardenId]/photos/route.ts":
    "a multipart file upload, not JSON; photos.test.ts sends it hostile files (a PDF named .jpg, an SVG with script, 50 MB)",
  "POST app/api/auth/[...nextauth]/route.ts":
    "Auth.js sign-out kept for old links: reads only the cookie; every other path is a 404 (role matrix)",
};

function writeHandlers(): string[] {
  const apiDir = path.join(process.cwd(), "app", "api");
  const found: string[] = [];
  for (const f of fs.readdirSync(apiDir, { recursive: true }) as string[]) {
    if (!f.endsWith("route.ts")) continue;
    const file = path.posix.join("app/api", f.split(path.sep).join("/"));
    if (file in matrixExclusions) continue;
    const source = fs.readFileSync(path.join(process.cwd(), file), "utf8");
    for (const m of source.matchAll(
      /export\s+(?:const|async\s+function|function)\s+(POST|PUT|PATCH|DELETE)\b/g,
    ))
      found.push(`${m[1]} ${file}`);
  }
  return found.sort();
}

const routes = writeHandlers();
const rowFor = (route: string) => roleMatrix.find((r) => `${r.method} ${r.file}` === route);

/** The member the matrix expects to succeed, most privileged first. */
function allowedActor(row: MatrixRow): Actor {
  const actor = [...runOrder].reverse().find((a) => row.expect[a] >= 200 && row.expect[a] < 300);
  if (!actor) throw new Error(`no actor succeeds on ${row.method} ${row.file}`);
  return actor;
}

let people: GardenWorld;
beforeAll(async () => {
  people = await makeGardenWithRoles();
});
afterAll(closeHarness);

describe("write-route fuzz", () => {
  it("covers every write handler under app/api", () => {
    expect(routes.length).toBeGreaterThan(8);
    const uncovered = routes.filter((r) => !(r in nothingToFuzz) && !rowFor(r));
    expect(uncovered, "add a role-matrix row for these").toEqual([]);
  });

  for (const route of routes.filter((r) => !(r in nothingToFuzz))) {
    it(`${route} refuses hostile input and changes nothing`, async () => {
      const row = rowFor(route);
      if (!row) return; // reported by the coverage check above
      const world = await makeGardenWithRoles(people);
      const actor = allowedActor(row);
      const user = actor === "signedOut" ? world.bystander : world[actor];
      const example = await row.request({ world, actor, user });
      const exampleBody =
        example.body && typeof example.body === "object" && !Array.isArray(example.body)
          ? (example.body as Record<string, unknown>)
          : undefined;
      const exampleParams = example.params ?? {};
      const inputs: fc.Arbitrary<{
        body?: { text: string; contentType: string; kind: string };
        params?: Record<string, string>;
      }>[] = [];
      if (exampleBody) inputs.push(hostileBody(exampleBody).map((body) => ({ body })));
      if (Object.keys(exampleParams).length)
        inputs.push(hostileParams(exampleParams).map((params) => ({ params })));
      expect(inputs.length, `${route} has neither body nor params to fuzz`).toBeGreaterThan(0);

      let tried = 0;
      const kinds = new Map<string, number>();
      await fc.assert(
        fc.asyncProperty(fc.oneof(...inputs), async (input) => {
          tried += 1;
          const kind = input.body?.kind ?? "bad path parameter";
          kinds.set(kind, (kinds.get(kind) ?? 0) + 1);
          // Rebuilt per run: some rows set up what they act on (an invitation, a token).
          const spec = await row.request({ world, actor, user });
          const cookie = actor === "signedOut" ? undefined : await cookieFor(user);
          const before = await snapshotDb();
          const res = await call(row.handler, {
            ...spec,
            method: row.method,
            cookie,
            params: input.params ?? spec.params,
            body: input.body ? input.body.text : spec.body,
            headers: input.body ? { "content-type": input.body.contentType } : undefined,
          });
          const shown = `${kind} → ${res.status} ${res.text.slice(0, 200)}`;
          expect(res.status, shown).toBeGreaterThanOrEqual(400);
          expect(res.status, shown).toBeLessThan(500);
          expect(errorCode(res)).toMatch(/^[a-z_]+(:[a-z_]+)?$/);
          expect(await snapshotDb(), `database changed after ${shown}`).toBe(before);
        }),
        { numRuns: RUNS },
      );
      const summary = [...kinds].map(([k, n]) => `${k} ${n}`).join(", ");
      console.log(`[write fuzz] ${route}: ${tried} inputs (${summary})`);
      expect(tried).toBe(RUNS);
    });
  }
});
