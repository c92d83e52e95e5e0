import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { demoGarden, demoMembers } from "@/db/seed/demo-garden";
import { SignInPage } from "./pages/sign-in-page";
import { openBrowser, type BrowserSession } from "./support/browser";

// Issue 12 item 8: a member below owner who opens Settings (an old bookmark, a link
// an owner sent) is told why they cannot change it and who can, instead of being
// sent back to the overview without a word.
const baseUrl = inject("baseUrl");
const grower = demoMembers.find((m) => m.role === "grower")!;
const owner = demoMembers.find((m) => m.role === "owner")!;

describe("Settings for someone who is not an owner", () => {
  let session: BrowserSession;
  beforeAll(async () => {
    session = await openBrowser({ width: 375, height: 800 });
  });
  afterAll(async () => {
    await session.close();
  });

  it("says only owners change settings and names the owners", async () => {
    const { page } = session;
    const signIn = new SignInPage(page, baseUrl);
    await signIn.open();
    await signIn.signIn(grower.email, grower.password);
    await page.waitForURL(`${baseUrl}/gardens`);
    await page.getByRole("link", { name: new RegExp(demoGarden.name) }).click();
    await page.waitForURL(/\/g\/[0-9a-f-]{36}$/);
    const settingsUrl = `${page.url()}/settings`;
    await page.goto(settingsUrl);
    // Still on Settings, not bounced to the overview.
    expect(page.url()).toBe(settingsUrl);
    const main = page.getByRole("main");
    await main.getByRole("heading", { name: "Settings", level: 1 }).waitFor();
    expect(await main.innerText()).toMatch(/only owners/i);
    expect(await main.innerText()).toContain(owner.name);
    // No form to change anything.
    expect(await page.getByRole("form", { name: "Garden settings" }).count()).toBe(0);
    expect(session.problems).toEqual([]);
  });
});
