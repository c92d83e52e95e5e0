import type { Page } from "playwright-core";

/** /invitations/<token>: what someone sees after following an invitation link. */
export class InvitationPage {
  constructor(private readonly page: Page) {}

  async open(link: string) {
    await this.page.goto(link);
  }

  heading() {
    return this.page.getByRole("heading", { level: 1 });
  }

  makeAccountLink() {
    return this.page.getByRole("link", { name: "Make an account to join" });
  }

  joinButton(gardenName: string) {
    return this.page.getByRole("button", { name: `Join ${gardenName}` });
  }

  /** The note shown instead of the join card when the link cannot be used. */
  problem() {
    return this.page.getByRole("note");
  }
}
