import type { Page } from "playwright-core";
import { AppShell } from "./app-shell";

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

  /** The garden's sections, with the phone menu opened first when that is where they are. */
  async nav() {
    return new AppShell(this.page).sectionsNav();
  }

  async openSection(name: string) {
    await new AppShell(this.page).openSection(name);
  }
}
