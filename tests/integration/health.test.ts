import "@/tests/support/integration/env";
import fs from "node:fs";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import * as health from "@/app/api/health/route";
import { call, closeHarness } from "@/tests/support/integration/harness";

afterAll(closeHarness);

describe("GET /api/health", () => {
  it("reports ok, the package version and the embedded database", async () => {
    const res = await call(health.GET, { url: "/api/health" });
    expect(res.status).toBe(200);
    // Read from disk, not from the module the route imports, so a stale bundle would show.
    const { version } = JSON.parse(
      fs.readFileSync(path.join(process.cwd(), "package.json"), "utf8"),
    ) as {
      version: string;
    };
    // Semantic Versioning 2.0.0 (semver.org): MAJOR.MINOR.PATCH.
    expect(version).toMatch(/^\d+\.\d+\.\d+/);
    expect(res.json).toEqual({ status: "ok", version, db: "pglite" });
  });
});
