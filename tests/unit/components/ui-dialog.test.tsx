import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useState } from "react";
import { describe, expect, it, vi } from "vitest";

import { Button, ConfirmDialog, Dialog } from "@/components/ui";

// jsdom 29 has HTMLDialogElement but no showModal()/close(); the component's own
// fallback (open attribute + its own Escape handling) is what runs here, so no polyfill.

function DeleteGarden({ onConfirm }: { onConfirm: () => void }) {
  const [open, setOpen] = useState(false);
  return (
    <>
      <Button variant="danger" onClick={() => setOpen(true)}>
        Delete garden…
      </Button>
      <ConfirmDialog
        open={open}
        onCancel={() => setOpen(false)}
        onConfirm={() => {
          onConfirm();
          setOpen(false);
        }}
        title="Delete Hollis Street Garden?"
        confirmLabel="Delete garden"
        confirmText="Hollis Street Garden"
      >
        Its beds, bins and logs are removed for every member.
      </ConfirmDialog>
    </>
  );
}

describe("Dialog", () => {
  it("is labelled by its title, closes on Escape and returns focus to the opener", async () => {
    const user = userEvent.setup();
    function Harness() {
      const [open, setOpen] = useState(false);
      return (
        <>
          <Button onClick={() => setOpen(true)}>Add bed</Button>
          <Dialog
            open={open}
            onClose={() => setOpen(false)}
            title="New bed"
            description="Inside size"
          >
            <input aria-label="Bed name" />
          </Dialog>
        </>
      );
    }
    render(<Harness />);
    const opener = screen.getByRole("button", { name: "Add bed" });
    await user.click(opener);
    // WAI-ARIA 1.2 dialog role: accessible name from aria-labelledby → the title.
    const dialog = screen.getByRole("dialog", { name: "New bed" });
    expect(dialog).toHaveAccessibleDescription("Inside size");
    expect(screen.getByRole("textbox", { name: "Bed name" })).toHaveFocus();

    await user.keyboard("{Escape}");
    expect(screen.queryByRole("dialog")).toBeNull();
    expect(opener).toHaveFocus();
  });
});

describe("ConfirmDialog", () => {
  it("keeps Confirm disabled until the exact word is typed, then confirms", async () => {
    const user = userEvent.setup();
    const onConfirm = vi.fn();
    render(<DeleteGarden onConfirm={onConfirm} />);
    await user.click(screen.getByRole("button", { name: "Delete garden…" }));

    const confirm = screen.getByRole("button", { name: "Delete garden" });
    const word = screen.getByRole("textbox", { name: "Type Hollis Street Garden to confirm" });
    expect(word).toHaveFocus();
    expect(confirm).toBeDisabled();

    await user.type(word, "hollis street garden");
    expect(confirm).toBeDisabled(); // case matters: a near miss is not consent
    await user.keyboard("{Enter}");
    expect(onConfirm).not.toHaveBeenCalled();

    await user.clear(word);
    await user.type(word, "Hollis Street Garden");
    expect(confirm).toBeEnabled();
    await user.click(confirm);
    expect(onConfirm).toHaveBeenCalledTimes(1);
    expect(screen.queryByRole("dialog")).toBeNull();
  });

  it("Escape cancels without confirming, and the typed word is gone on reopen", async () => {
    const user = userEvent.setup();
    const onConfirm = vi.fn();
    render(<DeleteGarden onConfirm={onConfirm} />);
    const opener = screen.getByRole("button", { name: "Delete garden…" });
    await user.click(opener);
    await user.type(screen.getByRole("textbox"), "Hollis Street Garden");
    await user.keyboard("{Escape}");

    expect(screen.queryByRole("dialog")).toBeNull();
    expect(onConfirm).not.toHaveBeenCalled();
    expect(opener).toHaveFocus();

    await user.click(opener);
    expect(screen.getByRole("textbox")).toHaveValue("");
    expect(screen.getByRole("button", { name: "Delete garden" })).toBeDisabled();
  });

  it("without confirmText the confirm button works at once and Cancel gets focus", async () => {
    const user = userEvent.setup();
    const onConfirm = vi.fn();
    render(
      <ConfirmDialog
        open
        onCancel={() => undefined}
        onConfirm={onConfirm}
        title="Remove this planting?"
        confirmLabel="Remove"
      />,
    );
    expect(screen.getByRole("button", { name: "Cancel" })).toHaveFocus();
    await user.click(screen.getByRole("button", { name: "Remove" }));
    expect(onConfirm).toHaveBeenCalledTimes(1);
  });
});

describe("ConfirmDialog typed confirmation (issue 12 item 7)", () => {
  it("accepts a curly apostrophe for a straight one, and says what does not match", async () => {
    const user = userEvent.setup();
    const onConfirm = vi.fn();
    render(
      <ConfirmDialog
        open
        onCancel={() => undefined}
        onConfirm={onConfirm}
        title="Delete Bo's Plot?"
        confirmLabel="Delete garden"
        confirmText="Bo's Plot"
      />,
    );
    const input = screen.getByLabelText(/to confirm/);
    const button = screen.getByRole("button", { name: "Delete garden" });
    await user.type(input, "Bos");
    expect(button).toBeDisabled();
    // The hint is tied to the field (aria-describedby) and names the difference.
    expect(input).toHaveAccessibleDescription(
      "Character 3 differs: the name has “'”, you typed “s”.",
    );
    await user.clear(input);
    // U+2019, what a phone keyboard types for an apostrophe.
    await user.type(input, "Bo\u2019s Plot");
    expect(button).toBeEnabled();
    await user.click(button);
    expect(onConfirm).toHaveBeenCalledOnce();
  });
});
