import type { Page } from "playwright-core";

export type InviteRole = "Owner" | "Grower" | "Helper" | "Viewer";

/** /g/<id>/members: the member list and, for owners, invitations. */
export class MembersPage {
  constructor(private readonly page: Page) {}

  heading() {
    return this.page.getByRole("heading", { name: "Members", level: 1 });
  }

  inviteForm() {
    return this.page.getByRole("form", { name: "Invite someone" });
  }

  roleOptions() {
    return this.inviteForm()
      .getByLabel("Role")
      .evaluate((el: HTMLSelectElement) => Array.from(el.options, (o) => o.textContent ?? ""));
  }

  async invite(email: string, role: InviteRole) {
    const form = this.inviteForm();
    await form.getByLabel("Their e-mail").fill(email);
    await form.getByLabel("Role").selectOption({ label: role });
    await form.getByRole("button", { name: "Send invitation" }).click();
  }

  /** The live region every toast is rendered into. */
  toasts() {
    return this.page.getByRole("status", { name: "Notifications" });
  }

  /** The card titled "Open invitations" (its list, or its empty state). */
  openInvitations() {
    // Cards are <section>s; pick the one whose title is "Open invitations".
    return this.page
      .locator("section")
      .filter({ has: this.page.getByRole("heading", { name: "Open invitations", exact: true }) });
  }

  openInvitationRow(email: string) {
    return this.openInvitations().getByRole("listitem").filter({ hasText: email });
  }
}
