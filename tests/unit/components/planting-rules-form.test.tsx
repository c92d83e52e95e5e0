import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { fireEvent, render, screen, waitFor, within } from "@testing-library/react";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { PlantingRulesForm, type RuleItem } from "@/components/plantings/planting-rules-form";

vi.mock("next/navigation", () => ({ useRouter: () => ({ refresh: vi.fn(), push: vi.fn() }) }));

// The bed page's feedings form: several rules per planting, saved as `rules: [...]`
// so adding or editing one never drops another. Recurrences are RFC 5545 RRULEs:
// "FREQ=WEEKLY;INTERVAL=2" is every second week (RFC 5545 §3.3.10, INTERVAL).

const CASTINGS_MONTHLY: RuleItem = {
  words: "1 cup castings per plant, top-dressed, every month",
  values: {
    material: "castings",
    method: "top-dress",
    basis: "per-plant",
    amount: { value: 1, unit: "cup" },
    recurrence: "FREQ=MONTHLY",
  },
};
const TEA_FORTNIGHTLY: RuleItem = {
  words: "2 cups worm tea per plant, as a soil drench, every 2 weeks",
  values: {
    material: "tea",
    method: "drench",
    basis: "per-plant",
    amount: { value: 2, unit: "cup" },
    recurrence: "FREQ=WEEKLY;INTERVAL=2",
  },
};

let sent: { url: string; method?: string; body: { rules?: unknown[]; rule?: unknown } }[] = [];
let reply: () => Response;
beforeEach(() => {
  sent = [];
  reply = () => new Response(JSON.stringify({ planting: {} }), { status: 200 });
  vi.stubGlobal(
    "fetch",
    vi.fn(async (url: string, init: RequestInit) => {
      sent.push({ url, method: init.method, body: JSON.parse(String(init.body)) });
      return reply();
    }),
  );
});
afterEach(() => vi.unstubAllGlobals());

function renderForm(initial: RuleItem[]) {
  const onDone = vi.fn();
  render(
    <QueryClientProvider client={new QueryClient()}>
      <PlantingRulesForm
        gardenId="g1"
        saveUrl="/api/gardens/g1/plantings/p1"
        plantedOn="2026-04-01"
        today="2026-12-02"
        unitSystem="us"
        initial={initial}
        onDone={onDone}
      />
    </QueryClientProvider>,
  );
  return { onDone };
}

const feeding = (n: number) => screen.getByRole("listitem", { name: `Feeding ${n}` });

describe("PlantingRulesForm", () => {
  it("lists each rule in plain words until it is opened", () => {
    renderForm([CASTINGS_MONTHLY, TEA_FORTNIGHTLY]);
    expect(within(feeding(1)).getByText(CASTINGS_MONTHLY.words!)).toBeInTheDocument();
    expect(within(feeding(2)).getByText(TEA_FORTNIGHTLY.words!)).toBeInTheDocument();
    expect(screen.queryByLabelText("Material")).toBeNull();
  });

  it("adds tea every two weeks beside castings monthly and sends both rules", async () => {
    const { onDone } = renderForm([CASTINGS_MONTHLY]);
    fireEvent.click(screen.getByRole("button", { name: "Add a feeding" }));
    const second = feeding(2);
    fireEvent.change(within(second).getByLabelText("Material"), { target: { value: "tea" } });
    fireEvent.change(within(second).getByLabelText("Method"), { target: { value: "drench" } });
    fireEvent.change(within(second).getByLabelText("Amount"), { target: { value: "2" } });
    fireEvent.change(within(second).getByLabelText("Unit"), { target: { value: "weeks" } });
    fireEvent.change(within(second).getByLabelText("Every"), { target: { value: "2" } });
    fireEvent.click(screen.getByRole("button", { name: "Save feedings" }));
    await waitFor(() => expect(sent).toHaveLength(1));
    expect(sent[0]!.url).toBe("/api/gardens/g1/plantings/p1");
    expect(sent[0]!.method).toBe("PATCH");
    expect(sent[0]!.body.rule).toBeUndefined();
    expect(sent[0]!.body.rules).toEqual([CASTINGS_MONTHLY.values, TEA_FORTNIGHTLY.values]);
    await waitFor(() => expect(onDone).toHaveBeenCalled());
  });

  it("edits rule 2 and keeps rule 1 as it was", async () => {
    renderForm([CASTINGS_MONTHLY, TEA_FORTNIGHTLY]);
    fireEvent.click(within(feeding(2)).getByRole("button", { name: "Edit feeding 2" }));
    // Opening puts the keyboard on the rule's first field.
    expect(within(feeding(2)).getByLabelText("Material")).toHaveFocus();
    fireEvent.change(within(feeding(2)).getByLabelText("Amount"), { target: { value: "3" } });
    fireEvent.click(screen.getByRole("button", { name: "Save feedings" }));
    await waitFor(() => expect(sent).toHaveLength(1));
    expect(sent[0]!.body.rules).toEqual([
      CASTINGS_MONTHLY.values,
      { ...TEA_FORTNIGHTLY.values, amount: { value: 3, unit: "cup" } },
    ]);
  });

  it("removes a rule, and undo brings it back before saving", async () => {
    renderForm([CASTINGS_MONTHLY, TEA_FORTNIGHTLY]);
    fireEvent.click(within(feeding(1)).getByRole("button", { name: "Remove feeding 1" }));
    expect(screen.getAllByRole("listitem")).toHaveLength(1);
    fireEvent.click(screen.getByRole("button", { name: "Undo remove" }));
    expect(screen.getAllByRole("listitem")).toHaveLength(2);
    fireEvent.click(screen.getByRole("button", { name: "Save feedings" }));
    await waitFor(() => expect(sent).toHaveLength(1));
    expect(sent[0]!.body.rules).toEqual([CASTINGS_MONTHLY.values, TEA_FORTNIGHTLY.values]);
  });

  it("shows the server's rules.1.recurrence error on the second rule's fields", async () => {
    reply = () =>
      new Response(
        JSON.stringify({
          error: {
            code: "validation_failed",
            message: "Check the highlighted fields.",
            fields: { "rules.1.recurrence": "No feeding date falls in the planting's season." },
          },
        }),
        { status: 400 },
      );
    renderForm([CASTINGS_MONTHLY, TEA_FORTNIGHTLY]);
    fireEvent.click(screen.getByRole("button", { name: "Save feedings" }));
    const message = await within(feeding(2)).findByText(
      "No feeding date falls in the planting's season.",
    );
    expect(message).toBeInTheDocument();
    expect(within(feeding(2)).getByLabelText("Every")).toHaveAccessibleDescription(
      "No feeding date falls in the planting's season.",
    );
    // Rule 1 stays in words: the error is not its.
    expect(within(feeding(1)).queryByLabelText("Every")).toBeNull();
  });
});
