import os from "node:os";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { demoGarden, demoMembers, neighbourGarden } from "@/db/seed/demo-garden";
import { BalancePage } from "./pages/balance-page";
import { BinFormPage } from "./pages/bin-form-page";
import { BinPage } from "./pages/bin-page";
import { SignInPage } from "./pages/sign-in-page";
import { StockPage } from "./pages/stock-page";
import { openBrowser, type BrowserSession } from "./support/browser";

// Issue 11's browser done-when, on a 375 px phone screen against the demo
// gardens (db/seed): a helper logs a tray harvest with a photo; the castings lot
// is on the stock page and the Balance moves; the bin page shows the next
// harvest and the calibration; a grower who belongs to two gardens moves 500
// worms into a bin (made first, from a pre-filled link) in the other garden.
const baseUrl = inject("baseUrl");
const owner = demoMembers.find((m) => m.role === "owner")!; // grower at Linden Row too
const grower = demoMembers.find((m) => m.role === "grower")!; // helper at Linden Row too
const helper = demoMembers.find((m) => m.role === "helper")!;
const FOUR_TRAY = "Wooden four-tray stack";
// Screenshots for a person to open: E2E_SHOTS_DIR when set, else the temp dir.
const SHOTS = process.env.E2E_SHOTS_DIR ?? os.tmpdir();

async function signIn(who: { email: string; password: string }, width = 375) {
  const session = await openBrowser({ width, height: 800 });
  const signInPage = new SignInPage(session.page, baseUrl);
  await signInPage.open();
  await signInPage.signIn(who.email, who.password);
  await session.page.waitForURL(`${baseUrl}/gardens`);
  return session;
}

/** A garden's id from the signed-in person's garden list. */
async function gardenIdOf(session: BrowserSession, name: string): Promise<string> {
  await session.page.goto(`${baseUrl}/gardens`);
  const href = await session.page
    .getByRole("link", { name: new RegExp(name) })
    .first()
    .getAttribute("href");
  return href!.split("/g/")[1]!.split(/[/?]/)[0]!;
}

/** "Scaled ×0.94 from 4 logged harvests" → its factor and count (none yet → 1 from 0). */
function calibration(text: string): { factor: number; harvests: number } {
  const m = /^Scaled ×(\d+\.\d\d) from (\d+) logged harvests?$/.exec(text);
  return m ? { factor: Number(m[1]), harvests: Number(m[2]) } : { factor: 1, harvests: 0 };
}

/** A small real JPEG, 160 × 120, the colour of castings. */
function castingsPhoto(): Promise<Buffer> {
  return sharp({ create: { width: 160, height: 120, channels: 3, background: "#4a3b2f" } })
    .jpeg({ quality: 80 })
    .toBuffer();
}

