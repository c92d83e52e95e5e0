import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { demoGarden, demoMembers } from "@/db/seed/demo-garden";
import { openBrowser, type BrowserSession } from "./support/browser";
import { GardenPage } from "./pages/garden-page";
import { SignInPage } from "./pages/sign-in-page";

const baseUrl = inject("baseUrl");
const owner = demoMembers.find((m) => m.role === "owner")!;

describe("demo garden in a real browser (phone-sized viewport)", () => {
  let session: BrowserSession;
  beforeAll(async () => {
    session = await openBrowser();
  });
  afterAll(async () => {
    await session.close();
  });

  it("the sign-in page lists the demo accounts in demo mode", async () => {
    const signIn = new SignInPage(session.page, baseUrl);
    await signIn.open();
    await expect(session.page.getByRole("cell", { name: owner.email }).isVisible()).resolves.toBe(
      true,
    );
  });

  it("the demo owner signs in and sees the garden's name in the shell", async () => {
    const { page } = session;
    const signIn = new SignInPage(page, baseUrl);
    await signIn.open();
    await signIn.signIn(owner.email, owner.password);
    await page.waitForURL(`${baseUrl}/gardens`);
    await page.getByRole("link", { name: new RegExp(demoGarden.name) }).click();
    const garden = new GardenPage(page);
    await garden.gardenName().waitFor();
    expect(await garden.gardenName().textContent()).toBe(demoGarden.name);
    // The switcher in the header names the current garden too.
    const switcher = page.getByLabel("Switch garden");
    expect(
      await switcher.evaluate((el: HTMLSelectElement) => el.selectedOptions[0]?.textContent),
    ).toBe(demoGarden.name);
    // The owner sees Settings; the page passed our CSP without console errors.
    expect(await (await garden.nav()).getByRole("link", { name: "Settings" }).count()).toBe(1);
    expect(session.problems).toEqual([]);
  });

  it("the page fits a 375 px wide phone without sideways scrolling", async () => {
    const { page } = session;
    await page.setViewportSize({ width: 375, height: 800 });
    const overflow = await page.evaluate(
      () => document.documentElement.scrollWidth - window.innerWidth,
    );
    expect(overflow).toBeLessThanOrEqual(0);
  });
});
