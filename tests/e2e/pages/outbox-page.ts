import type { Page } from "playwright-core";

/** /dev/outbox: mail caught by the built-in SMTP catcher (demo and local only). */
export class OutboxPage {
  constructor(
    private readonly page: Page,
    private readonly baseUrl: string,
  ) {}

  async open() {
    await this.page.goto(`${this.baseUrl}/dev/outbox`);
  }

  messageTo(email: string) {
    return this.page.getByTestId("outbox-message").filter({ hasText: `To ${email}` });
  }

  /**
   * The invitation link written in the newest message to `email`. The page
   * lists newest first, so `.first()` is the latest one sent.
   */
  async invitationLinkFor(email: string): Promise<string> {
    const message = this.messageTo(email).first();
    await message.waitFor();
    const text = (await message.textContent()) ?? "";
    const match = /https?:\/\/\S+\/invitations\/[A-Za-z0-9_-]+/.exec(text);
    if (!match) throw new Error(`No invitation link in the outbox message to ${email}:\n${text}`);
    return match[0];
  }
}
