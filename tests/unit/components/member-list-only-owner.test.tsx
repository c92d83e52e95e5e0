import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render, screen, within } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { MemberList } from "@/components/members/member-list";
import { ToastProvider } from "@/components/ui";

vi.mock("next/navigation", () => ({ useRouter: () => ({ replace: vi.fn(), refresh: vi.fn() }) }));

// Issue 12 item 5: the server refuses to leave a garden without an owner (409
// conflict:last_owner); the list must not offer what will be refused.
const me = {
  userId: "u-owner",
  name: "Ada Owner",
  email: "ada@example.test",
  role: "owner" as const,
};
const grower = {
  userId: "u-grower",
  name: "Ben Grower",
  email: "ben@example.test",
  role: "grower" as const,
};

function renderList(members: (typeof me | typeof grower)[], meId = me.userId) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return render(
    <QueryClientProvider client={client}>
      <ToastProvider>
        <MemberList
          gardenId="00000000-0000-4000-8000-000000000001"
          gardenName="Bo’s Plot"
          meId={meId}
          canManage
          initial={members}
        />
      </ToastProvider>
    </QueryClientProvider>,
  );
}

function rowOf(name: string) {
  return screen.getByText(name).closest("li")!;
}

describe("MemberList for the only owner", () => {
  it("disables Leave and the own role, and says why next to them", () => {
    renderList([me, grower]);
    const mine = within(rowOf("Ada Owner"));
    const leave = mine.getByRole("button", { name: "Leave" });
    const role = mine.getByRole("combobox", { name: "Role of Ada Owner" });
    expect(leave).toBeDisabled();
    expect(role).toBeDisabled();
    // The reason is tied to both controls, so a screen reader hears it too.
    const reason = mine.getByText(/only owner/i);
    expect(leave.getAttribute("aria-describedby")).toContain(reason.id);
    expect(role.getAttribute("aria-describedby")).toContain(reason.id);
    // Others stay manageable.
    const theirs = within(rowOf("Ben Grower"));
    expect(theirs.getByRole("button", { name: "Remove" })).toBeEnabled();
    expect(theirs.getByRole("combobox", { name: "Role of Ben Grower" })).toBeEnabled();
  });

  it("keeps Leave and the own role open when a second owner exists", () => {
    renderList([me, { ...grower, role: "owner" as never }]);
    const mine = within(rowOf("Ada Owner"));
    expect(mine.getByRole("button", { name: "Leave" })).toBeEnabled();
    expect(mine.getByRole("combobox", { name: "Role of Ada Owner" })).toBeEnabled();
    expect(mine.queryByText(/only owner/i)).toBeNull();
  });
});
