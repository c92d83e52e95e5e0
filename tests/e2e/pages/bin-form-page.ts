import type { Page } from "playwright-core";

export interface NewBin {
  name: string;
  trays: number;
  /** yyyy-mm-dd */
  startedOn: string;
  /** Outside length and width in the garden's tray-side unit (US: inches). */
  outsideLength: number;
  outsideWidth: number;
  worms: number;
}

/** /g/{gardenId}/bins/new: the bin form. */
export class BinFormPage {
  constructor(private readonly page: Page) {}

  form() {
    return this.page.getByRole("form", { name: "Bin" });
  }

  async addBin(bin: NewBin) {
    const form = this.form();
    await form.getByLabel("Name").fill(bin.name);
    await form.getByLabel("Trays in the full stack").fill(String(bin.trays));
    await form.getByLabel("Started").fill(bin.startedOn);
    await form.getByLabel("Outside size + board").check();
    await form.getByLabel("Outside length").fill(String(bin.outsideLength));
    await form.getByLabel("Outside width").fill(String(bin.outsideWidth));
    await form.getByLabel("Worms given as").selectOption("count");
    await form.getByLabel(/Starting worms/).fill(String(bin.worms));
    await form.getByRole("button", { name: "Add bin" }).click();
    await this.page.waitForURL(/\/bins\/[0-9a-f-]{36}$/);
  }
}
