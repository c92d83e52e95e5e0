import "@/tests/support/integration/env";
import net from "node:net";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as resend from "@/app/api/gardens/[gardenId]/invitations/[invitationId]/resend/route";
import * as invitations from "@/app/api/gardens/[gardenId]/invitations/route";
import * as accept from "@/app/api/invitations/accept/route";
import * as requestReset from "@/app/api/password-reset/route";
import { resetEnvCache } from "@/lib/env";
import { getLocalOutbox, startFakeSmtpServer, type FakeSmtpServer } from "@/services/mail";
import {
  call,
  closeHarness,
  cookieFor,
  invitationTokenFrom,
  makeGardenWithRoles,
  tableRows,
  type GardenWorld,
} from "@/tests/support/integration/harness";

// Its own file on purpose: the env is cached and the mailer is a module
// singleton, so "SMTP is down" has to be set before anything reads either.

/** A port that was free a moment ago and now has nobody listening. */
async function closedPort(): Promise<number> {
  const probe = net.createServer();
  await new Promise<void>((resolve) => probe.listen(0, "127.0.0.1", resolve));
  const { port } = probe.address() as net.AddressInfo;
  await new Promise<void>((resolve) => probe.close(() => resolve()));
  return port;
}

let port: number;
let world: GardenWorld;
let lateServer: FakeSmtpServer | undefined;

beforeAll(async () => {
  port = await closedPort();
  process.env.SMTP_HOST = "127.0.0.1";
  process.env.SMTP_PORT = String(port);
  resetEnvCache();
  world = await makeGardenWithRoles();
});
afterAll(async () => {
  await lateServer?.stop();
  await closeHarness();
});

type InvitationRow = { id: string; token_hash: string; mail_status: string; expires_at: string };
const invitationRow = async (id: string) =>
  ((await tableRows("invitations")) as InvitationRow[]).find((r) => r.id === id)!;

describe("invitations while SMTP is down", () => {
  let invitationId: string;

  it("saves the invitation, says the mail was not sent, and lists it as failed", async () => {
    const owner = await cookieFor(world.owner);
    // Addressed to the outsider, who accepts it once mail works again.
    const email = world.outsider.email;
    const res = await call(invitations.POST, {
      url: `/api/gardens/${world.gardenId}/invitations`,
      params: { gardenId: world.gardenId },
      cookie: owner,
      body: { email, role: "helper" },
    });
    expect(res.status).toBe(201);
    expect(res.json.mailSent).toBe(false);
    expect(res.json.invitation.mailStatus).toBe("failed");
    expect(res.json.message).toMatch(/saved.*could not be sent/);
    invitationId = res.json.invitation.id;

    const list = await call(invitations.GET, {
      url: `/api/gardens/${world.gardenId}/invitations`,
      params: { gardenId: world.gardenId },
      cookie: owner,
    });
    expect(list.status).toBe(200);
    expect(list.json.invitations).toContainEqual(
      expect.objectContaining({ id: invitationId, email, role: "helper", mailStatus: "failed" }),
    );
    // Real SMTP was configured, so no local catcher was started behind our back.
    expect(await getLocalOutbox()).toBeNull();
  });

  const resendIt = async () =>
    call(resend.POST, {
      url: `/api/gardens/${world.gardenId}/invitations/${invitationId}/resend`,
      params: { gardenId: world.gardenId, invitationId },
      cookie: await cookieFor(world.owner),
    });

  it("a resend that fails again reports it cleanly and still rotates the token", async () => {
    const before = await invitationRow(invitationId);
    const res = await resendIt();
    expect(res.status).toBe(200);
    expect(res.json.mailSent).toBe(false);
    expect(res.json.invitation.mailStatus).toBe("failed");
    const after = await invitationRow(invitationId);
    expect(after.token_hash).not.toBe(before.token_hash);
    expect(after.mail_status).toBe("failed");
    expect(Date.parse(after.expires_at)).toBeGreaterThanOrEqual(Date.parse(before.expires_at));
  });

  it("once the SMTP server answers, resend delivers a link that works", async () => {
    // The server "comes back" on the configured port.
    lateServer = await startFakeSmtpServer({ port });
    const res = await resendIt();
    expect(res.status).toBe(200);
    expect(res.json.mailSent).toBe(true);
    expect((await invitationRow(invitationId)).mail_status).toBe("sent");
    const mail = lateServer.messages()[0];
    expect(mail).toBeDefined();
    const token = invitationTokenFrom(mail!);
    const joined = await call(accept.POST, {
      url: "/api/invitations/accept",
      cookie: await cookieFor(world.outsider),
      body: { token },
    });
    expect(joined.json).toEqual({ gardenId: world.gardenId, role: "helper" });
  });

  it("a password reset still gives the usual 202 when mail fails", async () => {
    await lateServer?.stop();
    lateServer = undefined;
    const res = await call(requestReset.POST, {
      url: "/api/password-reset",
      body: { email: world.viewer.email },
    });
    expect(res.status).toBe(202);
    expect(res.json.ok).toBe(true);
  });
});
