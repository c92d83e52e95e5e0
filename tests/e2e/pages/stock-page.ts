import type { Page } from "playwright-core";

/** /g/{gardenId}/stock: the lots on the shelf, newest first. */
export class StockPage {
  constructor(
    private readonly page: Page,
    private readonly baseUrl: string,
  ) {}

  async open(gardenId: string) {
    await this.page.goto(`${this.baseUrl}/g/${gardenId}/stock`);
    await this.page.getByRole("heading", { level: 1, name: "Stock" }).waitFor();
  }

  /** Each lot's text as shown, e.g. "40 lb castings Fresh From Wooden four-tray stack, Dec 2, 2026 · …". */
  async lots(): Promise<string[]> {
    return this.page
      .getByTestId("stock-lot")
      .evaluateAll((items) => items.map((i) => (i as HTMLElement).innerText.replace(/\s+/g, " ")));
  }
}
