import "@/tests/support/integration/env";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as invitation from "@/app/api/gardens/[gardenId]/invitations/[invitationId]/route";
import * as resend from "@/app/api/gardens/[gardenId]/invitations/[invitationId]/resend/route";
import * as invitations from "@/app/api/gardens/[gardenId]/invitations/route";
import {
  call,
  closeHarness,
  cookieFor,
  errorCode,
  makeGardenWithRoles,
  outbox,
  snapshotDb,
  uniqueEmail,
  type GardenWorld,
} from "@/tests/support/integration/harness";

// Issue 12 item 6: inviting someone who is already a member silently created an open
// invitation. Now the API says so (409 naming the field), and an address with an open
// invitation is pointed at "Resend", which keeps the existing mail limits.

let world: GardenWorld;
// Minted once, before any snapshot: a cookie is a row in the sessions allow-list.
let owner: string;
beforeAll(async () => {
  world = await makeGardenWithRoles();
  owner = await cookieFor(world.owner);
});
afterAll(closeHarness);

const invite = async (email: string, role = "helper") =>
  call(invitations.POST, {
    url: `/api/gardens/${world.gardenId}/invitations`,
    params: { gardenId: world.gardenId },
    cookie: owner,
    body: { email, role },
  });

describe("inviting an address that is already in the garden", () => {
  it("refuses a member with 409 on the email field, whatever the case, and changes nothing", async () => {
    const before = await snapshotDb();
    const mailsBefore = (await outbox()).length;
    for (const email of [world.viewer.email, `  ${world.viewer.email.toUpperCase()} `]) {
      const res = await invite(email);
      expect(res.status).toBe(409);
      expect(errorCode(res)).toBe("conflict:already_member");
      expect(res.json.error.fields.email).toMatch(/already a member/i);
    }
    expect(await snapshotDb()).toBe(before);
    expect((await outbox()).length).toBe(mailsBefore);
  });

  it("refuses the owner inviting themself the same way", async () => {
    const res = await invite(world.owner.email, "viewer");
    expect(res.status).toBe(409);
    expect(errorCode(res)).toBe("conflict:already_member");
  });

  it("refuses a second invitation to the same address and names the open one to resend", async () => {
    const email = uniqueEmail("twice");
    const first = await invite(email);
    expect(first.status).toBe(201);
    const before = await snapshotDb();
    const again = await invite(email.toUpperCase(), "grower");
    expect(again.status).toBe(409);
    expect(errorCode(again)).toBe("conflict:already_invited");
    expect(again.json.error.fields.email).toMatch(/already invited/i);
    expect(await snapshotDb()).toBe(before);
    // "Resend" is the way on, and it still answers.
    const id = first.json.invitation.id as string;
    const resent = await call(resend.POST, {
      url: `/api/gardens/${world.gardenId}/invitations/${id}/resend`,
      params: { gardenId: world.gardenId, invitationId: id },
      cookie: owner,
    });
    expect(resent.status).toBe(200);
  });

  it("invites the address again once its invitation was withdrawn", async () => {
    const email = uniqueEmail("withdrawn-again");
    const first = await invite(email);
    const id = first.json.invitation.id as string;
    const revoked = await call(invitation.DELETE, {
      url: `/api/gardens/${world.gardenId}/invitations/${id}`,
      method: "DELETE",
      params: { gardenId: world.gardenId, invitationId: id },
      cookie: owner,
    });
    expect(revoked.status).toBe(200);
    expect((await invite(email)).status).toBe(201);
  });
});
