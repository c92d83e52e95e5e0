import type { Page } from "playwright-core";

export interface NewGarden {
  name: string;
  /** An IANA zone the form offers (typed, with suggestions), e.g. "Europe/London". */
  timeZone: string;
  units: "us" | "metric";
  /** The usual frost days, "MM-DD" (a full "yyyy-mm-dd" keeps its month and day). */
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
    await this.pickMonthDay("Last spring frost", garden.lastSpringFrost);
    await this.pickMonthDay("First fall frost", garden.firstFallFrost);
    await form.getByLabel("Where is it?").fill(garden.location);
    await form.getByRole("button", { name: "Start this garden" }).click();
  }

  /** Frost days are a month and a day select inside a group named by the field. */
  private async pickMonthDay(field: string, value: string) {
    const [month, day] = value.slice(-5).split("-").map(Number) as [number, number];
    const group = this.startForm().getByRole("group", { name: field });
    await group.getByLabel("Month").selectOption(String(month));
    await group.getByLabel("Day").selectOption(String(day));
  }
}
