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
   * The invitation link in the newest message to `email` that carries one. The page
   * lists newest first; a welcome mail sent at sign-up may be newer than the invitation.
   */
  async invitationLinkFor(email: string): Promise<string> {
    const messages = this.messageTo(email);
    await messages.first().waitFor();
    const texts = await messages.allTextContents();
    for (const text of texts) {
      const match = /https?:\/\/\S+\/invitations\/[A-Za-z0-9_-]+/.exec(text);
      if (match) return match[0];
    }
    throw new Error(
      `No invitation link in the outbox messages to ${email}:\n${texts.join("\n--\n")}`,
    );
  }
}
