import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { fireEvent, render, screen, waitFor } from "@testing-library/react";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { LogEntryForm } from "@/components/bins/log-entry-form";
import { ToastProvider } from "@/components/ui";

vi.mock("next/navigation", () => ({ useRouter: () => ({ refresh: vi.fn(), push: vi.fn() }) }));

// The helper's log form sends what was typed, in SI. Regression: every kind
// crashed before sending (the hidden temperature field was read as a string
// while unmounted), so nothing could be logged from the bin page.
const LB = 0.45359237; // kg, NIST Handbook 44 Appendix C

let sent: { url: string; body: Record<string, unknown> }[] = [];
beforeEach(() => {
  sent = [];
  vi.stubGlobal(
    "fetch",
    vi.fn(async (url: string, init: RequestInit) => {
      sent.push({ url, body: JSON.parse(String(init.body)) });
      return new Response(JSON.stringify({ eventId: "e1", warnings: [] }), { status: 201 });
    }),
  );
});
afterEach(() => vi.unstubAllGlobals());

function renderForm() {
  render(
    <QueryClientProvider client={new QueryClient()}>
      <ToastProvider>
        <LogEntryForm gardenId="g1" binId="b1" system="us" today="2026-12-02" targets={[]} />
      </ToastProvider>
    </QueryClientProvider>,
  );
}

describe("LogEntryForm", () => {
  it("logs a 40 lb tray harvest as 18.14 kg", async () => {
    renderForm();
    fireEvent.change(screen.getByLabelText("What happened"), {
      target: { value: "tray-harvested" },
    });
    fireEvent.change(await screen.findByLabelText("Castings (lb)"), { target: { value: "40" } });
    fireEvent.click(screen.getByRole("button", { name: "Log it" }));
    await waitFor(() => expect(sent).toHaveLength(1));
    expect(sent[0]!.url).toBe("/api/gardens/g1/bins/b1/events");
    expect(sent[0]!.body).toMatchObject({ kind: "tray-harvested", on: "2026-12-02" });
    expect(sent[0]!.body.castingsKg as number).toBeCloseTo(40 * LB, 9);
  });

  it("logs food added with what went in", async () => {
    renderForm();
    fireEvent.change(screen.getByLabelText("Food (lb)"), { target: { value: "2" } });
    fireEvent.click(screen.getByLabelText("coffee grounds"));
    fireEvent.click(screen.getByRole("button", { name: "Log it" }));
    await waitFor(() => expect(sent).toHaveLength(1));
    expect(sent[0]!.body).toMatchObject({ kind: "food-added", foods: ["coffee grounds"] });
    expect(sent[0]!.body.foodKg as number).toBeCloseTo(2 * LB, 9);
  });
});