describe("a helper logs a tray harvest with a photo", () => {
  let session: BrowserSession;
  let hollis = "";
  let today = "";
  const bin = () => new BinPage(session.page, baseUrl);
  beforeAll(async () => {
    session = await signIn(helper);
    hollis = await gardenIdOf(session, demoGarden.name);
  });
  afterAll(async () => {
    await session.close();
  });

  it("the lot is on the stock page, the Balance's harvested figure rises, the bin page shows next harvest and calibration", async () => {
    await bin().openByName(hollis, FOUR_TRAY);
    today = await bin().today();
    const month = today.slice(0, 7);
    const calibrationBefore = calibration(await bin().summary("Calibration"));

    const balance = new BalancePage(session.page, baseUrl);
    await balance.open(hollis, month, 3);
    const suppliedBefore = await balance.figure(month, "castings", "supplied");

    await bin().openByName(hollis, FOUR_TRAY);
    // 40 lb is under one full tray of this bin: 21 × 17 × 5½ in = 32.2 L × 0.7 kg/L ≈ 49.7 lb
    // (PRODUCT.md tray geometry and default bulk density; 1 lb = 0.45359237 kg, NIST HB 44).
    await bin().logHarvestLb(40);
    await bin().attachPhoto("bottom-tray.jpg", await castingsPhoto());
    const photos = await bin().logPhotoSizes();
    // The browser decoded the stored photo at the size sent: it went to storage and back.
    expect(photos[0]).toMatchObject({ width: 160, height: 120 });

    // The bin page after the harvest: the next harvest is a date from today on, and
    // the calibration counts one more logged harvest.
    await session.page.reload();
    expect(await bin().summary("Next harvest")).toMatch(
      /^(Mon|Tue|Wed|Thu|Fri|Sat|Sun), [A-Z][a-z]{2} \d{1,2}, about \d+ lb$|^None in the next twelve months$/,
    );
    // The factor is the mean of actual ÷ forecast over the newest 4 logged harvests (the
    // engine's default window, lib/engine/core/defaults.ts, our choice): the new 40 lb
    // harvest joins it, so the count grows to at most 4 and the factor moves.
    const calibrationAfter = calibration(await bin().summary("Calibration"));
    expect(calibrationAfter.harvests).toBe(Math.min(calibrationBefore.harvests + 1, 4));
    expect(calibrationAfter.factor).not.toBe(calibrationBefore.factor);

    const stock = new StockPage(session.page, baseUrl);
    await stock.open(hollis);
    const newest = (await stock.lots())[0]!;
    expect(newest).toMatch(new RegExp(`^40 lb castings Fresh From ${FOUR_TRAY}, `));
    expect(newest).toContain("0 days old");

    // The harvested figure of this month carries the 40 lb; the rest of the difference is
    // the forecast's own harvests re-scaled by the new calibration (a few percent).
    await balance.open(hollis, month, 3);
    const rise = (await balance.figure(month, "castings", "supplied")) - suppliedBefore;
    expect(rise).toBeGreaterThanOrEqual(36);
    expect(rise).toBeLessThanOrEqual(44);

    expect(await balance.horizontalOverflow()).toBeLessThanOrEqual(0);
    expect(session.problems).toEqual([]);
  });

  it("?edit=1 on the bin page is ignored for a helper: no edit form, no edit link", async () => {
    await bin().openByName(hollis, FOUR_TRAY);
    await bin().open(hollis, bin().binId(), "?edit=1&trays=6");
    await bin().heading(FOUR_TRAY).waitFor();
    expect(await session.page.getByRole("form", { name: "Bin", exact: true }).count()).toBe(0);
    expect(await bin().editLink().count()).toBe(0);
  });
});

