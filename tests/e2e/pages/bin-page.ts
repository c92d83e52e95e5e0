import type { Page } from "playwright-core";

/** /g/{gardenId}/bins/{binId}: trays, forecast, the log form (helpers and up) and the log. */
export class BinPage {
  constructor(
    private readonly page: Page,
    private readonly baseUrl: string,
  ) {}

  async open(gardenId: string, binId: string, query = "") {
    await this.page.goto(`${this.baseUrl}/g/${gardenId}/bins/${binId}${query}`);
  }

  async openByName(gardenId: string, name: string) {
    await this.page.goto(`${this.baseUrl}/g/${gardenId}/bins`);
    await this.page.getByRole("link", { name, exact: true }).click();
    await this.heading(name).waitFor();
  }

  heading(name: string) {
    return this.page.getByRole("heading", { level: 1, name });
  }

  /** The bin's id from the address bar. */
  binId(): string {
    return new URL(this.page.url()).pathname.split("/")[4]!;
  }

  /** A figure of the Forecast card by its term ("Next harvest", "Calibration", …). */
  async summary(term: string): Promise<string> {
    const dd = this.page.locator(`dt:text-is("${term}") + dd`);
    return (await dd.innerText()).trim();
  }

  async loggedWorms(): Promise<number> {
    return Number((await this.page.getByTestId("logged-worms").innerText()).replace(/,/g, ""));
  }

  logForm() {
    return this.page.getByRole("form", { name: "Log bin work" });
  }

  /** The "On" date the log form starts with: today in the garden's time zone. */
  async today(): Promise<string> {
    return this.logForm().getByLabel("On", { exact: true }).inputValue();
  }

  async logHarvestLb(pounds: number) {
    const form = this.logForm();
    await form.getByLabel("What happened").selectOption("tray-harvested");
    await form.getByLabel("Castings (lb)").fill(String(pounds));
    await form.getByRole("button", { name: "Log it" }).click();
    await this.photoInput().waitFor();
  }

  photoInput() {
    return this.logForm().getByLabel(/Add a photo of this harvest/);
  }

  async attachPhoto(name: string, jpeg: Buffer) {
    await this.photoInput().setInputFiles({ name, mimeType: "image/jpeg", buffer: jpeg });
    await this.logForm().getByRole("button", { name: "Upload photo" }).click();
    await this.page.getByText("Photo added to the harvest.").waitFor();
  }

  /** The log's photos, each as the browser decoded it (0 × 0 when it did not load). */
  async logPhotoSizes(): Promise<{ alt: string; width: number; height: number }[]> {
    const photos = this.page.locator('ol img[alt^="Photo"]');
    await photos.first().waitFor();
    return photos.evaluateAll((imgs) =>
      (imgs as HTMLImageElement[]).map((img) => ({
        alt: img.alt,
        width: img.naturalWidth,
        height: img.naturalHeight,
      })),
    );
  }

  async moveWorms(count: number, toLabel: string) {
    const form = this.logForm();
    await form.getByLabel("What happened").selectOption("worms-moved");
    await form.getByLabel("Worms (count)").fill(String(count));
    await form.getByLabel("To", { exact: true }).selectOption({ label: toLabel });
    await form.getByRole("button", { name: "Log it" }).click();
    await this.page.getByText("Worms moved: logged.").first().waitFor();
  }

  editLink() {
    return this.page.getByRole("link", { name: "Edit bin" });
  }

  async horizontalOverflow(): Promise<number> {
    return this.page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
  }
}
