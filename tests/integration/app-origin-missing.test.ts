import "@/tests/support/integration/env";
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import * as account from "@/app/api/account/route";
import * as invitations from "@/app/api/gardens/[gardenId]/invitations/route";
import * as resetRequest from "@/app/api/password-reset/route";
import { resetEnvCache } from "@/lib/env";
import {
  call,
  closeHarness,
  cookieFor,
  errorCode,
  makeGardenWithRoles,
  tableRows,
  uniqueEmail,
  type GardenWorld,
} from "@/tests/support/integration/harness";

// From the last review: a production server with neither APP_ORIGIN nor AUTH_URL
// answered sign-up with a 500, because the welcome mail's link cannot be made. It now
// answers 503 (RFC 9110 §15.6.4: the server cannot handle the request for now) with a
// message an operator can act on, and writes nothing.

let world: GardenWorld;
beforeAll(async () => {
  world = await makeGardenWithRoles();
});
afterAll(closeHarness);

beforeEach(() => {
  vi.stubEnv("NODE_ENV", "production");
  vi.stubEnv("CASTLINE_DEMO", undefined);
  vi.stubEnv("APP_ORIGIN", undefined);
  vi.stubEnv("AUTH_URL", undefined);
  resetEnvCache();
});
afterEach(() => {
  vi.unstubAllEnvs();
  resetEnvCache();
});

function expectNotConfigured(res: { status: number; json: { error: { message: string } } }) {
  expect(res.status).toBe(503);
  expect(errorCode(res as never)).toBe("unavailable:app_origin");
  expect(res.json.error.message).toMatch(/public address is not configured/);
}

describe("a production server without its public address", () => {
  it("answers sign-up with 503 and makes no account", async () => {
    const email = uniqueEmail("no-origin");
    const res = await call(account.POST, {
      url: "/api/account",
      body: { name: "Rowan Test", email, password: "tulip ladder orchard copper" },
    });
    expectNotConfigured(res);
    const users = (await tableRows("users")) as { email: string }[];
    expect(users.map((u) => u.email)).not.toContain(email);
  });

  it("answers a password-reset request with 503", async () => {
    const res = await call(resetRequest.POST, {
      url: "/api/password-reset",
      body: { email: world.viewer.email },
    });
    expectNotConfigured(res);
  });

  it("answers an invitation with 503 and saves no invitation", async () => {
    const before = ((await tableRows("invitations")) as unknown[]).length;
    const res = await call(invitations.POST, {
      url: `/api/gardens/${world.gardenId}/invitations`,
      params: { gardenId: world.gardenId },
      cookie: await cookieFor(world.owner),
      body: { email: uniqueEmail("no-origin-invitee"), role: "viewer" },
    });
    expectNotConfigured(res);
    expect(((await tableRows("invitations")) as unknown[]).length).toBe(before);
  });
});
