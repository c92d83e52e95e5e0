import type { Page } from "playwright-core";

/**
 * The signed-in header: garden switcher, and a menu button that opens the garden's
 * sections and the account links. On a wide screen the sections may also show inline.
 */
export class AppShell {
  constructor(private readonly page: Page) {}

  async headerHeight(): Promise<number> {
    const box = await this.page.getByRole("banner").boundingBox();
    if (!box) throw new Error("no header (role banner) on the page");
    return box.height;
  }

  menuButton() {
    return this.page.getByRole("banner").getByRole("button", { name: "Menu" });
  }

  /** Opens a garden section ("Beds", "Settings"…) the way a person would at this width. */
  async openSection(name: string) {
    const nav = this.page.getByRole("navigation", { name: "Garden sections" });
    const link = nav.getByRole("link", { name, exact: true });
    if (!(await link.isVisible())) await this.menuButton().click();
    await link.click();
  }
}
