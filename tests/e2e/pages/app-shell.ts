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

  /**
   * The garden's sections as a person reaches them at this width: the tab bar on a wide
   * screen, or the header's menu on a phone (opened here if it is closed).
   */
  async sectionsNav() {
    const nav = this.page.getByRole("navigation", { name: "Garden sections" });
    if (!(await nav.isVisible())) await this.menuButton().click();
    await nav.waitFor();
    return nav;
  }

  /** Opens a garden section ("Beds", "Settings"…) the way a person would at this width. */
  async openSection(name: string) {
    await (await this.sectionsNav()).getByRole("link", { name, exact: true }).click();
  }
}
