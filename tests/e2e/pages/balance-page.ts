import type { Page } from "playwright-core";

/** The Balance screen: month table, CSV link, gap suggestions and the what-if panel. */
export class BalancePage {
  constructor(
    private readonly page: Page,
    private readonly baseUrl: string,
  ) {}

  async open(gardenId: string, from: string, months: number) {
    await this.page.goto(`${this.baseUrl}/g/${gardenId}/balance?from=${from}&months=${months}`);
    await this.table().waitFor({ timeout: 30_000 });
  }

  table() {
    return this.page.getByTestId("balance-table");
  }

  row(month: string, pool: "castings" | "leachate") {
    return this.table().locator(`tr[data-month="${month}"][data-pool="${pool}"]`);
  }

  /** A figure as shown, e.g. "18 lb" → 18 (the screen-reader suffix left out). */
  async figure(month: string, pool: "castings" | "leachate", column: string): Promise<number> {
    const text = await this.row(month, pool)
      .locator(`[data-col="${column}"] [data-figure]`)
      .innerText();
    return Number(text.replace(/,/g, "").split(" ")[0]);
  }

  async months(): Promise<string[]> {
    return this.table()
      .locator('tr[data-pool="castings"]')
      .evaluateAll((rows) => rows.map((r) => r.getAttribute("data-month") ?? ""));
  }

  csvLink() {
    return this.page.getByTestId("balance-csv");
  }

  suggestion(kind: string) {
    return this.page.getByTestId(`suggestion-${kind}`);
  }

  async trySuggestion(kind: string) {
    await this.suggestion(kind).getByRole("button", { name: "Try it in what-if" }).click();
    await this.page.getByTestId("what-if-result").waitFor({ timeout: 30_000 });
  }

  whatIfSummary() {
    return this.page.getByTestId("what-if-summary");
  }

  async horizontalOverflow(): Promise<number> {
    return this.page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
  }
}
