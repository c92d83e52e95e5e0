import type { Page } from "playwright-core";

export class SignInPage {
  constructor(
    private readonly page: Page,
    private readonly baseUrl: string,
  ) {}

  async open(next?: string) {
    await this.page.goto(
      `${this.baseUrl}/sign-in${next ? `?next=${encodeURIComponent(next)}` : ""}`,
    );
  }

  async signIn(email: string, password: string) {
    await this.page.getByLabel("E-mail").fill(email);
    await this.page.getByLabel("Password", { exact: true }).fill(password);
    await this.page.getByRole("button", { name: "Sign in" }).click();
  }
}
