import type { Page } from "playwright-core";

export class GardenPage {
  constructor(private readonly page: Page) {}

  gardenName() {
    return this.page.getByTestId("garden-name");
  }

  /** The overview's header: the garden's name, the member's role badge, the season. */
  overviewHeader() {
    return this.page.locator("header", { has: this.gardenName() });
  }

  roleBadge(role: string) {
    return this.overviewHeader().getByText(role, { exact: true });
  }

  nav() {
    return this.page.getByRole("navigation", { name: "Garden sections" });
  }

  async openSection(name: string) {
    await this.nav().getByRole("link", { name }).click();
  }
}
