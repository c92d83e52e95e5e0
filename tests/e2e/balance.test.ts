import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { demoGarden, demoMembers } from "@/db/seed/demo-garden";
import { openBrowser, type BrowserSession } from "./support/browser";
import { BalancePage } from "./pages/balance-page";
import { GardenPage } from "./pages/garden-page";
import { SignInPage } from "./pages/sign-in-page";

// The Balance in a real browser against the demo garden (db/seed). The months
// below are the demo's: its four-tray stack is harvested in July 2026, and its
// 2027 plantings make May 2027 short of castings.
const baseUrl = inject("baseUrl");
const owner = demoMembers.find((m) => m.role === "owner")!;
const viewer = demoMembers.find((m) => m.role === "viewer")!;
const FROM = "2026-08";
const MONTHS = 12;

async function signInToDemo(session: BrowserSession, who: { email: string; password: string }) {
  const signIn = new SignInPage(session.page, baseUrl);
  await signIn.open();
  await signIn.signIn(who.email, who.password);
  await session.page.waitForURL(`${baseUrl}/gardens`);
  await session.page
    .getByRole("link", { name: new RegExp(demoGarden.name) })
    .first()
    .click();
  await new GardenPage(session.page).gardenName().waitFor();
  return session.page.url().split("/g/")[1]!.split(/[/?]/)[0]!;
}

describe("the Balance as the demo owner", () => {
  let session: BrowserSession;
  let balance: BalancePage;
  let gardenId: string;
  beforeAll(async () => {
    session = await openBrowser({ width: 1280, height: 900 });
    gardenId = await signInToDemo(session, owner);
    balance = new BalancePage(session.page, baseUrl);
    await balance.open(gardenId, FROM, MONTHS);
  });
  afterAll(async () => {
    await session.close();
  });

  it("carries the July harvest into August: August opens with castings on the shelf", async () => {
    expect(await balance.months()).toHaveLength(MONTHS);
    expect(await balance.figure("2026-08", "castings", "opening")).toBeGreaterThan(0);
  });

  it("downloads a CSV whose rows match the table", async () => {
    const href = await balance.csvLink().getAttribute("href");
    expect(href).toContain("format=csv");
    const text = await session.page.evaluate(async (url) => (await fetch(url!)).text(), href);
    const [header, ...lines] = Papa.parse<string[]>(text, { skipEmptyLines: true }).data;
    expect(lines.map((l) => l[0])).toEqual(await balance.months());
    const col = (title: string) => header!.findIndex((h) => h.startsWith(title));
    for (const line of lines) {
      const month = line[0]!;
      expect(Number(line[col("Castings opening")])).toBe(
        await balance.figure(month, "castings", "opening"),
      );
      expect(Number(line[col("Castings harvested")])).toBe(
        await balance.figure(month, "castings", "supplied"),
      );
      expect(Number(line[col("Castings demand")])).toBe(
        await balance.figure(month, "castings", "demand"),
      );
      expect(Number(line[col("Castings closing")])).toBe(
        await balance.figure(month, "castings", "closing"),
      );
      expect(Number(line[col("Leachate closing")])).toBe(
        await balance.figure(month, "leachate", "closing"),
      );
    }
  });

  it("applying the extra-tray suggestion in what-if removes the shortfall, and nothing is saved", async () => {
    await balance.suggestion("extra-trays").waitFor();
    await balance.trySuggestion("extra-trays");
    const summary = await balance.whatIfSummary().innerText();
    // "today N lb, with the changes 0 lb": today is short, the change closes it.
    const [, today, changed] =
      /today ([\d.,]+) \S+, with the changes ([\d.,]+) /.exec(summary) ?? [];
    expect(Number(today)).toBeGreaterThan(0);
    expect(Number(changed)).toBe(0);
    await expect(session.page.getByText("Nothing here is saved").isVisible()).resolves.toBe(true);
    // The balance itself is unchanged after the what-if.
    await balance.open(gardenId, FROM, MONTHS);
    await balance.suggestion("extra-trays").waitFor();
    expect(session.problems).toEqual([]);
  });

  it("fits a 375 px phone without sideways scrolling", async () => {
    await session.page.setViewportSize({ width: 375, height: 800 });
    await balance.open(gardenId, FROM, MONTHS);
    expect(await balance.horizontalOverflow()).toBeLessThanOrEqual(0);
  });
});

describe("the Balance as the demo viewer", () => {
  let session: BrowserSession;
  beforeAll(async () => {
    session = await openBrowser({ width: 375, height: 800 });
  });
  afterAll(async () => {
    await session.close();
  });

  it("shows the same months and what-if, with no control that changes the garden", async () => {
    const gardenId = await signInToDemo(session, viewer);
    const balance = new BalancePage(session.page, baseUrl);
    await balance.open(gardenId, FROM, MONTHS);
    expect(await balance.months()).toHaveLength(MONTHS);
    await expect(session.page.getByText("Nothing here is saved").isVisible()).resolves.toBe(true);
    const labels = await session.page
      .locator("main")
      .locator("button, a, input[type=submit]")
      .evaluateAll((els) => els.map((e) => (e.textContent ?? "").trim()));
    // Every control on the page either reads, sorts, explains or tries a what-if.
    const changing = labels.filter((l) =>
      /^(save|delete|remove member|edit|log|record|add (a )?(bed|bin|planting))/i.test(l),
    );
    expect(changing).toEqual([]);
    expect(
      await (
        await new GardenPage(session.page).nav()
      )
        .getByRole("link", { name: "Settings" })
        .count(),
    ).toBe(0);
    expect(await balance.horizontalOverflow()).toBeLessThanOrEqual(0);
    expect(session.problems).toEqual([]);
  });
});
