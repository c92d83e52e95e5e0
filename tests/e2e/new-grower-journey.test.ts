import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { AppShell } from "./pages/app-shell";
import { BedsPage } from "./pages/beds-page";
import { BinFormPage } from "./pages/bin-form-page";
import { GardensPage } from "./pages/gardens-page";
import { OutboxPage } from "./pages/outbox-page";
import { auditPage } from "./pages/page-audit";
import { SettingsPage } from "./pages/settings-page";
import { SignUpPage } from "./pages/sign-up-page";
import { openBrowser, type BrowserSession } from "./support/browser";

// Issue 12, "Done when": a NEW account from sign-up to a garden with a bin and a
// bed, on a phone (375 px) and a laptop (1280 px). Every page visited must fit the
// width, have no target under 24 × 24 px (WCAG 2.2 SC 2.5.8) and log no console
// error; then the garden switches to metric and its overview shows no US unit.
const baseUrl = inject("baseUrl");

// US customary units as growers write them (NIST HB 44 Appendix C names). "in" and
// "cup" are English words too, so they count only right after a number.
const usUnit = /\b\d[\d,.]*\s*(?:in|cups?)\b|\b(?:lb|oz|gal|qt|ft)\b|°F/;

for (const width of [375, 1280]) {
  describe(`a new grower's first garden at ${width} px`, () => {
    let session: BrowserSession;
    const email = `new-grower-${width}-${Date.now()}@example.test`;
    let gardenUrl = "";

    /** Audits the page as it stands and names it in any failure. */
    async function expectTidy(label: string) {
      const { page, problems } = session;
      await page.waitForLoadState("networkidle");
      const audit = await auditPage(page);
      expect
        .soft(audit.overflow, `${label}: sideways scroll (${audit.url})`)
        .toBeLessThanOrEqual(0);
      expect
        .soft(audit.smallTargets, `${label}: targets under 24 × 24 px (${audit.url})`)
        .toEqual([]);
      expect.soft(problems, `${label}: console errors (${audit.url})`).toEqual([]);
      problems.length = 0;
    }

    beforeAll(async () => {
      session = await openBrowser({ width, height: 900 });
    });
    afterAll(async () => {
      await session.close();
    });

    it("signs up from the sign-in page and gets the welcome mail", async () => {
      const { page } = session;
      await page.goto(`${baseUrl}/sign-in`);
      await expectTidy("sign-in");
      // Issue 12 item 13: every page links the favicons, touch icon and manifest, and they load.
      const links = await page
        .locator(
          'head link[rel="icon"], head link[rel="apple-touch-icon"], head link[rel="manifest"]',
        )
        .evaluateAll((els) => els.map((el) => (el as HTMLLinkElement).href));
      expect(links.map((href) => new URL(href).pathname).sort()).toEqual(
        ["/apple-touch-icon.png", "/favicon-32.png", "/icon.svg", "/manifest.webmanifest"].sort(),
      );
      for (const href of links) expect((await page.request.get(href)).status(), href).toBe(200);
      await page
        .getByRole("link", { name: /make an account|sign up/i })
        .first()
        .click();
      await page.waitForURL(/\/sign-up/);
      await expectTidy("sign-up");
      await new SignUpPage(page, baseUrl).signUp({
        name: `New Grower ${width}`,
        email,
        password: "tulip ladder orchard copper",
      });
      await page.waitForURL(`${baseUrl}/gardens`);
      await expectTidy("gardens (empty)");
      const outbox = new OutboxPage(page, baseUrl);
      await outbox.open();
      expect(await (await outbox.waitForMessageTo(email)).innerText()).toMatch(/account is ready/);
      await expectTidy("outbox");
    });

    it("starts a garden whose header is one row of at most 64 px", async () => {
      const { page } = session;
      const gardens = new GardensPage(page, baseUrl);
      await gardens.open();
      await gardens.startGarden({
        name: `Plot ${width}`,
        timeZone: "Europe/London",
        units: "us",
        lastSpringFrost: "2026-04-15",
        firstFallFrost: "2026-10-15",
        location: "",
      });
      await page.waitForURL(/\/g\/[0-9a-f-]{36}$/);
      gardenUrl = page.url();
      await expectTidy("overview (new garden)");
      // Issue 12 item 10: one row, at most 64 px, at every width.
      expect(await new AppShell(page).headerHeight()).toBeLessThanOrEqual(64);
    });

    it("adds a bin", async () => {
      const { page } = session;
      await new AppShell(page).openSection("Bins");
      await page.getByRole("heading", { name: "Bins", level: 1 }).waitFor();
      await expectTidy("bins (empty)");
      await page.getByRole("link", { name: "Add a bin" }).first().click();
      await new BinFormPage(page).form().waitFor();
      await expectTidy("new bin form");
      await new BinFormPage(page).addBin({
        name: "Porch stack",
        trays: 3,
        startedOn: "2026-03-01",
        outsideLength: 20,
        outsideWidth: 16,
        worms: 1000,
      });
      await page.getByRole("heading", { name: "Porch stack", level: 1 }).waitFor();
      await expectTidy("bin page");
    });

    it("adds a bed", async () => {
      const { page } = session;
      await new AppShell(page).openSection("Beds");
      await page.getByRole("heading", { name: "Beds and containers", exact: true }).waitFor();
      await expectTidy("beds (empty)");
      await new BedsPage(page).addBed("Kitchen bed", 8, 4);
      await page.getByRole("heading", { name: "Kitchen bed" }).waitFor();
      await expectTidy("bed page");
    });

    it("visits the account page", async () => {
      const { page } = session;
      await page.goto(`${baseUrl}/account`);
      await page.getByRole("heading", { level: 1 }).first().waitFor();
      await expectTidy("account");
    });

    it("switches the garden to metric and the overview shows no US unit", async () => {
      const { page } = session;
      await page.goto(gardenUrl);
      await new AppShell(page).openSection("Settings");
      await new SettingsPage(page).form().waitFor();
      await expectTidy("settings");
      await new SettingsPage(page).switchUnits("metric");
      await page.goto(gardenUrl);
      await page.getByTestId("garden-name").waitFor();
      await expectTidy("overview (metric)");
      const text = await page.getByRole("main").innerText();
      const found = text.split("\n").filter((line) => usUnit.test(line));
      expect(found, "US units left on the metric overview").toEqual([]);
    });
  });
}
