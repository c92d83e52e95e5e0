import type { Page } from "playwright-core";

/** /g/{gardenId}/settings (owners): the garden's settings form. */
export class SettingsPage {
  constructor(private readonly page: Page) {}

  form() {
    return this.page.getByRole("form", { name: "Garden settings" });
  }

  async switchUnits(units: "us" | "metric") {
    await this.form().getByLabel("Units").selectOption(units);
    await this.form().getByRole("button", { name: "Save settings" }).click();
    await this.page
      .getByRole("status", { name: "Notifications" })
      .getByText("Settings saved.")
      .waitFor();
  }
}
