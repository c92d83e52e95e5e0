import crypto from "node:crypto";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { openBrowser, type BrowserSession } from "./support/browser";
import { GardenPage } from "./pages/garden-page";
import { GardensPage, type NewGarden } from "./pages/gardens-page";
import { InvitationPage } from "./pages/invitation-page";
import { MembersPage } from "./pages/members-page";
import { OutboxPage } from "./pages/outbox-page";
import { SignUpPage, type NewAccount } from "./pages/sign-up-page";

const baseUrl = inject("baseUrl");

// A random suffix keeps addresses unique when the suite runs against a kept data dir.
const suffix = crypto.randomBytes(4).toString("hex");
const owner: NewAccount = {
  name: "Ada Hollis",
  email: `ada-${suffix}@example.com`,
  // Long and unlikely to be on a leaked-password list (the sign-up form refuses those).
  password: `turned compost by the shed ${suffix}`,
};
const invitee: NewAccount = {
  name: "Ben Hollis",
  email: `ben-${suffix}@example.com`,
  password: `feeds the worms on tuesdays ${suffix}`,
};
const garden: NewGarden = {
  name: `Hollis Street Garden ${suffix}`,
  timeZone: "Europe/London",
  units: "metric",
  lastSpringFrost: "2026-04-20",
  firstFallFrost: "2026-10-25",
  location: "Plot 7, Hollis Street allotments",
};

const escapeRegExp = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
const gardenUrl = new RegExp(`^${escapeRegExp(baseUrl)}/g/[0-9a-f-]{36}$`);

describe("an owner invites a helper, who joins from the e-mailed link (phone-sized viewport)", () => {
  let ownerSession: BrowserSession;
  let inviteeSession: BrowserSession | undefined;
  let gardenId = "";
  let inviteLink = "";

  beforeAll(async () => {
    ownerSession = await openBrowser({ width: 390, height: 844 });
  });
  afterAll(async () => {
    await inviteeSession?.close();
    await ownerSession?.close();
  });

  it("a new person signs up and lands on an empty garden list", async () => {
    const { page } = ownerSession;
    const signUp = new SignUpPage(page, baseUrl);
    await signUp.open();
    await signUp.signUp(owner);
    await page.waitForURL(`${baseUrl}/gardens`);
    await new GardensPage(page, baseUrl).emptyState().waitFor();
  });

  it("starts a garden and lands on its overview", async () => {
    const { page } = ownerSession;
    await new GardensPage(page, baseUrl).startGarden(garden);
    await page.waitForURL(gardenUrl);
    gardenId = new URL(page.url()).pathname.split("/")[2] ?? "";
    const overview = new GardenPage(page);
    await overview.gardenName().waitFor();
    expect(await overview.gardenName().textContent()).toBe(garden.name);
    // Whoever starts a garden runs it (PRODUCT.md, "Who uses it": owner).
    await overview.roleBadge("Owner").waitFor();
  });

  it("invites a second address as Helper from Members", async () => {
    const { page } = ownerSession;
    await new GardenPage(page).openSection("Members");
    await page.waitForURL(`${baseUrl}/g/${gardenId}/members`);
    const members = new MembersPage(page);
    await members.heading().waitFor();
    // The four per-garden roles of PRODUCT.md, "Who uses it (roles are per garden)".
    expect([...(await members.roleOptions())].sort()).toEqual([
      "Grower",
      "Helper",
      "Owner",
      "Viewer",
    ]);
    await members.invite(invitee.email, "Helper");
    await members.toasts().getByText(`Invitation sent to ${invitee.email}.`).waitFor();
    const row = members.openInvitationRow(invitee.email);
    await row.waitFor();
    expect(await row.getByText("Helper", { exact: true }).count()).toBe(1);
  });

  it("the invitation is not readable in anyone else's outbox, signed in or out", async () => {
    const owners = new OutboxPage(ownerSession.page, baseUrl);
    await owners.open();
    expect(await owners.messageTo(invitee.email).count()).toBe(0);
    inviteeSession = await openBrowser({ width: 390, height: 844 });
    const strangers = new OutboxPage(inviteeSession.page, baseUrl);
    await strangers.open();
    await inviteeSession.page.getByText("Sign in to read your mail").waitFor();
    expect(await strangers.messageTo(invitee.email).count()).toBe(0);
  });

  it("the invitee signs up with the invited address, reads the invitation and joins as Helper", async () => {
    if (!inviteeSession) throw new Error("the invitee's browser was never opened");
    const { page } = inviteeSession;
    const signUp = new SignUpPage(page, baseUrl);
    await signUp.open();
    await signUp.signUp(invitee);
    await page.waitForURL(`${baseUrl}/gardens`);

    const outbox = new OutboxPage(page, baseUrl);
    await outbox.open();
    inviteLink = await outbox.invitationLinkFor(invitee.email);
    // Links use the configured origin (APP_ORIGIN, set by global-setup), never the Host header.
    expect(new URL(inviteLink).origin).toBe(baseUrl);

    const invitation = new InvitationPage(page);
    await invitation.open(inviteLink);
    expect(await invitation.heading().textContent()).toBe(`Join ${garden.name}`);
    await invitation.joinButton(garden.name).click();

    await page.waitForURL((url) => url.pathname === `/g/${gardenId}`);
    const overview = new GardenPage(page);
    await overview.gardenName().waitFor();
    expect(await overview.gardenName().textContent()).toBe(garden.name);
    await overview.roleBadge("Helper").waitFor();
    // Settings is for owners only (PRODUCT.md: only the owner manages members, roles, deletion).
    await (await overview.nav()).getByRole("link", { name: "Members" }).waitFor();
    expect(await (await overview.nav()).getByRole("link", { name: "Settings" }).count()).toBe(0);
  });

  it("the same link cannot be used twice", async () => {
    if (!inviteeSession) throw new Error("the invitee's browser was never opened");
    const invitation = new InvitationPage(inviteeSession.page);
    await invitation.open(inviteLink);
    await invitation.problem().getByText("This invitation was already used.").waitFor();
    expect(await invitation.joinButton(garden.name).count()).toBe(0);
  });

  it("the owner no longer sees it as open", async () => {
    const { page } = ownerSession;
    await page.goto(`${baseUrl}/g/${gardenId}/members`);
    const members = new MembersPage(page);
    await members.openInvitations().getByText("No open invitations").waitFor();
    expect(await members.openInvitationRow(invitee.email).count()).toBe(0);
  });

  it("neither browser logged a console error or CSP violation", () => {
    expect(ownerSession.problems).toEqual([]);
    expect(inviteeSession?.problems).toEqual([]);
  });
});