describe("a grower in two gardens moves 500 worms into the other garden", () => {
  let linden = "";
  let lindenBinId = "";
  const NEW_BIN = "Alley stack";

  it("the owner of Hollis Street, a grower at Linden Row, adds a bin there from a pre-filled link", async () => {
    const session = await signIn(owner);
    try {
      linden = await gardenIdOf(session, neighbourGarden.name);
      const form = new BinFormPage(session.page, baseUrl);
      const today = await session.page.evaluate(() =>
        new Intl.DateTimeFormat("en-CA", { timeZone: "America/Chicago" }).format(new Date()),
      );
      // The second-bin link of the URL contract; a bad repeat of trays and an unknown
      // parameter are ignored.
      await form.openNew(
        linden,
        `?name=${encodeURIComponent(NEW_BIN)}&trays=3&trays=99&startedOn=${today}&worms=1000&kind=single&colour=red`,
      );
      expect(await form.values()).toEqual({
        name: NEW_BIN,
        kind: "single",
        trays: "3",
        startedOn: today,
        worms: "1000",
      });
      // Bad values: every field keeps the form's own start.
      await form.openNew(linden, "?trays=0&worms=-5&kind=tower&startedOn=2026-02-30");
      expect(await form.values()).toMatchObject({ name: "", kind: "stacked-tray", trays: "4" });
      expect((await form.values()).startedOn).toBe(today);
      // Nothing was saved by opening either link.
      await session.page.goto(`${baseUrl}/g/${linden}/bins`);
      expect(await session.page.getByRole("link", { name: NEW_BIN }).count()).toBe(0);

      await form.openNew(
        linden,
        `?name=${encodeURIComponent(NEW_BIN)}&trays=3&startedOn=${today}&worms=1000&kind=single`,
      );
      await form.setInsideSizeIn(16, 12, 6);
      await form.submitNew();
      lindenBinId = new URL(session.page.url()).pathname.split("/")[4]!;
      const bin = new BinPage(session.page, baseUrl);
      await bin.heading(NEW_BIN).waitFor();
      expect(await bin.loggedWorms()).toBe(1000);
      expect(session.problems).toEqual([]);
    } finally {
      await session.close();
    }
  });

  it("Theo, grower at Hollis Street and helper at Linden Row, moves 500 worms; both bins' counts follow", async () => {
    const session = await signIn(grower);
    try {
      const hollis = await gardenIdOf(session, demoGarden.name);
      const source = new BinPage(session.page, baseUrl);
      await source.openByName(hollis, FOUR_TRAY);
      const sourceBefore = await source.loggedWorms();
      await source.moveWorms(500, `${NEW_BIN} (${neighbourGarden.name})`);
      await session.page.reload();
      expect(await source.loggedWorms()).toBe(sourceBefore - 500);
      await session.page
        .getByText(/^500 worms out/)
        .first()
        .waitFor();

      const target = new BinPage(session.page, baseUrl);
      await target.open(linden, lindenBinId);
      await target.heading(NEW_BIN).waitFor();
      expect(await target.loggedWorms()).toBe(1000 + 500);
      await session.page
        .getByText(/^500 worms in/)
        .first()
        .waitFor();
      expect(await target.horizontalOverflow()).toBeLessThanOrEqual(0);
      expect(session.problems).toEqual([]);
    } finally {
      await session.close();
    }
  });

  it("the extra-trays link opens Theo's edit form with the count filled in, and nothing is saved", async () => {
    const session = await signIn(grower);
    try {
      const hollis = await gardenIdOf(session, demoGarden.name);
      const bin = new BinPage(session.page, baseUrl);
      await bin.openByName(hollis, FOUR_TRAY);
      const binId = bin.binId();
      await bin.open(hollis, binId, "?edit=1&trays=6");
      await session.page.waitForURL(/\/edit\?trays=6$/);
      const form = new BinFormPage(session.page, baseUrl);
      await form.hydrated();
      expect((await form.values()).trays).toBe("6");
      await session.page.getByText("6 trays instead of 4").waitFor();
      await bin.open(hollis, binId);
      await session.page
        .getByText(/4 trays|Tray 4/)
        .first()
        .waitFor();
      expect(await session.page.getByText("Tray 5").count()).toBe(0);
    } finally {
      await session.close();
    }
  });
});

describe("the bins, bin and stock pages at 1280 px", () => {
  it("fit the screen (no sideways scroll) and are saved for a look", async () => {
    const session = await signIn(grower, 1280);
    try {
      const hollis = await gardenIdOf(session, demoGarden.name);
      const bin = new BinPage(session.page, baseUrl);
      for (const [name, path] of [
        ["bins", `/g/${hollis}/bins`],
        ["stock", `/g/${hollis}/stock`],
      ] as const) {
        await session.page.goto(`${baseUrl}${path}`);
        await session.page.getByRole("heading", { level: 1 }).waitFor();
        expect(await bin.horizontalOverflow(), name).toBeLessThanOrEqual(0);
        await session.page.screenshot({ path: `${SHOTS}/e2e-${name}-1280.png`, fullPage: true });
      }
      await bin.openByName(hollis, FOUR_TRAY);
      expect(await bin.horizontalOverflow()).toBeLessThanOrEqual(0);
      await session.page.screenshot({ path: `${SHOTS}/e2e-bin-1280.png`, fullPage: true });
      expect(session.problems).toEqual([]);
    } finally {
      await session.close();
    }
  });
});
