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

  /**
   * Waits for mail to `email`, reloading: the page is rendered on the server and mail
   * sent after a response (the welcome mail) may land a moment after it is opened.
   */
  async waitForMessageTo(email: string, timeoutMs = 20_000) {
    const deadline = Date.now() + timeoutMs;
    for (;;) {
      if ((await this.messageTo(email).count()) > 0) return this.messageTo(email).first();
      if (Date.now() > deadline) throw new Error(`No mail to ${email} in the outbox`);
      await new Promise((r) => setTimeout(r, 500));
      await this.page.reload();
    }
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
