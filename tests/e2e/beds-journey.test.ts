import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { demoGarden, demoMembers } from "@/db/seed/demo-garden";
import { BedPage } from "./pages/bed-page";
import { BedsPage } from "./pages/beds-page";
import { SignInPage } from "./pages/sign-in-page";
import { openBrowser, type BrowserSession } from "./support/browser";

// PRODUCT.md journey 1, "add a bed and its plants", on a phone-sized screen.
const baseUrl = inject("baseUrl");
const grower = demoMembers.find((m) => m.role === "grower")!;
const viewer = demoMembers.find((m) => m.role === "viewer")!;

async function signInTo(session: BrowserSession, who: { email: string; password: string }) {
  const signIn = new SignInPage(session.page, baseUrl);
  await signIn.open();
  await signIn.signIn(who.email, who.password);
  await session.page.waitForURL(`${baseUrl}/gardens`);
  await session.page.getByRole("link", { name: new RegExp(demoGarden.name) }).click();
  await session.page.waitForURL(/\/g\/[0-9a-f-]{36}$/);
}

describe("journey 1: a bed and its plants", () => {
  let session: BrowserSession;
  let bedUrl = "";
  beforeAll(async () => {
    session = await openBrowser({ width: 375, height: 800 });
  });
  afterAll(async () => {
    await session.close();
  });

  it("a grower adds an 8 × 4 ft bed, then 6 tomato and 4 pepper in one line", async () => {
    await signInTo(session, grower);
    const beds = new BedsPage(session.page);
    await beds.openFromNav();
    await beds.addBed("Journey bed", 8, 4);
    bedUrl = session.page.url();
    // 8 × 4 ft = 32 ft² (plain arithmetic), shown in the garden's US units.
    await session.page.getByText(/8 × 4 ft · 32 ft²/).waitFor();
    const bed = new BedPage(session.page);
    await bed.quickAdd("6 tomato, 4 pepper");
    await bed.planting(/^6 tomato$/i).waitFor();
    await bed.planting(/^4 pepper$/i).waitFor();
    // Tomato and pepper are heavy feeders: 1 cup castings per plant monthly (PRODUCT.md, common practice).
    expect(await bed.planting(/^6 tomato$/i).textContent()).toContain("1 cup castings per plant");
  });

  it("overrides one planting's rule with tea every two weeks, written in lower case", async () => {
    const bed = new BedPage(session.page);
    await bed.overrideWithTea(/^6 tomato$/i, 3, "freq=weekly;interval=2;byday=sa");
    await bed
      .planting(/^6 tomato$/i)
      .getByText(/worm tea per plant, as a soil drench, every 2 weeks on Saturday/)
      .waitFor();
    expect(await bed.demandTable().getByRole("rowheader").count()).toBeGreaterThanOrEqual(1);
    const overflow = await session.page.evaluate(
      () => document.documentElement.scrollWidth - window.innerWidth,
    );
    expect(overflow).toBeLessThanOrEqual(0);
    expect(session.problems).toEqual([]);
  });

  it("a viewer sees the same bed with no edit controls, and the API refuses the viewer's edit", async () => {
    const viewerSession = await openBrowser({ width: 375, height: 800 });
    try {
      await signInTo(viewerSession, viewer);
      await viewerSession.page.goto(bedUrl);
      await viewerSession.page.getByRole("heading", { name: "Journey bed" }).waitFor();
      expect(
        await viewerSession.page.getByRole("button", { name: "Change feedings" }).count(),
      ).toBe(0);
      expect(await viewerSession.page.getByRole("form", { name: "Add plants" }).count()).toBe(0);
      const [, , gardenId, , bedId] = new URL(bedUrl).pathname.split("/");
      const res = await viewerSession.page.request.patch(
        `${baseUrl}/api/gardens/${gardenId}/beds/${bedId}`,
        {
          data: { name: "Renamed by a viewer" },
          headers: { origin: baseUrl },
        },
      );
      // lib/auth/require-role.ts: a member below the needed role → 403 (RFC 9110 §15.5.4).
      expect(res.status()).toBe(403);
    } finally {
      await viewerSession.close();
    }
  });
});
