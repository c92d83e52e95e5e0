import type { Page } from "playwright-core";

/** /g/{gardenId}/bins/new and /bins/{binId}/edit: the bin form, in the garden's units. */
export class BinFormPage {
  constructor(
    private readonly page: Page,
    private readonly baseUrl: string,
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
