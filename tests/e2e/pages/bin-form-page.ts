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

/** /g/{gardenId}/bins/new and /bins/{binId}/edit: the bin form, in the garden's units. */
export class BinFormPage {
  constructor(
    private readonly page: Page,
    private readonly baseUrl = "",
  ) {}

  async openNew(gardenId: string, query = "") {
    await this.page.goto(`${this.baseUrl}/g/${gardenId}/bins/new${query}`);
    await this.hydrated();
  }

  /** react-hook-form fills the inputs when it mounts: the tray count is never blank after that. */
  async hydrated() {
    await this.form().waitFor();
    await this.page.waitForFunction(
      () => document.querySelector<HTMLInputElement>('input[name="trayCount"]')?.value !== "",
    );
  }

  form() {
    return this.page.getByRole("form", { name: "Bin", exact: true });
  }

  field(label: string | RegExp) {
    return this.form().getByLabel(label);
  }

  /** What the form shows now, field by field (values as the inputs hold them). */
  async values() {
    return {
      name: await this.field("Name").inputValue(),
      kind: await this.field("Kind").inputValue(),
      trays: await this.field("Trays in the full stack").inputValue(),
      startedOn: await this.field("Started").inputValue(),
      worms: await this.field(/^Starting worms/).inputValue(),
    };
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
    await this.submitNew();
  }

  /** Inside size in inches (the form's US units). */
  async setInsideSizeIn(length: number, width: number, depth: number) {
    await this.form().getByLabel("Inside size").check();
    await this.field("Inside length").fill(String(length));
    await this.field("Inside width").fill(String(width));
    await this.field("Inside depth").fill(String(depth));
  }

  async submitNew() {
    await this.form().getByRole("button", { name: "Add bin" }).click();
    await this.page.waitForURL(/\/bins\/[0-9a-f-]{36}$/);
  }
}
