import type { Page } from "playwright-core";
import { AppShell } from "./app-shell";

/** /g/{gardenId}/beds: the list, its filters and the create form. */
export class BedsPage {
  constructor(private readonly page: Page) {}

  async openFromNav() {
    await new AppShell(this.page).openSection("Beds");
    await this.page.getByRole("heading", { name: "Beds and containers", exact: true }).waitFor();
  }

  createForm() {
    return this.page.getByRole("form", { name: "Add a bed or container" });
  }

  /** A bed in the garden's own units (US: feet). */
  async addBed(name: string, lengthFt: number, widthFt: number) {
    const form = this.createForm();
    await form.locator('input[name="name"]').fill(name);
    await form.locator('input[name="length.value"]').fill(String(lengthFt));
    await form.locator('input[name="width.value"]').fill(String(widthFt));
    await form.getByRole("button", { name: "Add bed" }).click();
    await this.page.waitForURL(/\/beds\/[0-9a-f-]{36}$/);
  }
}
