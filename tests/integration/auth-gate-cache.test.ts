import "@/tests/support/integration/env";
import { afterAll, describe, expect, it } from "vitest";
import * as accountPassword from "@/app/api/account/password/route";
import * as balanceRoute from "@/app/api/gardens/[gardenId]/balance/route";
import * as memberRoute from "@/app/api/gardens/[gardenId]/members/[userId]/route";
import * as gardenRoute from "@/app/api/gardens/[gardenId]/route";
import * as everywhere from "@/app/api/session/everywhere/route";
import * as session from "@/app/api/session/route";
import {
  forgetCheckedSessionsAndRoles,
  gateGeneration,
  recallRole,
  recallSessionUser,
  rememberRole,
  rememberSessionUser,
} from "@/lib/auth/gate-cache";
import { requireRole } from "@/lib/auth/require-role";
import { AppError } from "@/lib/errors";
import {
  BASE_URL,
  call,
  closeHarness,
  cookieFor,
  makeGardenWithRoles,
  signIn,
  signUpUser,
} from "@/tests/support/integration/harness";

// The auth gate remembers checked sessions and roles for a few seconds (lib/auth/gate-cache.ts,
// issue 9 "Speed"). Each case below first warms that memory with the same cookie, twice, then
// revokes, and expects the very next request to be refused. Each fails if the write that
// revokes forgot to clear the memory (checked by removing the clear: the request got a 200).

afterAll(closeHarness);

const readGarden = (gardenId: string, cookie: string) =>
  call(gardenRoute.GET, { url: `/api/gardens/${gardenId}`, params: { gardenId }, cookie });
const readBalance = (gardenId: string, cookie: string) =>
  call(balanceRoute.GET, { url: `/api/gardens/${gardenId}/balance`, params: { gardenId }, cookie });

async function warm(gardenId: string, cookie: string): Promise<void> {
  for (let i = 0; i < 2; i++) expect((await readGarden(gardenId, cookie)).status).toBe(200);
}

/** requireRole straight, as every grower-only write route calls it. */
async function gateAs(gardenId: string, cookie: string, minimum: "grower" | "viewer") {
  const request = new Request(`${BASE_URL}/api/gardens/${gardenId}`, { headers: { cookie } });
  try {
    return (await requireRole(request, gardenId, minimum)).role;
  } catch (error) {
    if (error instanceof AppError) return error.code;
    throw error;
  }
}

describe("the auth gate's memory never outlives a revocation", () => {
  it("a signed-out cookie is refused on the next request", async () => {
    const world = await makeGardenWithRoles();
    const cookie = await signIn(world.viewer.email, world.viewer.password);
    await warm(world.gardenId, cookie);
    expect((await readBalance(world.gardenId, cookie)).status).toBe(200);
    const out = await call(session.DELETE, { url: "/api/session", method: "DELETE", cookie });
    expect(out.status).toBe(200);
    expect((await readBalance(world.gardenId, cookie)).status).toBe(401);
  });

  it("'sign out everywhere' and a password change refuse every other cookie at once", async () => {
    const world = await makeGardenWithRoles();
    const laptop = await signIn(world.grower.email, world.grower.password);
    const phone = await signIn(world.grower.email, world.grower.password);
    await warm(world.gardenId, laptop);
    await warm(world.gardenId, phone);
    const ended = await call(everywhere.POST, { url: "/api/session/everywhere", cookie: laptop });
    expect(ended.status).toBe(200);
    expect((await readGarden(world.gardenId, phone)).status).toBe(401);
    expect((await readGarden(world.gardenId, laptop)).status).toBe(401);

    const tablet = await signIn(world.grower.email, world.grower.password);
    const desk = await signIn(world.grower.email, world.grower.password);
    await warm(world.gardenId, tablet);
    await warm(world.gardenId, desk);
    const changed = await call(accountPassword.POST, {
      url: "/api/account/password",
      cookie: desk,
      body: { currentPassword: world.grower.password, newPassword: "leachate-by-lamplight-58" },
    });
    expect(changed.status).toBe(200);
    expect((await readGarden(world.gardenId, tablet)).status).toBe(401);
    expect((await readGarden(world.gardenId, desk)).status).toBe(401);
  });

  it("a removed member is refused on the next request (404, as for any outsider)", async () => {
    const world = await makeGardenWithRoles();
    const viewer = await cookieFor(world.viewer);
    await warm(world.gardenId, viewer);
    expect((await readBalance(world.gardenId, viewer)).status).toBe(200);
    const removed = await call(memberRoute.DELETE, {
      url: `/api/gardens/${world.gardenId}/members/${world.viewer.id}`,
      method: "DELETE",
      params: { gardenId: world.gardenId, userId: world.viewer.id },
      cookie: await cookieFor(world.owner),
    });
    expect(removed.status).toBe(200);
    expect((await readBalance(world.gardenId, viewer)).status).toBe(404);
    expect((await readGarden(world.gardenId, viewer)).status).toBe(404);
  });

  it("a grower demoted to viewer loses grower writes on the next request", async () => {
    const world = await makeGardenWithRoles();
    const grower = await cookieFor(world.grower);
    await warm(world.gardenId, grower);
    expect(await gateAs(world.gardenId, grower, "grower")).toBe("grower");
    const demoted = await call(memberRoute.PATCH, {
      url: `/api/gardens/${world.gardenId}/members/${world.grower.id}`,
      method: "PATCH",
      params: { gardenId: world.gardenId, userId: world.grower.id },
      cookie: await cookieFor(world.owner),
      body: { role: "viewer" },
    });
    expect(demoted.status).toBe(200);
    expect(await gateAs(world.gardenId, grower, "grower")).toBe("forbidden:role");
    expect(await gateAs(world.gardenId, grower, "viewer")).toBe("viewer");
  });

  it("a check that began before a revocation cannot store its old answer", async () => {
    const user = { id: crypto.randomUUID(), email: "late@example.com", name: "Late Check" };
    const gardenId = crypto.randomUUID();
    const before = gateGeneration(); // read, as the gate does, before its database query
    forgetCheckedSessionsAndRoles(); // a sign-out / removal commits meanwhile
    await rememberSessionUser("late-cookie", user, { generation: before, expiresAt: Infinity });
    await rememberRole(user.id, gardenId, "owner", before);
    expect(recallSessionUser("late-cookie")).toBeNull();
    expect(recallRole(user.id, gardenId)).toBeNull();
    // …while a check that began after it is kept (so the memory is not simply off).
    await rememberRole(user.id, gardenId, "owner", gateGeneration());
    expect(recallRole(user.id, gardenId)).toBe("owner");
  });

  it("never remembers past the session's own expiry", async () => {
    const user = await signUpUser("shortlived");
    await rememberSessionUser(
      "expiring-cookie",
      { id: user.id, email: user.email, name: "S" },
      {
        generation: gateGeneration(),
        expiresAt: Date.now() - 1,
      },
    );
    expect(recallSessionUser("expiring-cookie")).toBeNull();
  });
});
