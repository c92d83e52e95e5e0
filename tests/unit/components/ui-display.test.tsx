import { render, screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";

import { Alert, EmptyState, Table, TBody, Td, Th, THead, Tr } from "@/components/ui";

describe("Table", () => {
  it("scrolls inside a focusable region named by its caption", () => {
    render(
      <Table caption="Castings balance, March">
        <THead>
          <Tr>
            <Th>Bed</Th>
            <Th numeric>Demand (cups)</Th>
          </Tr>
        </THead>
        <TBody>
          <Tr>
            <Td>North bed</Td>
            <Td numeric>6</Td>
          </Tr>
        </TBody>
      </Table>,
    );
    // WAI-ARIA 1.2: role=region needs an accessible name; tabindex=0 lets keyboards scroll it.
    const region = screen.getByRole("region", { name: "Castings balance, March" });
    expect(region).toHaveAttribute("tabindex", "0");
    // HTML Living Standard: <caption> names its table.
    const table = within(region).getByRole("table", { name: "Castings balance, March" });
    expect(within(table).getByRole("columnheader", { name: "Bed" })).toHaveAttribute(
      "scope",
      "col",
    );
  });
});

describe("Alert", () => {
  it("is a note by default and an alert when urgent, with the tone in words", () => {
    render(
      <>
        <Alert tone="caution" title="Full trays are heavy">
          Lift with two people.
        </Alert>
        <Alert tone="danger" urgent>
          The application was not saved.
        </Alert>
      </>,
    );
    // WAI-ARIA 1.2: role="note" is static (not live); role="alert" is assertive live.
    expect(screen.getByRole("note")).toHaveTextContent("Caution: Full trays are heavy");
    expect(screen.getByRole("alert")).toHaveTextContent("Warning: The application was not saved.");
  });
});

describe("EmptyState", () => {
  it("gives a heading, hides the icon and shows the action", () => {
    render(
      <EmptyState
        icon={<svg data-name="seed" />}
        title="No beds yet"
        text="Add a bed to start planning its feeding."
        action={<button type="button">Add a bed</button>}
      />,
    );
    expect(screen.getByRole("heading", { level: 2, name: "No beds yet" })).toBeInTheDocument();
    expect(screen.getByRole("button", { name: "Add a bed" })).toBeInTheDocument();
    expect(document.querySelector("[data-name=seed]")?.parentElement).toHaveAttribute(
      "aria-hidden",
      "true",
    );
  });
});
