import "@/tests/support/integration/env";
import { sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as invitation from "@/app/api/gardens/[gardenId]/invitations/[invitationId]/route";
import * as invitations from "@/app/api/gardens/[gardenId]/invitations/route";
import * as members from "@/app/api/gardens/[gardenId]/members/route";
import * as accept from "@/app/api/invitations/accept/route";
import { getDb } from "@/db";
import { createInvitation } from "@/db/queries/invitations";
import type { Role } from "@/lib/auth/roles";
import { createLinkToken, hashLinkToken } from "@/lib/auth/tokens";
import {
  BASE_URL,
  call,
  closeHarness,
  cookieFor,
  invitationTokenFrom,
  latestMailTo,
  makeGardenWithRoles,
  signUp,
  snapshotDb,
  membershipRole,
  uniqueEmail,
  type GardenWorld,
} from "@/tests/support/integration/harness";

let world: GardenWorld;
beforeAll(async () => {
  world = await makeGardenWithRoles();
});
afterAll(closeHarness);

const at = (gardenId: string, rest = "") => ({
  url: `/api/gardens/${gardenId}${rest}`,
  params: { gardenId },
});

async function invite(gardenId: string, email: string, role: string) {
  const res = await call(invitations.POST, {
    ...at(gardenId, "/invitations"),
    cookie: await cookieFor(world.owner),
    body: { email, role },
  });
  expect(res.status).toBe(201);
  expect(res.json.mailSent).toBe(true);
  const mail = await latestMailTo(email);
  expect(mail, `invitation mail to ${email}`).toBeDefined();
  expect(mail!.text).toContain(`${BASE_URL}/invitations/`);
  return { id: res.json.invitation.id as string, token: invitationTokenFrom(mail!) };
}

/** An invitation row written straight to the database, as if sent before its addressee joined. */
async function inviteDirectly(gardenId: string, email: string, role: Role) {
  const { token, tokenHash } = createLinkToken();
  await createInvitation({ gardenId, email, role, tokenHash, invitedBy: world.owner.id });
  return { token };
}

const acceptAs = (cookie: string, token: string) =>
  call(accept.POST, { url: "/api/invitations/accept", cookie, body: { token } });

describe("invitations", () => {
  it("a new person signs up from the link and joins with the invited role", async () => {
    const g = await makeGardenWithRoles(world);
    const email = uniqueEmail("newbie");
    const { token } = await invite(g.gardenId, email, "helper");
    const cookie = await signUp(email, "castings-in-the-wheelbarrow", "Ada Newbie");
    const res = await acceptAs(cookie, token);
    expect(res.status).toBe(200);
    expect(res.json).toEqual({ gardenId: g.gardenId, role: "helper" });
    const list = await call(members.GET, { ...at(g.gardenId, "/members"), cookie });
    expect(list.json.members.find((m: { email: string }) => m.email === email)?.role).toBe(
      "helper",
    );

    const reuse = await acceptAs(await cookieFor(world.outsider), token);
    expect(reuse.status).toBe(410);
    expect(reuse.json.error.code).toBe("gone:invitation_used");
    expect(await membershipRole(g.gardenId, world.outsider.id)).toBeUndefined();
  });

  it("an existing member keeps the higher of their role and the invited one", async () => {
    const g = await makeGardenWithRoles(world);
    // The API no longer invites a member (409, tests/integration/invite-existing.test.ts),
    // but an invitation sent before they joined another way can still be accepted.
    const up = await inviteDirectly(g.gardenId, world.viewer.email, "grower");
    expect((await acceptAs(await cookieFor(world.viewer), up.token)).json.role).toBe("grower");
    expect(await membershipRole(g.gardenId, world.viewer.id)).toBe("grower");
    const down = await inviteDirectly(g.gardenId, world.grower.email, "viewer");
    expect((await acceptAs(await cookieFor(world.grower), down.token)).json.role).toBe("grower");
    // An existing account that is not yet a member gets exactly the invited role.
    const outsider = await invite(g.gardenId, world.outsider.email, "helper");
    expect((await acceptAs(await cookieFor(world.outsider), outsider.token)).status).toBe(200);
    expect(await membershipRole(g.gardenId, world.outsider.id)).toBe("helper");
  });

  it("refuses a link used by an account with another address (403) and adds nobody", async () => {
    const g = await makeGardenWithRoles(world);
    const { token } = await invite(g.gardenId, uniqueEmail("intended"), "owner");
    // Minted first: a cookie is a row in the sessions allow-list.
    const cookie = await cookieFor(world.outsider);
    const before = await snapshotDb();
    const res = await acceptAs(cookie, token);
    expect(res.status).toBe(403);
    expect(res.json.error.code).toBe("forbidden:invitation_wrong_account");
    expect(await snapshotDb()).toBe(before);
  });

  it("refuses an expired invitation with 410 and adds nobody", async () => {
    const g = await makeGardenWithRoles(world);
    const { token } = await invite(g.gardenId, uniqueEmail("slow"), "viewer");
    const db = await getDb();
    await db.execute(
      sql`update invitations set expires_at = now() - interval '1 second' where token_hash = ${hashLinkToken(token)}`,
    );
    // Minted first: a cookie is a row in the sessions allow-list.
    const cookie = await cookieFor(world.outsider);
    const before = await snapshotDb();
    const res = await acceptAs(cookie, token);
    expect(res.status).toBe(410);
    expect(res.json.error.code).toBe("gone:invitation_expired");
    expect(await snapshotDb()).toBe(before);
  });

  it("refuses a revoked invitation with 410; the open list no longer shows it", async () => {
    const g = await makeGardenWithRoles(world);
    const { id, token } = await invite(g.gardenId, uniqueEmail("withdrawn"), "grower");
    const owner = await cookieFor(world.owner);
    const revoked = await call(invitation.DELETE, {
      url: `/api/gardens/${g.gardenId}/invitations/${id}`,
      method: "DELETE",
      params: { gardenId: g.gardenId, invitationId: id },
      cookie: owner,
    });
    expect(revoked.status).toBe(200);
    const open = await call(invitations.GET, { ...at(g.gardenId, "/invitations"), cookie: owner });
    expect(open.json.invitations.map((i: { id: string }) => i.id)).not.toContain(id);
    const res = await acceptAs(await cookieFor(world.outsider), token);
    expect(res.status).toBe(410);
    expect(res.json.error.code).toBe("gone:invitation_revoked");
    expect(await membershipRole(g.gardenId, world.outsider.id)).toBeUndefined();
  });

  it("refuses a made-up token with 410 and needs a signed-in caller", async () => {
    const res = await acceptAs(await cookieFor(world.outsider), "B".repeat(43));
    expect(res.status).toBe(410);
    expect(res.json.error.code).toBe("gone:invitation_invalid");
    expect(
      (await call(accept.POST, { url: "/api/invitations/accept", body: { token: "B".repeat(43) } }))
        .status,
    ).toBe(401);
  });
});
