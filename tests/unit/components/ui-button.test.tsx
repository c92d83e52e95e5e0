import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it, vi } from "vitest";

import { Button, buttonStyles } from "@/components/ui";

describe("Button", () => {
  it("is a plain button by default and fires onClick", async () => {
    const onClick = vi.fn();
    render(<Button onClick={onClick}>Log application</Button>);
    const button = screen.getByRole("button", { name: "Log application" });
    // HTML Living Standard: a <button> without type submits its form; ours must not.
    expect(button).toHaveAttribute("type", "button");
    await userEvent.setup().click(button);
    expect(onClick).toHaveBeenCalledTimes(1);
  });

  it("while pending: aria-busy, disabled, spinner, and presses do nothing", async () => {
    const onClick = vi.fn();
    render(
      <Button type="submit" pending onClick={onClick}>
        Save bed
      </Button>,
    );
    const button = screen.getByRole("button", { name: "Save bed" });
    // WAI-ARIA 1.2 §6.7 aria-busy: "true" while the element is being updated.
    expect(button).toHaveAttribute("aria-busy", "true");
    expect(button).toBeDisabled();
    expect(button.querySelector("svg.animate-spin")).not.toBeNull();
    await userEvent.setup().click(button);
    expect(onClick).not.toHaveBeenCalled();
  });

  it("without pending has no aria-busy and no spinner", () => {
    render(<Button>Save bed</Button>);
    const button = screen.getByRole("button", { name: "Save bed" });
    expect(button).not.toHaveAttribute("aria-busy");
    expect(button).toBeEnabled();
    expect(button.querySelector("svg")).toBeNull();
  });

  it("keeps a 44 px minimum tap target in every size", () => {
    // WCAG 2.2 SC 2.5.5 (AAA) target size 44 × 44 CSS px; Tailwind min-h-11 = 2.75rem = 44 px.
    for (const size of ["sm", "md", "lg"] as const) {
      const classes = buttonStyles({ size }).split(" ");
      expect(classes).toContain("min-w-11");
      expect(classes.some((c) => c === "min-h-11" || c === "min-h-12")).toBe(true);
    }
  });
});
