import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { fireEvent, render, screen, within } from "@testing-library/react";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { BinLog, type LogEntry } from "@/components/bins/bin-log";

vi.mock("next/navigation", () => ({
  useRouter: () => ({ replace: vi.fn() }),
  usePathname: () => "/g/g1/bins/b1",
  useSearchParams: () => new URLSearchParams(),
}));

// A bin with 40 logged drains: the page shows a screenful (15) and offers the rest in
// steps, so on a phone the cautions below the log stay within reach.
function drain(i: number, loggedBy: string | null): LogEntry {
  return {
    id: `e${i}`,
    kind: "liquid-drained",
    on: `2026-${i < 30 ? "09" : "08"}-${String(30 - (i % 30)).padStart(2, "0")}`,
    foodKg: null,
    foods: [],
    castingsL: null,
    castingsKg: null,
    liquidL: 0.4,
    temperatureC: null,
    moisturePercent: null,
    wormCount: null,
    direction: null,
    otherBin: null,
    note: null,
    photoIds: [],
    loggedBy,
    loggedAt: "2026-09-01T12:00:00Z",
  };
}

beforeEach(() => {
  const entries = Array.from({ length: 40 }, (_, i) => drain(i, i < 20 ? "Priya Ramos" : null));
  vi.stubGlobal(
    "fetch",
    vi.fn(async () => new Response(JSON.stringify({ entries }), { status: 200 })),
  );
});
afterEach(() => vi.unstubAllGlobals());

describe("BinLog", () => {
  it("shows 15 entries, then 15 more, then the last 10", async () => {
    const { container } = render(
      <QueryClientProvider client={new QueryClient()}>
        <BinLog gardenId="g1" binId="b1" system="metric" />
      </QueryClientProvider>,
    );
    const more = await screen.findByRole("button", { name: "Show 15 more of 25 older" });
    const list = container.querySelector("ol")!;
    expect(within(list).getAllByRole("listitem")).toHaveLength(15);
    fireEvent.click(more);
    expect(within(list).getAllByRole("listitem")).toHaveLength(30);
    fireEvent.click(screen.getByRole("button", { name: "Show 10 more of 10 older" }));
    expect(within(list).getAllByRole("listitem")).toHaveLength(40);
    expect(screen.queryByRole("button", { name: /more of/ })).toBeNull();
  });

  it("names the logger where known and explains the unnamed entries once", async () => {
    render(
      <QueryClientProvider client={new QueryClient()}>
        <BinLog gardenId="g1" binId="b1" system="metric" />
      </QueryClientProvider>,
    );
    await screen.findByRole("button", { name: /more of/ });
    expect(screen.getAllByText("Logged by Priya Ramos")).toHaveLength(15);
    expect(screen.queryByText(/imported file/)).toBeNull(); // the first 15 all have a name
    fireEvent.click(screen.getByRole("button", { name: /more of/ }));
    expect(screen.getAllByText(/imported file/)).toHaveLength(1);
  });
});
