import type { Page } from "playwright-core";

export interface NewGarden {
  name: string;
  /** An IANA zone the form offers (typed, with suggestions), e.g. "Europe/London". */
  timeZone: string;
  units: "us" | "metric";
  /** yyyy-mm-dd, the value format of <input type="date">. */
  lastSpringFrost: string;
  firstFallFrost: string;
  location: string;
}

/** /gardens: the signed-in person's list of gardens and the "Start a garden" form. */
export class GardensPage {
  constructor(
    private readonly page: Page,
    private readonly baseUrl: string,
  ) {}

  async open() {
    await this.page.goto(`${this.baseUrl}/gardens`);
  }

  emptyState() {
    return this.page.getByText("No gardens yet", { exact: true });
  }

  startForm() {
    return this.page.getByRole("form", { name: "Start a garden" });
  }

  async startGarden(garden: NewGarden) {
    const form = this.startForm();
    await form.getByLabel("Garden name").fill(garden.name);
    await form.getByLabel("Time zone").fill(garden.timeZone);
    await form.getByLabel("Units").selectOption(garden.units);
    await form.getByLabel("Last spring frost").fill(garden.lastSpringFrost);
    await form.getByLabel("First fall frost").fill(garden.firstFallFrost);
    await form.getByLabel("Where is it?").fill(garden.location);
    await form.getByRole("button", { name: "Start this garden" }).click();
  }
}
