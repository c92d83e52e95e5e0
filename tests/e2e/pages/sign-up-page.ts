import type { Page } from "playwright-core";

export interface NewAccount {
  name: string;
  email: string;
  password: string;
}

export class SignUpPage {
  constructor(
    private readonly page: Page,
    private readonly baseUrl: string,
  ) {}

  async open(next?: string) {
    await this.page.goto(
      `${this.baseUrl}/sign-up${next ? `?next=${encodeURIComponent(next)}` : ""}`,
    );
  }

  form() {
    return this.page.getByRole("form", { name: "Make an account" });
  }

  async signUp(account: NewAccount) {
    const form = this.form();
    await form.getByLabel("Your name").fill(account.name);
    await form.getByLabel("E-mail").fill(account.email);
    await form.getByLabel("Password", { exact: true }).fill(account.password);
    await form.getByRole("button", { name: "Make my account" }).click();
  }
}
