import { act, fireEvent, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";

import {
  TOAST_ACTION_DURATION_MS,
  TOAST_DURATION_MS,
  ToastProvider,
  useToast,
  type ToastInput,
} from "@/components/ui";

function Trigger({ toast }: { toast: ToastInput }) {
  const { show } = useToast();
  return (
    <button type="button" onClick={() => show(toast)}>
      Log it
    </button>
  );
}

afterEach(() => {
  vi.useRealTimers();
});

describe("toast", () => {
  it("appears inside a polite live region and its action fires once", async () => {
    const user = userEvent.setup();
    const undo = vi.fn();
    render(
      <ToastProvider>
        <Trigger
          toast={{
            title: "Logged 1 cup castings on Bed 2",
            action: { label: "Undo", onAction: undo },
          }}
        />
      </ToastProvider>,
    );
    // WAI-ARIA 1.2: role="status" is a live region with implicit aria-live="polite".
    const region = screen.getByRole("status");
    expect(region).toHaveAttribute("aria-live", "polite");
    expect(region).toBeEmptyDOMElement();

    await user.click(screen.getByRole("button", { name: "Log it" }));
    expect(within(region).getByText("Logged 1 cup castings on Bed 2")).toBeInTheDocument();

    await user.click(within(region).getByRole("button", { name: "Undo" }));
    expect(undo).toHaveBeenCalledTimes(1);
    expect(region).toBeEmptyDOMElement();
  });

  // Fake timers with user-event stall Testing Library's async helpers here, so these
  // two tests press buttons with fireEvent (synchronous) instead.
  it("leaves by itself after its duration", () => {
    vi.useFakeTimers();
    render(
      <ToastProvider>
        <Trigger toast={{ title: "Bin 1 harvest logged" }} />
      </ToastProvider>,
    );
    fireEvent.click(screen.getByRole("button", { name: "Log it" }));
    const region = screen.getByRole("status");
    expect(within(region).getByText("Bin 1 harvest logged")).toBeInTheDocument();

    act(() => vi.advanceTimersByTime(TOAST_DURATION_MS - 100));
    expect(within(region).queryByText("Bin 1 harvest logged")).toBeInTheDocument();
    act(() => vi.advanceTimersByTime(200));
    expect(within(region).queryByText("Bin 1 harvest logged")).toBeNull();
  });

  it("waits while its action has focus, so an Undo is not lost mid-reach", () => {
    vi.useFakeTimers();
    render(
      <ToastProvider>
        <Trigger
          toast={{ title: "Fed Bed 3", action: { label: "Undo", onAction: () => undefined } }}
        />
      </ToastProvider>,
    );
    fireEvent.click(screen.getByRole("button", { name: "Log it" }));
    const undo = screen.getByRole("button", { name: "Undo" });
    act(() => vi.advanceTimersByTime(TOAST_ACTION_DURATION_MS - 1000));
    act(() => undo.focus());
    act(() => vi.advanceTimersByTime(TOAST_ACTION_DURATION_MS * 3));
    expect(screen.getByText("Fed Bed 3")).toBeInTheDocument();

    // Focus leaves: only the time that was left (about 1 s) runs out.
    act(() => undo.blur());
    act(() => vi.advanceTimersByTime(500));
    expect(screen.getByText("Fed Bed 3")).toBeInTheDocument();
    act(() => vi.advanceTimersByTime(600));
    expect(screen.queryByText("Fed Bed 3")).toBeNull();
  });

  it("useToast outside the provider fails with a clear message", () => {
    vi.spyOn(console, "error").mockImplementation(() => undefined);
    expect(() => render(<Trigger toast={{ title: "x" }} />)).toThrow(
      "useToast must be called inside <ToastProvider>.",
    );
  });
});
