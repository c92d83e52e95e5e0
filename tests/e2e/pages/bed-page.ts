import type { Page } from "playwright-core";

/** /g/{gardenId}/beds/{bedId}: plantings, quick entry, rule editor, 12-month demand. */
export class BedPage {
  constructor(private readonly page: Page) {}

  async quickAdd(text: string) {
    const form = this.page.getByRole("form", { name: "Add plants" });
    await form.getByLabel(/What did you plant/).fill(text);
    await form.getByRole("button", { name: "Add plants" }).click();
  }

  planting(title: RegExp) {
    return this.page
      .getByRole("listitem")
      .filter({ has: this.page.getByRole("heading", { name: title }) });
  }

  /** Opens the planting's feedings, turns its one rule into tea per plant on a raw RRULE, and saves. */
  async overrideWithTea(title: RegExp, flOz: number, rrule: string) {
    const item = this.planting(title);
    await item.getByRole("button", { name: "Change feedings" }).click();
    const form = item.getByRole("form", { name: "Change feedings" });
    await form.getByRole("button", { name: "Edit feeding 1" }).click();
    await form.getByLabel("Material").selectOption("tea");
    await form.getByLabel("Method").selectOption("drench");
    await form.locator('input[name="rules.0.amount.value"]').fill(String(flOz));
    await form.getByLabel("Amount: unit").selectOption("fl-oz");
    await form.getByRole("button", { name: "Type an RRULE instead" }).click();
    await form.getByLabel(/RRULE/).fill(rrule);
    await form.getByRole("button", { name: "Save feedings" }).click();
  }

  demandTable() {
    return this.page.getByRole("region", { name: /Demand per planting/ });
  }
}
