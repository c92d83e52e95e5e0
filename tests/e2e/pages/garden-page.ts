import type { Page } from "playwright-core";

export class GardenPage {
  constructor(private readonly page: Page) {}

  gardenName() {
    return this.page.getByTestId("garden-name");
  }

  nav() {
    return this.page.getByRole("navigation", { name: "Garden sections" });
  }

  async openSection(name: string) {
    await this.nav().getByRole("link", { name }).click();
  }
}
